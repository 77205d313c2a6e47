import { MikroORM } from '@mikro-orm/core';
import Papa from 'papaparse';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { READING_COLUMNS } from '../src/exports/readings-csv';
import { EXPORT_PAGE_SIZE } from '../src/exports/readings-export.query';
import { Reading } from '../src/inspection/entities/reading.entity';
import { roundWithUncertainty } from '@gaugeproof/standards';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';
import { seedExportLot, type ExportLot } from './helpers/export-fixtures';

const parse = (text: string) => {
  expect(text.startsWith('\ufeff')).toBe(true); // so spreadsheets read "mm²" right
  return Papa.parse<string[]>(text.slice(1).trim(), { skipEmptyLines: true }).data;
};
const url = (supplierId: number, query = '') =>
  `/api/suppliers/${supplierId}/readings/export.csv${query}`;

describe('GET /api/suppliers/:id/readings/export.csv', () => {
  let t: TestApp;
  let big: ExportLot;
  let small: ExportLot;
  let other: ExportLot;
  let total: number;

  beforeAll(async () => {
    t = await startTestApp();
    // More readings than one page, so the export must fetch several pages in turn.
    big = await seedExportLot(t, {
      code: 'EXPA',
      readings: EXPORT_PAGE_SIZE + 250,
      receivedAt: '2026-03-10',
    });
    small = await seedExportLot(t, {
      code: 'EXPA',
      readings: 3,
      receivedAt: '2026-06-20',
      unitRef: '=HYPERLINK("http://attacker.example","open")',
      voidReason: '-2+3 typed into the mass field instead of the length',
    });
    other = await seedExportLot(t, { code: 'EXPB', readings: 5, receivedAt: '2026-03-10' });
    total = EXPORT_PAGE_SIZE + 250 + 3;
  });
  afterAll(async () => t?.close());

  const get = async (who: string, path: string) =>
    t.http.get(path).set('Authorization', `Bearer ${await t.token(who)}`);

  it('lets purchasing, QA leads and admins export, refuses clerks and strangers', async () => {
    for (const who of [DEMO.buyer, DEMO.qa, DEMO.admin]) {
      const res = await get(who, url(small.supplierId, '?from=2026-06-01'));
      expect(res.status, who).toBe(200);
      expect(res.headers['content-type']).toMatch(/^text\/csv/);
    }
    expect((await get(DEMO.clerk, url(small.supplierId))).status).toBe(403);
    expect((await t.http.get(url(small.supplierId))).status).toBe(401);
  });

  it('answers 404 for an unknown supplier and 400 for a bad range', async () => {
    expect((await get(DEMO.buyer, url(999_999))).status).toBe(404);
    const bad = await get(DEMO.buyer, url(small.supplierId, '?from=2026-02-30'));
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('from must be a real calendar date');
    const reversed = await get(DEMO.buyer, url(small.supplierId, '?from=2026-07-01&to=2026-06-01'));
    expect(reversed.status).toBe(400);
    expect(reversed.body.message).toContain('from must be on or before to');
    expect((await get(DEMO.buyer, url(small.supplierId, '?from=1.1.2026'))).status).toBe(400);
  });

  it('streams every reading of the supplier, voided ones too, in more than one page, lot by lot', async () => {
    const res = await get(DEMO.buyer, url(big.supplierId));
    expect(res.status).toBe(200);
    expect(res.headers['transfer-encoding']).toBe('chunked');
    expect(res.headers['content-length']).toBeUndefined();
    const [header, ...rows] = parse(res.text);
    expect(header).toEqual([...READING_COLUMNS]);
    expect(rows).toHaveLength(total);
    const ids = rows.map((r) => Number(r[0]));
    expect(ids).toEqual([...ids].sort((a, b) => a - b));
    expect(new Set(ids).size).toBe(total);
    expect(ids).toEqual([...big.readingIds, ...small.readingIds]);
    expect(ids).not.toContain(other.readingIds[0]);
  });

  it('writes the lot, conductor, inputs and computed result of each reading', async () => {
    const res = await get(DEMO.buyer, url(big.supplierId, '?from=2026-03-01&to=2026-03-31'));
    const [header, first] = parse(res.text);
    const row = Object.fromEntries(header.map((h, i) => [h, first[i]]));
    const m = t.app.get(MikroORM).em.fork();
    const reading = await m.findOneOrFail(Reading, { id: big.readingIds[0] });
    // Headers in words with units, one column per input, figures at their precision.
    expect(row).toEqual({
      Reading: String(reading.id),
      Lot: String(big.lotId),
      'Supplier lot code': 'EXPA-L20260310',
      PO: 'PO-EXPA-2026-03-10',
      'Packing slip': 'PS-2026-03-10',
      RTV: '',
      RMA: '',
      NCR: '',
      Supplier: 'Fennick Export EXPA',
      SKU: 'EXPA-4',
      'Received (UTC)': '2026-03-10 08:00',
      Unit: 'Spool 1',
      Conductor: 'power',
      Label: '4 AWG',
      Method: 'Mass and length',
      'Mass (g)': '193.2',
      'Length (mm)': '1000',
      'Strands counted': '',
      'Strand diameters (mm)': '',
      'Resistance (mΩ)': '',
      'Temperature (°C)': '',
      'Overall diameter (mm)': '',
      'Stranding increment (%)': '2',
      Instruments: 'Bench balance (BAL-EXPA)',
      // 193.2 g ÷ (8.89 g/cm³ copper, IEC 60028 × 1000 mm × 1.02 lay, REFERENCE §3) = 21.31 mm²
      'Area (mm²)': roundWithUncertainty(reading.areaMm2, reading.expandedUMm2).value,
      'U, k=2 (mm²)': roundWithUncertainty(reading.areaMm2, reading.expandedUMm2).U,
      'Coverage factor k': '2',
      'Of nominal (%)': (reading.areaRatio * 100).toFixed(1),
      'Measures as': '4 AWG',
      'Material found': 'not identified',
      Verdict: 'conforms',
      'Confirmed unusual': 'no',
      'Taken (UTC)': expect.stringMatching(/^\d{4}-\d\d-\d\d \d\d:\d\d$/),
      Voided: 'no',
      'Void reason': '',
    });
    expect(row['Area (mm²)']).toMatch(/^21\.3\d*$/);
    expect(row['U, k=2 (mm²)'].replace(/^0\.0*/, '').replace('.', '')).toHaveLength(2);
    expect(row['Of nominal (%)']).toMatch(/^\d+\.\d$/);
    expect(parse(res.text)).toHaveLength(1 + EXPORT_PAGE_SIZE + 250);
  });

  it('neutralises cells a spreadsheet would run as formulas', async () => {
    const res = await get(DEMO.buyer, url(small.supplierId, '?from=2026-06-01'));
    const [header, ...rows] = parse(res.text);
    const col = (name: string) => header.indexOf(name);
    expect(rows).toHaveLength(3);
    for (const r of rows)
      expect(r[col('Unit')]).toBe(`'=HYPERLINK("http://attacker.example","open")`);
    const voided = rows.filter((r) => r[col('Voided')] === 'yes');
    expect(voided).toHaveLength(1);
    expect(voided[0][col('Void reason')]).toBe(
      "'-2+3 typed into the mass field instead of the length",
    );
    expect(res.text).not.toMatch(/(^|,|\n)=HYPERLINK/);
  });

  it('records each export in the audit trail', async () => {
    await get(DEMO.qa, url(other.supplierId, '?from=2026-01-01&to=2026-12-31'));
    const m = t.app.get(MikroORM).em.fork();
    const events = await m.find(AuditEvent, {
      action: 'export.readings',
      entityId: other.supplierId,
    });
    expect(events).toHaveLength(1);
    expect(events[0]).toMatchObject({
      actorEmail: DEMO.qa,
      entityType: 'supplier',
      after: { format: 'csv', from: '2026-01-01', to: '2026-12-31' },
    });
  });
});

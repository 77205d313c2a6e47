import { MikroORM } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import type { CorrectiveActionStatus } from '../src/corrective-actions/entities/corrective-action.entity';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import type { ScorecardRow, SupplierScorecard } from '@gaugeproof/api-types';
import { Sample } from '../src/inspection/entities/sample.entity';
import { createBench, GOOD_4AWG_MASS } from './helpers/fixtures';
import { ScorecardFixtures } from './helpers/scorecard-fixtures';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

/*
 * Hand-worked set, range 2025-01-01 … 2025-03-31 (UTC days, both ends inclusive).
 * Supplier A (SC-A), products P1 = 4 AWG power spool (tightened), P2 = kit 4 AWG power +
 * 18 AWG remote (no switching state → normal):
 *  L1 2025-01-01T00:00Z accepted   S1 [1.00 conf 4 AWG]  S2 [0.99 conf 4 AWG]
 *  L2 2025-01-15 rejected          S3 [0.40 nc 8 AWG mismatch, 0.42 nc 8 AWG mismatch]
 *                                  S4 [0.60 nc 6 AWG, 0.10 14 AWG VOIDED]
 *  L3 2025-02-10 concession (P2)   unit 1: S5 power [0.97 nc 4 AWG]  S6 remote [1.02 conf 18 AWG]
 *  L7 2025-03-05 awaiting_decision S10 [0.90 inconclusive 4 AWG]  S11 (no readings)
 *  L4 2025-03-31T23:59:59.999Z returned  S7 [0.62 nc 6 AWG, by resistance]
 *  outside: L6 2024-12-31T23:59:59.999Z accepted [0.20]; L5 2025-04-01T00:00Z rejected [0.05 16 AWG]
 * Supplier B (SC-B), 25 mm² spool: L8 2025-02-20 accepted [1.01 25 mm²], L9 2025-03-10 rejected [0.66 nc 16 mm²]
 * Supplier C (SC-C): nothing.
 */
const RANGE = 'from=2025-01-01&to=2025-03-31';
const AWG4 = { gaugeLabel: '4 AWG', gaugeSystem: 'awg' as const, nominalAreaMm2: 21.15 }; // ASTM B258
const AWG18 = { gaugeLabel: '18 AWG', gaugeSystem: 'awg' as const, nominalAreaMm2: 0.823 }; // ASTM B258
const MM25 = { gaugeLabel: '25 mm²', gaugeSystem: 'metric' as const, nominalAreaMm2: 25 }; // IEC 60228

let t: TestApp;
let ids: { a: number; b: number; c: number; lots: Record<string, number> };

async function seed(f: ScorecardFixtures) {
  const a = await f.supplier('Scorecard Test Alpha Cable', 'SC-A');
  const b = await f.supplier('Scorecard Test Beta Wire', 'SC-B');
  const c = await f.supplier('=Scorecard Test Gamma Idle', 'SC-C');
  const p1 = await f.product(a.id, 'SCA-4P', [{ purpose: 'power', ...AWG4 }], {
    severity: 'tightened',
    reason: '2 of 5 consecutive lots rejected (ISO 2859-1 switching)',
  });
  const p2 = await f.product(a.id, 'SCA-KIT', [
    { purpose: 'power', ...AWG4 },
    { purpose: 'remote', ...AWG18 },
  ]);
  const p3 = await f.product(b.id, 'SCB-25', [{ purpose: 'power', ...MM25 }]);
  const lots: Record<string, number> = {};
  lots.L1 = await f.lot(p1, '2025-01-01T00:00:00.000Z', 'accepted', [
    [0, '1.00 ok 4 AWG'],
    [0, '0.99 ok 4 AWG'],
  ]);
  lots.L2 = await f.lot(p1, '2025-01-15T10:00:00.000Z', 'rejected', [
    [0, '0.40 nc 8 AWG mismatch', '0.42 nc 8 AWG mismatch'],
    [0, '0.60 nc 6 AWG', '0.10 nc 14 AWG void'],
  ]);
  // One kit: its power and remote conductors are one unit.
  lots.L3 = await f.lot(
    p2,
    '2025-02-10T08:00:00.000Z',
    'accepted_on_concession',
    [
      [0, '0.97 nc 4 AWG'],
      [1, '1.02 ok 18 AWG'],
    ],
    [1, 1],
  );
  lots.L7 = await f.lot(p1, '2025-03-05T08:00:00.000Z', 'awaiting_decision', [
    [0, '0.90 inc 4 AWG'],
    [0],
  ]);
  lots.L4 = await f.lot(p1, '2025-03-31T23:59:59.999Z', 'returned', [
    [0, '0.62 nc 6 AWG resistance'],
  ]);
  lots.L6 = await f.lot(p1, '2024-12-31T23:59:59.999Z', 'accepted', [[0, '0.20 nc 12 AWG']]);
  lots.L5 = await f.lot(p1, '2025-04-01T00:00:00.000Z', 'rejected', [[0, '0.05 nc 16 AWG']]);
  lots.L8 = await f.lot(p3, '2025-02-20T08:00:00.000Z', 'accepted', [[0, '1.01 ok 25 mm²']]);
  lots.L9 = await f.lot(p3, '2025-03-10T08:00:00.000Z', 'rejected', [[0, '0.66 nc 16 mm²']]);
  // Corrective actions of A: CA1 open and overdue; CA2 responded after 3.5 days; CA3 closed
  // after 1 day; CA4 reopened after a 2-day response, due far ahead; CA5 raised before the range.
  const ca = (status: CorrectiveActionStatus, due: string, created: string, responded?: string) =>
    f.correctiveAction(a.id, status, due, created, responded);
  await ca('open', '2025-02-01', '2025-01-20T00:00:00Z');
  await ca('responded', '2025-01-31', '2025-01-10T00:00:00Z', '2025-01-13T12:00:00Z');
  await ca('closed', '2025-02-20', '2025-02-01T00:00:00Z', '2025-02-02T00:00:00Z');
  await ca('reopened', '2999-01-01', '2025-03-01T00:00:00Z', '2025-03-03T00:00:00Z');
  await ca('closed', '2024-07-01', '2024-06-01T00:00:00Z', '2024-06-11T00:00:00Z');
  await f.vendorReturn(a.id, '2025-02-15T00:00:00Z', 120.5);
  await f.vendorReturn(a.id, '2025-03-31T23:00:00Z', 79.5);
  await f.vendorReturn(a.id, '2025-04-01T00:00:00Z', 1000);
  // Two currencies: USD is never added to EUR; a cancelled return counts in neither.
  await f.vendorReturn(a.id, '2025-01-20T00:00:00Z', 10.1, 'USD', 'shipped');
  await f.vendorReturn(a.id, '2025-03-02T00:00:00Z', 25.15, 'USD', 'credited');
  await f.vendorReturn(a.id, '2025-03-03T00:00:00Z', 500, 'USD', 'cancelled');
  return { a: a.id, b: b.id, c: c.id, lots };
}

beforeAll(async () => {
  t = await startTestApp();
  ids = await seed(new ScorecardFixtures(t));
});
afterAll(async () => t.close());

async function getAs(email: string, url: string) {
  return t.http.get(url).set('Authorization', `Bearer ${await t.token(email)}`);
}

async function list(query = RANGE): Promise<ScorecardRow[]> {
  const res = await getAs(DEMO.buyer, `/api/scorecards?${query}`);
  expect(res.status).toBe(200);
  return res.body.items as ScorecardRow[];
}

const rowOf = (rows: ScorecardRow[], id: number) => rows.find((r) => r.supplierId === id)!;

describe('GET /api/scorecards', () => {
  it('computes supplier A by hand', async () => {
    const a = rowOf(await list(), ids.a);
    expect(a).toMatchObject({
      code: 'SC-A',
      lotsReceived: 5, // L1, L2, L3, L7, L4 (L6 before from, L5 after to)
      lotsAccepted: 1, // L1
      lotsAcceptedOnConcession: 1, // L3
      lotsRejected: 2, // L2 rejected + L4 returned
      lotsPending: 1, // L7 awaiting decision
      samplesTested: 8, // S1 S2 S3 S4 S5 S6 S7 S10 (S11 has no reading)
      nonconformingSamples: 4, // S3 S4 S5 S7
      // Units: L1 ×2, L2 ×2, L3's kit once (S5 + S6), L7 unit 1 (unit 2 has no reading), L4
      unitsTested: 7,
      nonconformingUnits: 4, // L2 ×2, L3's kit (its power conductor), L4
      dppm: 571_429, // 4 / 7 × 10⁶, rounded
      readings: 9, // 10 readings in range, one voided
      lowestAreaRatio: 0.4, // R3; the voided 0.10 and out-of-range 0.05/0.20 do not count
      materialMismatches: 1, // S3, two flagged readings, counted once per sample
      worstSizesShort: 4, // label 4 AWG measured as 8 AWG: 8 − 4
      openCorrectiveActions: 3, // CA1 open, CA2 responded, CA4 reopened (CA3, CA5 closed)
      overdueCorrectiveActions: 1, // CA1: open, due 2025-02-01 < today
      // EUR 120.5 + 79.5 (the 1000 is raised on 2025-04-01); USD 10.1 + 25.15, the cancelled
      // 500 left out; never one sum of both currencies, never converted.
      chargebacks: [
        { currency: 'EUR', amount: 200 },
        { currency: 'USD', amount: 35.25 },
      ],
    });
    expect(a.acceptanceRate).toBeCloseTo(0.25, 12); // 1 accepted ÷ 4 decided
    // (1.00 + 0.99 + 0.40 + 0.42 + 0.60 + 0.97 + 1.02 + 0.62 + 0.90) / 9 = 6.92 / 9
    expect(a.meanAreaRatio).toBeCloseTo(6.92 / 9, 12);
    expect(a.unitNonconformingRate).toBeCloseTo(4 / 7, 12);
    // Per method: eight mass readings (6.30 / 8), one resistance reading (0.62)
    expect(a.areaRatioByMethod.map((m) => [m.method, m.readings])).toEqual([
      ['mass', 8],
      ['resistance', 1],
    ]);
    expect(a.areaRatioByMethod[0].meanAreaRatio).toBeCloseTo(6.3 / 8, 12);
    expect(a.areaRatioByMethod[0].lowestAreaRatio).toBeCloseTo(0.4, 12);
    expect(a.areaRatioByMethod[1].meanAreaRatio).toBeCloseTo(0.62, 12);
    // CA2 3.5 d, CA3 1 d, CA4 2 d (CA5 raised before the range): 6.5 / 3
    expect(a.meanResponseDays).toBeCloseTo(6.5 / 3, 9);
    expect(a.trend.map((p) => [p.month, p.lots, p.acceptanceRate])).toEqual([
      ['2025-01', 2, 0.5], // L1 accepted, L2 rejected
      ['2025-02', 1, 0], // L3 concession
      ['2025-03', 2, 0], // L4 returned, L7 pending (not in the rate)
    ]);
    expect(a.trend[0].meanAreaRatio).toBeCloseTo(3.41 / 5, 12); // 1.00+0.99+0.40+0.42+0.60
    expect(a.trend[1].meanAreaRatio).toBeCloseTo(1.99 / 2, 12); // 0.97 + 1.02
    expect(a.trend[2].meanAreaRatio).toBeCloseTo(1.52 / 2, 12); // 0.62 + 0.90
  });

  it('compares metric sizes and lists a supplier without lots with zeros and nulls', async () => {
    const rows = await list();
    const b = rowOf(rows, ids.b);
    expect(b).toMatchObject({
      lotsReceived: 2,
      lotsAccepted: 1,
      lotsRejected: 1,
      acceptanceRate: 0.5,
    });
    expect(b.meanAreaRatio).toBeCloseTo((1.01 + 0.66) / 2, 12);
    expect(b.worstSizesShort).toBe(1); // 25 mm² measuring as 16 mm²: one IEC 60228 size
    expect(rowOf(rows, ids.c)).toMatchObject({
      lotsReceived: 0,
      acceptanceRate: null,
      samplesTested: 0,
      unitsTested: 0,
      unitNonconformingRate: null,
      areaRatioByMethod: [],
      dppm: null,
      meanAreaRatio: null,
      lowestAreaRatio: null,
      worstSizesShort: null,
      openCorrectiveActions: 0,
      meanResponseDays: null,
      chargebacks: [],
    });
    expect(rowOf(rows, ids.c).trend.map((p) => p.lots)).toEqual([0, 0, 0]);
    // Worst first: A (25 %) before B (50 %); C, with nothing decided, after both.
    const order = [ids.a, ids.b, ids.c].map((id) => rows.findIndex((r) => r.supplierId === id));
    expect(order[0]).toBeLessThan(order[1]);
    expect(order[1]).toBeLessThan(order[2]);
  });

  it('counts a lot received on `to` and not one on `to` + 1', async () => {
    // to = 2025-03-30: L4 (2025-03-31T23:59:59.999Z) drops out → 4 lots, 1 rejected.
    const early = rowOf(await list('from=2025-01-01&to=2025-03-30'), ids.a);
    expect([early.lotsReceived, early.lotsRejected]).toEqual([4, 1]);
    // to = 2025-03-31 counts L4; from = to = 2025-04-01 holds only L5 (00:00Z).
    const nextDay = rowOf(await list('from=2025-04-01&to=2025-04-01'), ids.a);
    expect([nextDay.lotsReceived, nextDay.lotsRejected, nextDay.lowestAreaRatio]).toEqual([
      1, 1, 0.05,
    ]);
    // from = 2025-01-01 counts L1 at 00:00Z, not L6 one millisecond earlier.
    const first = rowOf(await list('from=2025-01-01&to=2025-01-01'), ids.a);
    expect([first.lotsReceived, first.lotsAccepted]).toEqual([1, 1]);
  });

  it('defaults to the last 12 months and refuses bad ranges', async () => {
    const res = await getAs(DEMO.buyer, '/api/scorecards');
    expect(res.status).toBe(200);
    expect(res.body.to).toBe(new Date().toISOString().slice(0, 10));
    expect(res.body.items[0].trend).toHaveLength(12);
    for (const q of [
      'from=2025-02-30&to=2025-03-01',
      'from=2025-03-02&to=2025-03-01',
      'from=2020-01-01&to=2025-12-31',
      'from=1/1/2025',
    ]) {
      const bad = await getAs(DEMO.buyer, `/api/scorecards?${q}`);
      expect(bad.status, q).toBe(400);
      expect(Array.isArray(bad.body.message), q).toBe(true);
    }
  });
});

describe('GET /api/suppliers/:id/scorecard', () => {
  it('adds histogram, purposes, products and worst lots', async () => {
    const res = await getAs(DEMO.qa, `/api/suppliers/${ids.a}/scorecard?${RANGE}`);
    expect(res.status).toBe(200);
    const card = res.body as SupplierScorecard;
    expect(card.lotsReceived).toBe(5);
    const counts = Object.fromEntries(
      card.histogram.filter((b) => b.count > 0).map((b) => [b.from, b.count]),
    );
    // 0.40, 0.42 | 0.60, 0.62 | 0.90 | 0.97 | 0.99 | 1.00, 1.02 (2.5 %-wide bins)
    expect(counts).toEqual({ 0.4: 2, 0.6: 2, 0.9: 1, 0.95: 1, 0.975: 1, 1: 2 });
    expect(card.histogram.reduce((n, b) => n + b.count, 0)).toBe(9);
    expect(card.byPurpose).toEqual([
      { purpose: 'power', samplesTested: 7, nonconformingSamples: 4 }, // S1-5, S7, S10; S3 S4 S5 S7
      { purpose: 'remote', samplesTested: 1, nonconformingSamples: 0 }, // S6
    ]);
    expect(card.products).toEqual([
      expect.objectContaining({
        sku: 'SCA-4P',
        severity: 'tightened',
        reason: expect.stringContaining('rejected'),
      }),
      expect.objectContaining({ sku: 'SCA-KIT', severity: 'normal', reason: null }),
    ]);
    // Lowest ratio first: L2 0.40, L4 0.62, L7 0.90, L3 0.97, L1 0.99.
    expect(
      card.worstLots.map((w) => [w.lotId, w.lowestAreaRatio, w.label, w.measuresAs, w.sizesShort]),
    ).toEqual([
      [ids.lots.L2, 0.4, '4 AWG', '8 AWG', 4],
      [ids.lots.L4, 0.62, '4 AWG', '6 AWG', 2],
      [ids.lots.L7, 0.9, '4 AWG', '4 AWG', 0],
      [ids.lots.L3, 0.97, '4 AWG', '4 AWG', 0],
      [ids.lots.L1, 0.99, '4 AWG', '4 AWG', 0],
    ]);
    expect(card.worstLots[0]).toMatchObject({
      sku: 'SCA-4P',
      status: 'rejected',
      receivedAt: '2025-01-15T10:00:00.000Z',
    });
    expect(card.worstLots[0].poNumber).toMatch(/^PO-2025-01-15/);
  });

  it('answers 404 for an unknown supplier and 400 for a bad id', async () => {
    expect((await getAs(DEMO.buyer, `/api/suppliers/999999/scorecard?${RANGE}`)).status).toBe(404);
    expect((await getAs(DEMO.buyer, `/api/suppliers/abc/scorecard?${RANGE}`)).status).toBe(400);
  });
});

describe('access', () => {
  const urls = () => [
    `/api/scorecards?${RANGE}`,
    `/api/scorecards/export.csv?${RANGE}`,
    `/api/suppliers/${ids.a}/scorecard?${RANGE}`,
    `/api/suppliers/${ids.a}/scorecard/export.csv?${RANGE}`,
  ];
  it('lets purchasing, qa_lead and admin in', async () => {
    for (const email of [DEMO.buyer, DEMO.qa, DEMO.admin]) {
      for (const url of urls())
        expect((await getAs(email, url)).status, `${email} ${url}`).toBe(200);
    }
  });
  it('refuses a clerk (403) and an anonymous caller (401)', async () => {
    for (const url of urls()) {
      expect((await getAs(DEMO.clerk, url)).status, url).toBe(403);
      expect((await t.http.get(url)).status, url).toBe(401);
    }
  });
});

describe('CSV export', () => {
  it('exports the ranking with guarded cells and records the export', async () => {
    const res = await getAs(DEMO.buyer, `/api/scorecards/export.csv?${RANGE}`);
    expect(res.status).toBe(200);
    expect(res.headers['content-type']).toMatch(/^text\/csv/);
    expect(res.text.startsWith('\ufeff')).toBe(true); // the byte-order mark, like every CSV
    const lines = res.text.slice(1).split('\r\n');
    const header = lines[0].split(',');
    expect(header.slice(0, 8)).toEqual([
      'From',
      'To',
      'Supplier id',
      'Supplier',
      'Code',
      'Status',
      'Lots received',
      'Lots accepted',
    ]);
    expect(header).toContain('Lot acceptance (%)');
    expect(header).toContain('Mean area by resistance (% of nominal)');
    const a = lines.find((l) => l.includes(',SC-A,'))!.split(',');
    const cell = (name: string) => a[header.indexOf(name)];
    expect(a.slice(0, 6)).toEqual([
      '2025-01-01',
      '2025-03-31',
      String(ids.a),
      'Scorecard Test Alpha Cable',
      'SC-A',
      'approved',
    ]);
    expect(cell('Lot acceptance (%)')).toBe('25.0'); // 1 of 4 decided, one decimal
    expect(cell('Units tested')).toBe('7');
    expect(cell('Nonconforming units')).toBe('4');
    expect(cell('Nonconforming units (%)')).toBe('57.1'); // 4 / 7
    expect(cell('Mean area of all methods (% of nominal)')).toBe('76.9'); // 6.92 / 9
    expect(cell('Mean area by mass (% of nominal)')).toBe('78.8'); // 6.30 / 8
    expect(cell('Mean area by resistance (% of nominal)')).toBe('62.0');
    expect(cell('Mean SCAR response (days)')).toBe('2.2'); // 6.5 / 3
    // One column per currency, the server's own (USD here) included; never a mixed sum.
    expect(header.filter((h) => h.startsWith('Chargebacks'))).toEqual([
      'Chargebacks (EUR)',
      'Chargebacks (USD)',
    ]);
    expect(cell('Chargebacks (EUR)')).toBe('200.00');
    expect(cell('Chargebacks (USD)')).toBe('35.25');
    const idle = lines.find((l) => l.includes(',SC-C,'))!.split(',');
    expect(idle[header.indexOf('Chargebacks (EUR)')]).toBe('0.00');
    expect(res.text).toContain(`,'=Scorecard Test Gamma Idle,`); // formula guard
    const em = t.app.get(MikroORM).em.fork();
    expect(await em.count(AuditEvent, { action: 'scorecard.export' })).toBeGreaterThan(0);
  });

  it('exports one supplier in long form', async () => {
    const res = await getAs(DEMO.buyer, `/api/suppliers/${ids.a}/scorecard/export.csv?${RANGE}`);
    expect(res.status).toBe(200);
    expect(res.text.startsWith('\ufeff')).toBe(true);
    const lines = res.text.slice(1).split('\r\n');
    expect(lines[0]).toBe('Section,Item,Field,Value');
    expect(lines).toContain('Summary,SC-A,Lots received,5');
    expect(lines).toContain('Summary,SC-A,Nonconforming units (%),57.1');
    expect(lines).toContain('Summary,SC-A,Chargebacks (EUR),200.00');
    expect(lines).toContain('Summary,SC-A,Chargebacks (USD),35.25');
    expect(lines).toContain('Trend,2025-01,Lots received,2');
    expect(lines).toContain('Trend,2025-01,Mean area (% of nominal),68.2'); // 3.41 / 5
    expect(lines).toContain(`Worst lot,${ids.lots.L2},Measures as,8 AWG`);
    expect(lines).toContain('Product,SCA-4P,Inspection severity,tightened');
  });
});

// Last in the file: it adds a supplier, lots and readings the counts above do not expect.
describe('the cached ranking', () => {
  it('shows every write at once: an ORM flush and a reading entered through the form', async () => {
    const f = new ScorecardFixtures(t);
    const before = await list(); // computed and cached
    expect(await list()).toEqual(before); // served from the cache
    const d = await f.supplier('Scorecard Test Delta Spools', 'SC-D');
    expect(rowOf(await list(), d.id)).toMatchObject({ lotsReceived: 0, readings: 0 });
    const p = await f.product(d.id, 'SCD-4P', [{ purpose: 'power', ...AWG4 }]);
    const lotId = await f.lot(p, '2025-03-20T08:00:00.000Z', 'inspecting', [[0]]);
    expect(rowOf(await list(), d.id)).toMatchObject({ lotsReceived: 1, readings: 0 });
    const bench = await createBench(t);
    const [sample] = await t.app.get(MikroORM).em.fork().find(Sample, { lot: lotId });
    const res = await t.http
      .post(`/api/samples/${sample.id}/readings`)
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .send({ ...GOOD_4AWG_MASS, instrumentIds: [bench.balance.id, bench.rule.id] });
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(rowOf(await list(), d.id)).toMatchObject({ lotsReceived: 1, readings: 1 });
  });
});

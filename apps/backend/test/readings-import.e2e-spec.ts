import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import { MikroORM } from '@mikro-orm/core';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { MAX_IMPORT_ROWS } from '../src/inspection/readings-import.service';
import { Reading } from '../src/inspection/entities/reading.entity';
import { ReadingWriter } from '../src/inspection/reading-writer';
import { Sample } from '../src/inspection/entities/sample.entity';
import {
  as,
  createLot,
  createProduct,
  lotRow,
  type Bench,
  type Catalog,
  KIT_4AWG,
  startWithBench,
} from './helpers/fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

let t: TestApp;
let bench: Bench;
let kit: Catalog;
// Power and ground 4 AWG copper; S-3, AQL 15 at 50 units → 3 units planned.
beforeAll(async () => ({ t, bench, kit } = await startWithBench({ kit: KIT_4AWG })));
afterAll(async () => t.close());

const HEADER =
  'unit,conductor,method,massG,lengthMm,count,strandDiameterMm,resistanceOhm,temperatureC,diameterMm,instruments,unitRef';
const count = (entity: typeof Reading | typeof Sample) =>
  t.app.get(MikroORM).em.fork().count(entity);

async function send(lotId: number, csv: string, who: string = DEMO.clerk) {
  return t.http
    .post(`/api/lots/${lotId}/readings/import`)
    .set('Authorization', `Bearer ${await t.token(who)}`)
    .attach('file', Buffer.from(csv), { filename: 'bench.csv', contentType: 'text/csv' });
}

describe('readings CSV import', () => {
  it('imports every row, creating samples, and moves the lot to awaiting_decision', async () => {
    const lotId = await createLot(t, kit);
    const b = `${bench.balance.serial};${bench.rule.serial}`;
    const rows = [1, 2, 3].flatMap((u) => [
      `${u},power,mass,195,1000,,,,,,${b},SPOOL-${u}`,
      `${u},2,mass,194.5,1000,,,,,,${b},SPOOL-${u}`,
    ]);
    rows.push(
      `1,power,resistance,,1000,,,0.000805,20.5,,${bench.meter.serial};${bench.thermometer.serial},`,
    );
    const res = await send(lotId, [HEADER, ...rows].join('\n'));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    expect(res.body.imported).toBe(7);
    expect(res.body.readings[6]).toMatchObject({
      method: 'resistance',
      identifiedMaterial: 'copper',
      verdict: 'conforms',
    });
    expect((await lotRow(t, lotId)).status).toBe('awaiting_decision');
    const detail = await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    expect(detail.body.samples).toHaveLength(6);
    expect(detail.body.samples[0]).toMatchObject({ seq: 1, unitRef: 'SPOOL-1' });
    expect(detail.body.evaluation).toMatchObject({ samplesTested: 3, recommendation: 'accept' });
  });

  it('refuses the whole file when one row is bad, listing every error by row and column; saves nothing', async () => {
    const lotId = await createLot(t, kit);
    const [readingsBefore, samplesBefore] = [await count(Reading), await count(Sample)];
    const b = bench.balance.serial;
    const csv = [
      HEADER,
      `1,power,mass,195,1000,,,,,,${b},`,
      `1,ground,mass,heavy,1000,,,,,,${b};NO-SUCH-1,`,
      `2,speaker,diameter,,,,,,,5.2,${bench.micrometer.serial},`,
      `4,power,mass,195,1000,,,,,,${b},`,
      `2,power,mass,195,1000,,,,,,${bench.overdueBalance.serial},`,
      `3,power,strands,,,0,0.25,,,,${bench.micrometer.serial},`,
    ].join('\n');
    const res = await send(lotId, csv);
    expect(res.status).toBe(422);
    expect(res.body.message).toMatch(/nothing was imported/);
    expect(res.body.errors).toEqual(
      expect.arrayContaining([
        { row: 3, column: 'massG', message: 'massG must be a number (got "heavy")' },
        {
          row: 3,
          column: 'instruments',
          message: 'no instrument with serial NO-SUCH-1 in the register',
        },
        expect.objectContaining({ row: 4, column: 'conductor' }),
        expect.objectContaining({
          row: 5,
          column: 'unit',
          message: expect.stringMatching(/beyond the plan/),
        }),
        expect.objectContaining({
          row: 6,
          column: 'instruments',
          message: expect.stringContaining('2020-06-30'),
        }),
        { row: 7, column: 'count', message: 'count must be at least 1 strand' },
      ]),
    );
    expect(res.body.errors.some((e: { row: number }) => e.row === 2)).toBe(false);
    expect(await count(Reading)).toBe(readingsBefore);
    expect(await count(Sample)).toBe(samplesBefore);
    expect((await lotRow(t, lotId)).status).toBe('on_hold');
  });

  it('refuses a file without the needed columns, and callers without the role', async () => {
    const lotId = await createLot(t, kit);
    const res = await send(lotId, 'unit,method\n1,mass\n');
    expect(res.status).toBe(422);
    expect(res.body.errors).toEqual([
      { row: 1, column: 'conductor', message: 'column conductor is missing' },
      { row: 1, column: 'instruments', message: 'column instruments is missing' },
    ]);
    expect((await send(lotId, `${HEADER}\n`, DEMO.buyer)).status).toBe(403);
    const qa = await send(
      lotId,
      `${HEADER}\n1,power,mass,195,1000,,,,,,${bench.balance.serial},`,
      DEMO.qa,
    );
    expect(qa.status).toBe(201);
    const big = await send(lotId, `${HEADER}\n${'x'.repeat(2 * 1024 * 1024)}`);
    expect(big.status).toBe(413);
    expect(big.body.message).toMatch(/larger than 2 MB/);
  });
});

describe('readings CSV import, one write per file', () => {
  const audits = (lotId: number, action: string) =>
    t.app.get(MikroORM).em.fork().count(AuditEvent, { lotId, action });
  const massRow = (u: number) => `${u},power,mass,195,1000,,,,,,${bench.balance.serial},`;
  const resistanceRow = (u: number) =>
    `${u},power,resistance,,1000,,,0.000805,20.5,,${bench.meter.serial};${bench.thermometer.serial},`;

  it('computes every reading with all of its sample’s readings in the file, and moves the lot once', async () => {
    const lotId = await createLot(t, kit);
    const res = await send(lotId, [HEADER, massRow(1), resistanceRow(1)].join('\n'));
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // The mass reading comes first in the file, yet knows the material the pair identifies.
    expect(
      res.body.readings.map((r: { identifiedMaterial: string }) => r.identifiedMaterial),
    ).toEqual(['copper', 'copper']);
    expect(await audits(lotId, 'reading.create')).toBe(2);
    expect(await audits(lotId, 'reading.recompute')).toBe(0);
    expect(await audits(lotId, 'lot.status')).toBe(1);
  });

  it('recomputes the readings stored before the file, audited as reading.recompute', async () => {
    const lotId = await createLot(t, kit);
    expect((await send(lotId, [HEADER, massRow(1)].join('\n'))).status).toBe(201);
    const second = await send(lotId, [HEADER, resistanceRow(1)].join('\n'));
    expect(second.status, JSON.stringify(second.body)).toBe(201);
    const detail = await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    const mass = detail.body.samples[0].readings.find(
      (r: { method: string }) => r.method === 'mass',
    );
    expect(mass.identifiedMaterial).toBe('copper');
    expect(await audits(lotId, 'reading.recompute')).toBe(1);
  });

  it('answers a retry with the same Idempotency-Key with the first answer and records nothing', async () => {
    const lotId = await createLot(t, kit);
    const csv = [HEADER, massRow(1), massRow(2)].join('\n');
    const withKey = async (key: string, body = csv) =>
      t.http
        .post(`/api/lots/${lotId}/readings/import`)
        .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
        .set('Idempotency-Key', key)
        .attach('file', Buffer.from(body), { filename: 'bench.csv', contentType: 'text/csv' });
    const first = await withKey('bench-2026-12-03-a');
    expect(first.status).toBe(201);
    const before = await count(Reading);
    const retry = await withKey('bench-2026-12-03-a');
    expect(retry.status).toBe(201);
    expect(retry.headers['idempotent-replayed']).toBe('true');
    expect(retry.body).toEqual(first.body);
    expect(await count(Reading)).toBe(before);
    const other = await withKey('bench-2026-12-03-a', [HEADER, massRow(3)].join('\n'));
    expect(other.status).toBe(422);
    expect(other.body.message).toMatch(/Idempotency-Key was already used/);
    const bad = await withKey('two words');
    expect(bad.status).toBe(400);
    expect(bad.body.message).toEqual([expect.stringMatching(/^Idempotency-Key must be/)]);
    expect(await count(Reading)).toBe(before);
  });

  it('answers the same file sent again without a key with the first answer', async () => {
    const lotId = await createLot(t, kit);
    const csv = [HEADER, massRow(1)].join('\n');
    const first = await send(lotId, csv);
    const before = await count(Reading);
    const again = await send(lotId, csv);
    expect(again.status).toBe(201);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(first.body);
    expect(await count(Reading)).toBe(before);
  });

  it('writes a long file in statements of many rows, each answered reading being its own row', async () => {
    // Level II at 1 200 kits: 80 units × 2 conductors (ISO 2859-1 Table I, II-A: letter J).
    const big = await createProduct(
      t,
      [
        { purpose: 'power', gauge: '4 AWG' },
        { purpose: 'ground', gauge: '4 AWG' },
      ],
      { level: 'II', aql: '1.0' },
    );
    const lotId = await createLot(t, big, 1200);
    // 130 rows: two statements of 50 and 30 rows one by one; every mass its own.
    const rows = Array.from({ length: 130 }, (_, i) => ({
      unit: (i % 80) + 1,
      conductor: i < 80 ? 'power' : 'ground',
      massG: Number((193 + i / 50).toFixed(2)),
    }));
    const csv = [
      HEADER,
      ...rows.map(
        (r) =>
          `${r.unit},${r.conductor},mass,${r.massG},1000,,,,,,${bench.balance.serial};${bench.rule.serial},`,
      ),
    ].join('\n');
    const res = await send(lotId, csv);
    expect(res.status, JSON.stringify(res.body).slice(0, 500)).toBe(201);
    const answered = res.body.readings as { id: number; inputs: { massG: number } }[];
    expect(answered.map((r) => r.inputs.massG)).toEqual(rows.map((r) => r.massG));
    const em = t.app.get(MikroORM).em.fork();
    const stored = await em.find(
      Reading,
      { id: { $in: answered.map((r) => r.id) } },
      { populate: ['sample.conductor'] },
    );
    const byId = new Map(stored.map((r) => [r.id, r]));
    for (const [i, row] of rows.entries()) {
      const reading = byId.get(answered[i].id);
      expect(reading, `row ${i + 2}`).toBeDefined();
      expect(reading!.inputs.massG, `row ${i + 2}`).toBe(row.massG);
      expect(reading!.sample.seq, `row ${i + 2}`).toBe(row.unit);
      expect(reading!.sample.conductor.purpose, `row ${i + 2}`).toBe(row.conductor);
    }
    // The audit names each reading with what it stored.
    const created = await em.find(AuditEvent, { lotId, action: 'reading.create' });
    expect(created).toHaveLength(130);
    for (const event of created) {
      const reading = byId.get(event.entityId as number);
      expect((event.after as { inputs: { massG: number } }).inputs.massG).toBe(
        reading!.inputs.massG,
      );
    }
    expect(await audits(lotId, 'sample.create')).toBe(130);
    // The answer kept for a retry is the one given.
    const again = await send(lotId, csv);
    expect(again.headers['idempotent-replayed']).toBe('true');
    expect(again.body).toEqual(res.body);
  });

  it('records two retries sent at the same moment once', async () => {
    const lotId = await createLot(t, kit);
    const csv = [HEADER, massRow(1), massRow(2), massRow(3)].join('\n');
    const before = await count(Reading);
    const token = await t.token(DEMO.clerk);
    const post = () =>
      t.http
        .post(`/api/lots/${lotId}/readings/import`)
        .set('Authorization', `Bearer ${token}`)
        .set('Idempotency-Key', 'twice-at-once')
        .attach('file', Buffer.from(csv), { filename: 'bench.csv', contentType: 'text/csv' });
    const answers = await Promise.all([post(), post()]);
    expect(answers.map((a) => a.status)).toEqual([201, 201]);
    expect(answers[0].body).toEqual(answers[1].body);
    expect(await count(Reading)).toBe(before + 3);
  });

  it(`refuses a file of more than ${MAX_IMPORT_ROWS} rows, and numbers a person would not write`, async () => {
    const lotId = await createLot(t, kit);
    const before = await count(Reading);
    const rows = Array.from({ length: MAX_IMPORT_ROWS + 1 }, () => massRow(1));
    const big = await send(lotId, [HEADER, ...rows].join('\n'));
    expect(big.status).toBe(422);
    expect(big.body.errors).toEqual([
      {
        row: MAX_IMPORT_ROWS + 2,
        column: null,
        message: expect.stringContaining(`at most ${MAX_IMPORT_ROWS}`),
      },
    ]);
    const hex = await send(
      lotId,
      [HEADER, `1,power,mass,0x10,1000,,,,,,${bench.balance.serial},`].join('\n'),
    );
    expect(hex.status).toBe(422);
    expect(hex.body.errors).toContainEqual({
      row: 2,
      column: 'massG',
      message: 'massG must be a number (got "0x10")',
    });
    expect(hex.body.errors.every((e: { column: string }) => e.column === 'massG')).toBe(true);
    expect(await count(Reading)).toBe(before);
  });
});

describe('an import and the rest of the server', () => {
  const massRow = (u: number) => `${u},power,mass,195,1000,,,,,,${bench.balance.serial},`;
  // The one write path is watched, not replaced: each wrapper calls the real method.
  const watch = () => {
    const writer = t.app.get(ReadingWriter);
    const prepare = writer.prepare.bind(writer);
    const commit = writer.commit.bind(writer);
    return { writer, prepare, commit };
  };

  it('answers /api/health asked while 2 000 rows are computed before the import starts writing', async () => {
    // Level II at 1 200 kits: 80 units × 2 conductors (ISO 2859-1 Table I, II-A: letter J),
    // room for 2 000 readings at most 20 a sample.
    const big = await createProduct(
      t,
      [
        { purpose: 'power', gauge: '4 AWG' },
        { purpose: 'ground', gauge: '4 AWG' },
      ],
      { level: 'II', aql: '1.0' },
    );
    const lotId = await createLot(t, big, 1200);
    const rows = Array.from({ length: 2000 }, (_, i) => {
      const unit = (i % 80) + 1;
      const conductor = (Math.floor(i / 80) % 2) + 1;
      const massG = (195 + (i % 7) / 10).toFixed(1);
      return `${unit},${conductor},mass,${massG},1000,,,,,,${bench.balance.serial};${bench.rule.serial},`;
    });
    const { writer, prepare, commit } = watch();
    const order: string[] = [];
    let health: Promise<void> | undefined;
    const spies = [
      vi.spyOn(writer, 'prepare').mockImplementation((...args) => {
        health = t.http.get('/api/health').then((r) => {
          order.push(`health ${r.status}`);
        });
        return prepare(...args);
      }),
      vi.spyOn(writer, 'commit').mockImplementation((...args) => {
        order.push('write transaction');
        return commit(...args);
      }),
    ];
    try {
      const res = await send(lotId, [HEADER, ...rows].join('\n'));
      order.push(`import ${res.status}`);
      expect(res.body.imported, JSON.stringify(res.body).slice(0, 500)).toBe(2000);
      await health;
    } finally {
      for (const spy of spies) spy.mockRestore();
    }
    expect(order).toEqual(['health 200', 'write transaction', 'import 201']);
    expect(
      await t.app
        .get(MikroORM)
        .em.fork()
        .count(Reading, { sample: { lot: lotId } }),
    ).toBe(2000);
  }, 120_000);

  it('computes again in its transaction when a reading arrived after the file was computed', async () => {
    const lotId = await createLot(t, kit);
    const sample = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: kit.conductorIds[0],
      seq: 1,
    });
    expect(sample.status).toBe(201);
    const { writer, prepare } = watch();
    let between: { status: number; body: { id: number } } | undefined;
    const spy = vi.spyOn(writer, 'prepare').mockImplementation(async (...args) => {
      const prepared = await prepare(...args);
      // Another clerk's resistance reading of unit 1, power, lands before the import writes.
      between = await as(t, DEMO.clerk, 'post', `/api/samples/${sample.body.id}/readings`, {
        method: 'resistance',
        lengthMm: 1000,
        resistanceOhm: 0.000805,
        temperatureC: 20.5,
        instrumentIds: [bench.meter.id, bench.thermometer.id],
      });
      return prepared;
    });
    let res;
    try {
      res = await send(lotId, [HEADER, massRow(1)].join('\n'));
    } finally {
      spy.mockRestore();
    }
    expect(between?.status, JSON.stringify(between?.body)).toBe(201);
    expect(res.status, JSON.stringify(res.body)).toBe(201);
    // The imported mass was computed with the resistance that came first: copper found.
    expect(res.body.readings[0]).toMatchObject({
      sampleId: sample.body.id,
      identifiedMaterial: 'copper',
    });
    const detail = await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    expect(detail.body.samples[0].readings).toHaveLength(2);
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MikroORM } from '@mikro-orm/core';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { Reading } from '../src/inspection/entities/reading.entity';
import { Sample } from '../src/inspection/entities/sample.entity';
import {
  as,
  createLot,
  GOOD_4AWG_MASS,
  type Bench,
  type Catalog,
  SPOOL_4AWG,
  startWithBench,
} from './helpers/fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

// Issue 15: bench mode's writes. Client ids make a retried reading or sample land once;
// a clerk voids their own slip until the lot is decided.
let t: TestApp;
let bench: Bench;
let spool: Catalog;
// One 4 AWG copper conductor; S-3, AQL 15 → n 3, Ac 1, Re 2.
beforeAll(async () => ({ t, bench, spool } = await startWithBench({ spool: SPOOL_4AWG })));
afterAll(async () => t.close());

const count = (entity: typeof Reading | typeof Sample, where: object) =>
  t.app.get(MikroORM).em.fork().count(entity, where);

const ID_A = '0d6c3f5e-6a53-4a8e-9f11-2b7c1e0a9d41';
const ID_B = '5f0a2c9b-8e71-4d3a-b6c4-91e2f7a3d058';
const ID_C = 'a3e1b7c2-4d5f-4a6b-8c9d-0e1f2a3b4c5d';

const reading = (sampleId: number, body: object = {}, who: string = DEMO.clerk) =>
  as(t, who, 'post', `/api/samples/${sampleId}/readings`, {
    ...GOOD_4AWG_MASS,
    instrumentIds: [bench.balance.id, bench.rule.id],
    ...body,
  });

describe('clientId on samples and readings', () => {
  it('answers a repeated sample clientId with the sample made first, also when sent at once', async () => {
    const lotId = await createLot(t, spool);
    const [conductorId] = spool.conductorIds;
    const body = { conductorId, seq: 2, clientId: ID_A };
    const answers = await Promise.all(
      [1, 2, 3].map(() => as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, body)),
    );
    for (const a of answers) expect(a.status, JSON.stringify(a.body)).toBe(201);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    const again = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, body);
    expect(again.body).toMatchObject({ id: answers[0].body.id, seq: 2 });
    expect(await count(Sample, { lot: lotId })).toBe(1);
    // The same id for another lot is a client's mistake, said plainly.
    const other = await createLot(t, spool);
    const wrong = await as(t, DEMO.clerk, 'post', `/api/lots/${other}/samples`, body);
    expect(wrong.status).toBe(409);
    expect(wrong.body.message).toMatch(/already used for a sample of lot/);
  });

  it('answers a repeated reading clientId with the reading recorded first, never a second one', async () => {
    const lotId = await createLot(t, spool);
    const made = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: spool.conductorIds[0],
    });
    const sampleId = made.body.id as number;
    const answers = await Promise.all(
      [1, 2, 3, 4].map(() => reading(sampleId, { clientId: ID_B })),
    );
    for (const a of answers) expect(a.status, JSON.stringify(a.body)).toBe(201);
    expect(new Set(answers.map((a) => a.body.id)).size).toBe(1);
    expect(answers[0].body).toMatchObject({ verdict: 'conforms', measuresAs: '4 AWG' });
    expect(await count(Reading, { sample: sampleId })).toBe(1);
    const audits = await t.app
      .get(MikroORM)
      .em.fork()
      .count(AuditEvent, { action: 'reading.create', entityId: answers[0].body.id });
    expect(audits).toBe(1);

    // A later retry gets the same reading, even with other values (it is the same request).
    const later = await reading(sampleId, { clientId: ID_B, massG: 150 });
    expect(later.body).toMatchObject({ id: answers[0].body.id, inputs: { massG: 195 } });
    // Without a clientId, or with a new one, a second reading is recorded.
    expect((await reading(sampleId, { clientId: ID_C })).body.id).not.toBe(answers[0].body.id);
    expect(await count(Reading, { sample: sampleId })).toBe(2);
    // A sample's id is not a reading's.
    const crossed = await reading(sampleId, { clientId: ID_A });
    expect(crossed.status).toBe(409);
    expect(crossed.body.message).toMatch(/already used for a sample/);
  });

  it('refuses a clientId that is not a UUID, naming the field', async () => {
    const lotId = await createLot(t, spool);
    const res = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: spool.conductorIds[0],
      clientId: 'retry-1',
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toContain('clientId must be a UUID');
  });
});

describe('a clerk corrects a slip', () => {
  it('lets a clerk void their own reading with a reason, not another’s, and not after the decision', async () => {
    const lotId = await createLot(t, spool);
    const ids: number[] = [];
    for (const seq of [1, 2, 3]) {
      const s = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
        conductorId: spool.conductorIds[0],
        seq,
      });
      ids.push(s.body.id as number);
    }
    const own = await reading(ids[0]);
    const qas = await reading(ids[1], {}, DEMO.qa);
    const short = await as(t, DEMO.clerk, 'post', `/api/readings/${own.body.id}/void`, {
      reason: 'typo',
    });
    expect(short.status).toBe(400);
    const voided = await as(t, DEMO.clerk, 'post', `/api/readings/${own.body.id}/void`, {
      reason: 'length mis-typed on the bench',
    });
    expect(voided.status, JSON.stringify(voided.body)).toBe(200);
    expect(voided.body).toMatchObject({
      voided: true,
      voidReason: 'length mis-typed on the bench',
    });
    const audit = await t.app
      .get(MikroORM)
      .em.fork()
      .count(AuditEvent, { action: 'reading.void', entityId: own.body.id });
    expect(audit).toBe(1);

    const notHers = await as(t, DEMO.clerk, 'post', `/api/readings/${qas.body.id}/void`, {
      reason: 'not my reading at all',
    });
    expect(notHers.status).toBe(403);
    expect(notHers.body.message).toMatch(/only readings they took/);

    // Decided: the clerk may no longer void, the QA lead still may.
    const later = await reading(ids[0]);
    await reading(ids[2]);
    const lot = await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    expect(lot.body.status).toBe('awaiting_decision');
    const decided = await as(t, DEMO.qa, 'post', `/api/lots/${lotId}/decisions`, {
      outcome: 'accept',
      reason: '',
      version: lot.body.version,
    });
    expect(decided.status, JSON.stringify(decided.body)).toBe(201);
    const tooLate = await as(t, DEMO.clerk, 'post', `/api/readings/${later.body.id}/void`, {
      reason: 'length mis-typed on the bench',
    });
    expect(tooLate.status).toBe(422);
    expect(tooLate.body.message).toMatch(/only a QA lead can void/);
    const byQa = await as(t, DEMO.qa, 'post', `/api/readings/${later.body.id}/void`, {
      reason: 'balance found out of calibration',
    });
    expect(byQa.status).toBe(200);
  });
});

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MikroORM } from '@mikro-orm/core';
import { Decision } from '../src/decisions/entities/decision.entity';
import { Nonconformance } from '../src/decisions/entities/nonconformance.entity';
import { Lot } from '../src/lots/entities/lot.entity';
import { User } from '../src/users/entities/user.entity';
import {
  as,
  createLot,
  createProduct,
  GOOD_4AWG_MASS,
  type Bench,
  startWithBench,
} from './helpers/fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

let t: TestApp;
let bench: Bench;
beforeAll(async () => ({ t, bench } = await startWithBench({})));
afterAll(async () => t.close());

describe('GET /api/lots/:id', () => {
  it('gives every role the lot with product, conductors, samples, readings, photos and evaluation', async () => {
    const kit = await createProduct(
      t,
      [
        { purpose: 'power', gauge: '1/0' },
        { purpose: 'ground', gauge: '4 AWG' },
      ],
      { supplierStatus: 'suspended' },
    );
    const lotId = await createLot(t, kit);
    const s = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: kit.conductorIds[1],
      unitRef: 'KIT-0042',
    });
    await as(t, DEMO.clerk, 'post', `/api/samples/${s.body.id}/readings`, {
      ...GOOD_4AWG_MASS,
      instrumentIds: [bench.balance.id],
    });
    for (const who of Object.values(DEMO)) {
      const res = await as(t, who, 'get', `/api/lots/${lotId}`);
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({
        id: lotId,
        status: 'inspecting',
        version: expect.any(Number),
        samplingPlan: { sampleSize: 3, accept: 1, reject: 2, codeLetter: 'B' },
        supplier: { id: kit.supplierId, status: 'suspended' },
        supplierWarning: expect.stringMatching(/is suspended/),
        product: {
          id: kit.productId,
          kind: 'kit',
          conductors: [
            {
              id: kit.conductorIds[0],
              purpose: 'power',
              gauge: '1/0 AWG',
              claimedMaterial: 'copper',
            },
            { id: kit.conductorIds[1], purpose: 'ground', gauge: '4 AWG' },
          ],
        },
        samples: [
          {
            id: s.body.id,
            seq: 1,
            unitRef: 'KIT-0042',
            conductorId: kit.conductorIds[1],
            verdict: 'conforms',
            readings: [{ method: 'mass', verdict: 'conforms', voided: false, measuresAs: '4 AWG' }],
          },
        ],
        photos: [],
        evaluation: {
          samplesPlanned: 3,
          samplesTested: 0,
          nonconforming: 0,
          inconclusive: 0,
          recommendation: 'incomplete',
        },
        decisions: [],
        ncrNumber: null,
      });
    }
    expect((await t.http.get(`/api/lots/${lotId}`)).status).toBe(401);
    expect((await as(t, DEMO.clerk, 'get', '/api/lots/999999')).status).toBe(404);
  });

  it('lists decisions newest first with the NCR number of a reject', async () => {
    const spool = await createProduct(t);
    const lotId = await createLot(t, spool);
    const em = t.app.get(MikroORM).em.fork();
    const lot = await em.findOneOrFail(Lot, { id: lotId });
    const qa = await em.findOneOrFail(User, { email: DEMO.qa });
    const base = { lot, recommendation: 'reject', evaluation: {}, lotVersion: 1, decidedBy: qa };
    const first = em.create(Decision, {
      ...base,
      outcome: 'accept_on_concession',
      reason: 'Accepted for the bench while the supplier answers',
      decidedAt: new Date('2026-11-02T10:00:00Z'),
    });
    const second = em.create(Decision, {
      ...base,
      outcome: 'reject',
      reason: 'Undersized on review',
      decidedAt: new Date('2026-11-03T10:00:00Z'),
    });
    em.create(Nonconformance, {
      number: 'NCR-2026-0007',
      year: 2026,
      seq: 7,
      lot,
      decision: second,
    });
    await em.flush();
    const res = await as(t, DEMO.buyer, 'get', `/api/lots/${lotId}`);
    expect(res.body.decisions.map((d: { id: number }) => d.id)).toEqual([second.id, first.id]);
    expect(res.body.decisions[0]).toMatchObject({
      outcome: 'reject',
      decidedBy: { id: qa.id, name: qa.name },
      ncrNumber: 'NCR-2026-0007',
    });
    expect(res.body.decisions[1].ncrNumber).toBeNull();
    expect(res.body.ncrNumber).toBe('NCR-2026-0007');
  });
});

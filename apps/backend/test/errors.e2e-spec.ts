import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import {
  as,
  createLot,
  type Bench,
  type Catalog,
  SPOOL_4AWG,
  startWithBench,
} from './helpers/fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

let t: TestApp;
let bench: Bench;
let kit: Catalog;
beforeAll(async () => ({ t, bench, kit } = await startWithBench({ kit: SPOOL_4AWG })));
afterAll(async () => t.close());

describe('errors as data: every problem names its field', () => {
  it('gives validation problems as errors [{field, message}] beside the usual message list', async () => {
    const lotId = await createLot(t, kit);
    const res = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: 'power',
      seq: 0,
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(expect.arrayContaining([expect.stringMatching(/^seq/)]));
    for (const e of res.body.errors) expect(e.message.startsWith(e.field)).toBe(true);
    expect(res.body.errors.map((e: { field: string }) => e.field)).toEqual(
      expect.arrayContaining(['conductorId', 'seq']),
    );
  });

  it('gives a rule’s refusal its field: the instruments of a reading, the unit of a sample', async () => {
    const lotId = await createLot(t, kit);
    const sample = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: kit.conductorIds[0],
    });
    expect(sample.status).toBe(201);
    const wrongKind = await as(t, DEMO.clerk, 'post', `/api/samples/${sample.body.id}/readings`, {
      method: 'mass',
      massG: 195,
      lengthMm: 1000,
      instrumentIds: [bench.micrometer.id],
    });
    expect(wrongKind.status).toBe(422);
    expect(typeof wrongKind.body.message).toBe('string');
    expect(wrongKind.body.errors).toEqual([
      { field: 'instrumentIds', message: wrongKind.body.message },
    ]);
    const foreign = await as(t, DEMO.clerk, 'post', `/api/samples/${sample.body.id}/readings`, {
      method: 'mass',
      massG: 195,
      lengthMm: 1000,
      diameterMm: 5,
      instrumentIds: [bench.balance.id],
    });
    expect(foreign.status).toBe(400);
    expect(foreign.body.errors).toEqual([
      { field: 'diameterMm', message: 'diameterMm is not used by the mass method' },
    ]);
    const taken = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
      conductorId: kit.conductorIds[0],
      seq: 1,
    });
    expect(taken.status).toBe(409);
    expect(taken.body.errors).toEqual([{ field: 'seq', message: taken.body.message }]);
  });

  it('lists a problem that names no field with field null', async () => {
    const res = await as(t, DEMO.clerk, 'post', '/api/samples/999999/readings', {
      method: 'mass',
      massG: 195,
      lengthMm: 1000,
      instrumentIds: [bench.balance.id],
    });
    expect(res.status).toBe(404);
    expect(res.body.errors).toEqual([{ field: null, message: res.body.message }]);
  });
});

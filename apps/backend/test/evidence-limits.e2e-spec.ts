import { MikroORM } from '@mikro-orm/core';
import { Jimp } from 'jimp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { Reading } from '../src/inspection/entities/reading.entity';
import { MAX_LIVE_READINGS_PER_SAMPLE } from '../src/inspection/reading-writer';
import { Photo } from '../src/photos/entities/photo.entity';
import { Fixtures, rejectedLot } from './helpers/decision-fixtures';
import { startMailDev, type MailDev } from './helpers/maildev';
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

// Issue 17 item 10: at most 20 live readings per sample (a clear 422 through the one
// reading write path, form and import alike), and a lot's evidence frozen once a return of
// it went to the supplier (no void, no superseding decision, no new photo; a draft or a
// cancelled return freezes nothing). Runs on both drivers, e-mail through a real MailDev.

let mail: MailDev;
let t: TestApp;
let bench: Bench;
let spool: Catalog;
let fx: Fixtures;
let png: Buffer;

beforeAll(async () => {
  mail = await startMailDev();
  const env = { SMTP_URL: mail.smtpUrl };
  ({ t, bench, spool } = await startWithBench({ spool: SPOOL_4AWG }, env));
  fx = new Fixtures(t);
  png = await new Jimp({ width: 8, height: 8, color: 0xb87333ff }).getBuffer('image/png');
});
afterAll(async () => {
  await t.close();
  await mail.stop();
});

const em = () => t.app.get(MikroORM).em.fork();
const massBody = (massG = 195) => ({
  ...GOOD_4AWG_MASS,
  massG,
  instrumentIds: [bench.balance.id, bench.rule.id],
});

async function newSample(lotId: number) {
  const res = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, {
    conductorId: spool.conductorIds[0],
  });
  expect(res.status, JSON.stringify(res.body)).toBe(201);
  return res.body as { id: number; seq: number };
}

describe(`readings per sample (at most ${MAX_LIVE_READINGS_PER_SAMPLE} that stand)`, () => {
  it('refuses one more with 422 on the sample, until a wrong one is voided', async () => {
    expect(MAX_LIVE_READINGS_PER_SAMPLE).toBe(20);
    const lotId = await createLot(t, spool);
    const sample = await newSample(lotId);
    const path = `/api/samples/${sample.id}/readings`;
    const made: number[] = [];
    for (let i = 0; i < 20; i++) {
      const res = await as(t, DEMO.clerk, 'post', path, massBody(195 + i / 100));
      expect(res.status, JSON.stringify(res.body)).toBe(201);
      made.push(res.body.id);
    }
    const more = await as(t, DEMO.clerk, 'post', path, massBody());
    expect(more.status).toBe(422);
    expect(more.body.errors).toEqual([
      {
        field: 'sampleId',
        message: `Unit ${sample.seq}, power conductor already holds 20 readings that stand, the most one sample may hold: void a wrong one before recording another.`,
      },
    ]);
    expect(await em().count(Reading, { sample: sample.id })).toBe(20);

    const voided = await as(t, DEMO.qa, 'post', `/api/readings/${made[0]}/void`, {
      reason: 'Weighed with the spool label still on',
    });
    expect(voided.status).toBe(200);
    const again = await as(t, DEMO.clerk, 'post', path, massBody());
    expect(again.status, JSON.stringify(again.body)).toBe(201);
    expect(await em().count(Reading, { sample: sample.id, voided: false })).toBe(20);
  });

  it('refuses an import that would pass the cap, naming the row and the unit column; saves nothing', async () => {
    const lotId = await createLot(t, spool);
    const serials = `${bench.balance.serial};${bench.rule.serial}`;
    const rows = Array.from({ length: 21 }, () => `1,power,mass,195,1000,${serials}`);
    const before = await em().count(Reading);
    const res = await t.http
      .post(`/api/lots/${lotId}/readings/import`)
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .attach(
        'file',
        Buffer.from(['unit,conductor,method,massG,lengthMm,instruments', ...rows].join('\n')),
        { filename: 'bench.csv', contentType: 'text/csv' },
      );
    expect(res.status).toBe(422);
    // Header is row 1: the 21st reading is row 22.
    expect(res.body.errors).toEqual([
      {
        row: 22,
        column: 'unit',
        message: expect.stringContaining('already holds 20 readings that stand'),
      },
    ]);
    expect(await em().count(Reading)).toBe(before);
  });
});

describe('a lot whose return went to the supplier', () => {
  const step = async (id: number, name: string, body: Record<string, unknown>) =>
    as(t, DEMO.buyer, 'post', `/api/returns/${id}/${name}`, body);

  async function lotOnReturn() {
    const supplier = await fx.supplier('Freezewater Cable Supply', 'rma@freezewater.example');
    const product = await fx.product(supplier.id);
    const { lot } = await rejectedLot(t, fx, product.id);
    const ret = await as(t, DEMO.buyer, 'post', '/api/returns', { lotIds: [lot.id] });
    expect(ret.status, JSON.stringify(ret.body)).toBe(201);
    const readings = await em().find(Reading, { sample: { lot: lot.id } }, { orderBy: { id: 1 } });
    return { lot, ret: ret.body as { id: number; number: string }, readings };
  }

  const photo = async (lotId: number) =>
    t.http
      .post(`/api/lots/${lotId}/photos`)
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .attach('file', png, { filename: 'cut.png', contentType: 'image/png' });

  it('keeps its evidence as sent: no void, no new decision, no new photo (422 saying why)', async () => {
    const { lot, ret, readings } = await lotOnReturn();
    // While the return is a draft nothing was sent: a wrong reading may still be voided.
    const early = await as(t, DEMO.qa, 'post', `/api/readings/${readings[0].id}/void`, {
      reason: 'Cut from the wrong unit',
    });
    expect(early.status, JSON.stringify(early.body)).toBe(200);

    const shipped = await step(ret.id, 'ship', {
      carrier: 'Northline Freight',
      shippedOn: '2026-11-30',
      quantity: 1,
    });
    expect(shipped.status, JSON.stringify(shipped.body)).toBe(200);

    const lateVoid = await as(t, DEMO.admin, 'post', `/api/readings/${readings[1].id}/void`, {
      reason: 'Second thoughts after shipping',
    });
    expect(lateVoid.status).toBe(422);
    expect(lateVoid.body.message).toBe(
      `Lot ${lot.poNumber} went back to the supplier on return ${ret.number} (shipped to the supplier); its evidence is frozen as the supplier received it, so this reading cannot be voided.`,
    );
    expect((await em().findOneOrFail(Reading, readings[1].id)).voided).toBe(false);

    const current = await as(t, DEMO.qa, 'get', `/api/lots/${lot.id}`);
    const decision = await as(t, DEMO.qa, 'post', `/api/lots/${lot.id}/decisions`, {
      outcome: 'accept_on_concession',
      reason: 'Supplier offered a discount on the shipped lot',
      version: current.body.version,
    });
    expect(decision.status).toBe(422);
    expect(decision.body.message).toMatch(
      /evidence is frozen .* its decision cannot be superseded/,
    );

    const photoCount = await em().count(Photo, { lot: lot.id });
    const late = await photo(lot.id);
    expect(late.status).toBe(422);
    expect(late.body.errors).toEqual([
      { field: 'file', message: expect.stringMatching(/no photo can be added to it\.$/) },
    ]);
    expect(await em().count(Photo, { lot: lot.id })).toBe(photoCount);
  });

  it('keeps the photos the supplier was e-mailed: no void once the notice went (422 saying why)', async () => {
    const { lot, ret } = await lotOnReturn();
    const taken = await photo(lot.id);
    expect(taken.status, JSON.stringify(taken.body)).toBe(201);
    const spare = await photo(lot.id);
    expect(spare.status, JSON.stringify(spare.body)).toBe(201);
    // While the return is a draft nothing was sent: a wrong photo may still be voided.
    const early = await as(t, DEMO.qa, 'post', `/api/photos/${spare.body.id}/void`, {
      reason: 'Photo of the neighbouring spool',
    });
    expect(early.status, JSON.stringify(early.body)).toBe(200);

    const emailed = await as(t, DEMO.buyer, 'post', `/api/returns/${ret.id}/email`, {});
    expect(emailed.status, JSON.stringify(emailed.body)).toBe(201);
    expect(emailed.body.status).toBe('sent');
    const now = await as(t, DEMO.buyer, 'get', `/api/returns/${ret.id}`);
    expect(now.body.status).toBe('emailed');

    for (const who of [DEMO.qa, DEMO.admin]) {
      const late = await as(t, who, 'post', `/api/photos/${taken.body.id}/void`, {
        reason: 'Blurred, retake it',
      });
      expect(late.status).toBe(422);
      expect(late.body.message).toBe(
        `Lot ${lot.poNumber} went back to the supplier on return ${ret.number} (e-mailed to the supplier); its evidence is frozen as the supplier received it, so this photo cannot be voided.`,
      );
    }
    const kept = await em().findOneOrFail(Photo, taken.body.id);
    expect(kept.voided).toBe(false);
    expect(kept.voidReason ?? null).toBeNull();
    // The photo voided before the notice stays voided: a void is not undone by the freeze.
    expect((await em().findOneOrFail(Photo, spare.body.id)).voided).toBe(true);
  });

  it('is not frozen by a return cancelled as a draft', async () => {
    const { lot, ret, readings } = await lotOnReturn();
    const before = await photo(lot.id);
    expect(before.status, JSON.stringify(before.body)).toBe(201);
    const cancelled = await step(ret.id, 'cancel', { reason: 'Raised for the wrong lot' });
    expect(cancelled.status, JSON.stringify(cancelled.body)).toBe(200);
    const voided = await as(t, DEMO.qa, 'post', `/api/readings/${readings[0].id}/void`, {
      reason: 'Cut from the wrong unit',
    });
    expect(voided.status, JSON.stringify(voided.body)).toBe(200);
    const photoVoided = await as(t, DEMO.qa, 'post', `/api/photos/${before.body.id}/void`, {
      reason: 'Photo of the neighbouring spool',
    });
    expect(photoVoided.status, JSON.stringify(photoVoided.body)).toBe(200);
    expect((await photo(lot.id)).status).toBe(201);
  });
});

import { MikroORM, type EntityManager } from '@mikro-orm/core';
import { areaFromMass, areaFromResistance, identifyMaterial } from '@gaugeproof/standards';
import { execFileSync } from 'node:child_process';
import { createHash } from 'node:crypto';
import { existsSync, mkdtempSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { Jimp } from 'jimp';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { createApp } from '../src/app.factory';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { isoDate } from '../src/common/calendar';
import { CorrectiveAction } from '../src/corrective-actions/entities/corrective-action.entity';
import { Decision } from '../src/decisions/entities/decision.entity';
import { Nonconformance } from '../src/decisions/entities/nonconformance.entity';
import type { SwitchingRecord } from '../src/decisions/switching';
import type { Instrument } from '../src/instruments/entities/instrument.entity';
import { Reading } from '../src/inspection/entities/reading.entity';
import { resolutionsFor } from '../src/inspection/instrument-resolutions';
import { computeReading, type ReadingInputs } from '../src/inspection/reading-compute';
import { Lot, LOT_STATUSES } from '../src/lots/entities/lot.entity';
import { OutboundMessage } from '../src/mail/entities/outbound-message.entity';
import { Photo } from '../src/photos/entities/photo.entity';
import { InspectionState } from '../src/products/entities/inspection-state.entity';
import { VendorReturn } from '../src/returns/entities/vendor-return.entity';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let em: EntityManager;
const sha = (b: Buffer) => createHash('sha256').update(b).digest('hex');

beforeAll(async () => {
  // How long the demo takes to seed is a bench figure, not a test's (timings never go
  // into tests); the limit here only ends a start that hangs.
  t = await startTestApp({ SEED_DEMO: 'true' });
  em = t.app.get(MikroORM).em.fork();
}, 120_000);
afterAll(async () => t?.close());

const get = async (who: string, path: string) =>
  t.http.get(path).set('Authorization', `Bearer ${await t.token(who)}`);

describe('demo scenario seeded on an empty database', () => {
  it('has lots in every status, each with a timeline', async () => {
    for (const status of LOT_STATUSES) {
      const res = await get(DEMO.qa, `/api/lots?status=${status}`);
      expect(res.status).toBe(200);
      expect(res.body.total, status).toBeGreaterThan(0);
    }
    for (const lot of await em.find(Lot, {})) {
      const events = await em.count(AuditEvent, { lotId: lot.id, action: 'lot.create' });
      expect(events, `lot ${lot.id}`).toBe(1);
    }
    const concession = await em.find(Decision, { outcome: 'accept_on_concession' });
    expect(concession.length).toBeGreaterThan(0);
    expect(concession.every((d) => d.reason.length >= 20)).toBe(true);
    const rejected = await em.find(Lot, { status: { $in: ['rejected', 'returned'] } });
    for (const lot of rejected) expect(await em.count(Nonconformance, { lot })).toBe(1);
  });

  it('leaves one lot awaiting a reject and one awaiting an accept', async () => {
    const waiting = await get(DEMO.qa, '/api/lots?status=awaiting_decision');
    const recommendations = [];
    for (const l of waiting.body.items as { id: number }[]) {
      const detail = await get(DEMO.qa, `/api/lots/${l.id}`);
      recommendations.push(detail.body.evaluation.recommendation);
    }
    expect(recommendations.sort()).toEqual(['accept', 'reject']);
  });

  it('stores every reading as the standards library computes it from its inputs', async () => {
    const readings = await em.find(
      Reading,
      {},
      { populate: ['sample.conductor', 'sample.lot.product'], orderBy: { id: 'asc' } },
    );
    expect(readings.length).toBeGreaterThan(300);
    // A reading is computed with the other readings of its sample that stood with it (all
    // live ones; for a voided one, those taken before its void), newest first.
    const stoodWith = (r: Reading) =>
      readings
        .filter((s) => s !== r && s.sample.id === r.sample.id && !s.voided)
        .filter((s) => !r.voidedAt || s.takenAt <= r.voidedAt)
        .reverse();
    for (const r of readings) {
      const siblings = stoodWith(r);
      const computed = computeReading({
        method: r.method,
        inputs: r.inputs as ReadingInputs,
        fourWire: r.fourWire,
        resolutions: resolutionsFor(r.method, r.instruments as unknown as Instrument[]),
        gaugeLabel: r.sample.conductor.gaugeLabel,
        claimedMaterial: r.sample.conductor.claimedMaterial,
        minAreaRatio: r.sample.lot.product.minAreaRatio,
        conductorClass: r.sample.conductor.conductorClass,
        claimedStrands: r.sample.conductor.claimedStrands,
        siblings: siblings.map((s) => ({
          method: s.method,
          inputs: s.inputs as ReadingInputs,
          areaMm2: s.areaMm2,
          fourWire: s.fourWire,
        })),
      });
      expect(r.areaMm2, `reading ${r.id}`).toBeCloseTo(computed.areaMm2, 9);
      expect(r.verdict, `reading ${r.id}`).toBe(computed.verdict);
      expect(r.measuresAs).toBe(computed.measuresAs);
      expect(r.identifiedMaterial).toBe(computed.identifiedMaterial);
    }
    // By hand for one mass reading: A = m / (ρ · L · (1 + k)), copper 8.89 g/cm³, k = 0.02.
    const mass = readings.find((r) => r.method === 'mass' && !r.voided) as Reading;
    const { massG, lengthMm } = mass.inputs as { massG: number; lengthMm: number };
    expect(mass.areaMm2).toBeCloseTo(massG / (0.00889 * lengthMm * 1.02), 9);
    expect(mass.areaMm2).toBeCloseTo(areaFromMass({ massG, lengthMm }).areaMm2, 12);
  });

  it('finds copper-clad aluminium sold as copper by mass and resistance', async () => {
    const cca = await em.find(
      Reading,
      { materialMismatch: true, identifiedMaterial: 'cca', voided: false },
      { populate: ['sample.lot'] },
    );
    expect(cca.length).toBeGreaterThanOrEqual(6);
    const r = cca.find((x) => x.method === 'resistance') as Reading;
    const mass = await em.findOneOrFail(Reading, { sample: r.sample, method: 'mass' });
    const ri = r.inputs as Record<string, number>;
    const mi = mass.inputs as Record<string, number>;
    const ohmOverMassLength = (ri.resistanceOhm * mi.lengthMm) / ri.lengthMm;
    const id = identifyMaterial({
      massG: mi.massG,
      lengthMm: mi.lengthMm,
      resistanceOhm: ohmOverMassLength,
      temperatureC: ri.temperatureC,
    });
    expect(id.material).toBe('cca');
    const byR = areaFromResistance({ ...r.inputs, material: 'copper' } as never);
    expect(r.areaMm2).toBeCloseTo(byR.areaMm2, 6);
    expect(['rejected', 'returned']).toContain(r.sample.lot.status);
  });

  it('shows on each mass reading the material that its sample’s resistance reading found with it', async () => {
    const found = await em.find(Reading, {
      method: 'resistance',
      voided: false,
      identifiedMaterial: 'cca',
    });
    expect(found.length).toBeGreaterThan(0);
    for (const r of found) {
      const masses = await em.find(Reading, { sample: r.sample, method: 'mass', voided: false });
      expect(masses.length, `sample ${r.sample.id}`).toBeGreaterThan(0);
      for (const m of masses) {
        expect(m, `reading ${m.id}`).toMatchObject({
          identifiedMaterial: 'cca',
          materialMismatch: true,
        });
      }
    }
  });

  it('never used an instrument outside its calibration period', async () => {
    const readings = await em.find(Reading, {});
    for (const r of readings) {
      const day = isoDate(r.takenAt);
      for (const i of r.instruments) {
        expect(i.calibrationDueOn >= day, `reading ${r.id} with ${i.serial} on ${day}`).toBe(true);
      }
    }
    expect(readings.every((r) => r.takenAt.getTime() <= Date.now())).toBe(true);
    const voided = readings.filter((r) => r.voided);
    expect(voided.length).toBeGreaterThan(0);
    expect(voided.every((r) => (r.voidReason ?? '').length > 10)).toBe(true);
  });

  it('stores drawn photos with their sha256 and thumbnails as the upload service makes them', async () => {
    const photos = await em.find(Photo, {});
    expect(photos.length).toBeGreaterThanOrEqual(4);
    for (const p of photos) {
      const original = readFileSync(join(t.config.uploadDir, p.storageKey));
      expect(sha(original)).toBe(p.sha256);
      expect(p.sizeBytes).toBe(original.length);
      expect(existsSync(join(t.config.uploadDir, p.thumbnailKey))).toBe(true);
      const thumb = await Jimp.fromBuffer(readFileSync(join(t.config.uploadDir, p.thumbnailKey)));
      expect([thumb.bitmap.width, thumb.bitmap.height]).toEqual([320, 240]);
    }
    const res = await get(DEMO.clerk, `/api/photos/${photos[0].id}/original`);
    expect(res.status).toBe(200);
  });

  it('returned the CCA lots with a chargeback and e-mail, and has an overdue SCAR', async () => {
    const returns = await em.find(VendorReturn, {}, { populate: ['lots'] });
    expect(returns.map((r) => r.status).sort()).toEqual(['closed', 'shipped']);
    const shipped = returns.find((r) => r.status === 'shipped')!;
    expect(shipped.rmaNumber).toBeTruthy();
    // The demo shop's EUR, and one return the supplier's export office invoices in USD.
    expect(shipped).toMatchObject({ carrier: expect.any(String), currency: 'USD' });
    const closed = returns.find((r) => r.status === 'closed')!;
    expect(closed.currency).toBe('EUR');
    expect(closed.creditAmount).toBe(closed.chargebackTotal);
    expect(returns.every((r) => r.chargebackTotal > 0)).toBe(true);
    expect(returns.flatMap((r) => r.lots.getItems()).every((l) => l.status === 'returned')).toBe(
      true,
    );
    expect(await em.count(OutboundMessage, { relatedType: 'vendor_return' })).toBe(returns.length);
    const today = isoDate(new Date());
    const overdue = await em.find(CorrectiveAction, { status: 'open', dueOn: { $lt: today } });
    expect(overdue.length).toBe(1);
    expect(await em.count(CorrectiveAction, { status: 'responded' })).toBeGreaterThan(0);
  });

  it("tells the installer one size per conductor in the CCA return's evidence pack: the smaller its readings give", async () => {
    const shipped = await em.findOneOrFail(VendorReturn, { status: 'shipped' });
    const res = await t.http
      .get(`/api/returns/${shipped.id}/evidence.pdf`)
      .set('Authorization', `Bearer ${await t.token(DEMO.buyer)}`)
      .buffer(true)
      .parse((r, cb) => {
        const chunks: Buffer[] = [];
        r.on('data', (d: Buffer) => chunks.push(d));
        r.on('end', () => cb(null, Buffer.concat(chunks)));
      });
    expect(res.status).toBe(200);
    const dir = mkdtempSync(join(tmpdir(), 'gp-seed-pack-'));
    try {
      writeFileSync(join(dir, 'pack.pdf'), res.body as Buffer);
      const text = execFileSync('pdftotext', ['-layout', join(dir, 'pack.pdf'), '-'])
        .toString()
        .replace(/\s+/g, ' ');
      // Its power conductor is CCA sold as copper: by mass (copper's density) it measures as
      // 9 AWG, by four-wire resistance as 6 AWG. The installer is told the smaller, once.
      expect(text).toContain('Measures as 9 AWG');
      expect(text.match(/power 4 AWG: Treat as/g)).toHaveLength(1);
      expect(text).toContain('power 4 AWG: Treat as 9 AWG for fusing and voltage drop');
      expect(text).not.toContain('Treat as 6 AWG');
    } finally {
      rmSync(dir, { recursive: true, force: true });
    }
  });

  it('keeps each product’s switching state equal to its decisions replayed in order', async () => {
    for (const state of await em.find(InspectionState, {}, { populate: ['product'] })) {
      const decisions = await em.find(
        Decision,
        { lot: { product: state.product } },
        { orderBy: { id: 'asc' } },
      );
      let last = null as SwitchingRecord['after'] | null;
      for (const d of decisions) {
        const s = d.evaluation.switching as SwitchingRecord;
        if (last) expect(s.before).toEqual(last);
        last = s.after;
      }
      if (last) expect(state.state).toEqual(last);
      if (last) expect(state.severity).toBe(last.severity);
    }
    const severities = (await em.find(InspectionState, {})).map((s) => s.severity);
    expect(severities).toContain('tightened');
  });

  it('shows suppliers of different quality on the scorecards', async () => {
    const res = await get(DEMO.buyer, '/api/scorecards');
    expect(res.status).toBe(200);
    const rate = (code: string) =>
      (res.body.items as { code: string; acceptanceRate: number | null }[]).find(
        (r) => r.code === code,
      )?.acceptanceRate as number;
    expect(rate('HLC')).toBe(1);
    expect(rate('VWH')).toBeLessThan(rate('TSC'));
    expect(rate('QAS')).toBeLessThan(rate('VWH'));
  });

  it('does not seed again on a second start', async () => {
    const before = await em.count(Lot, {});
    const again = await createApp(t.config);
    await again.init();
    await again.close();
    expect(await em.fork().count(Lot, {})).toBe(before);
  });
});

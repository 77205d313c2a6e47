import { MikroORM } from '@mikro-orm/core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { AuditEvent } from '../src/audit/entities/audit-event.entity';
import { ConductorSpec } from '../src/products/entities/conductor-spec.entity';
import { InspectionState } from '../src/products/entities/inspection-state.entity';
import { call } from './helpers/api';
import { makeProduct, makeSupplier, spoolBody } from './helpers/catalog';
import { DEMO, startTestApp, type TestApp } from './helpers/test-app';

let t: TestApp;
let supplierId: number;
beforeAll(async () => {
  t = await startTestApp();
  supplierId = (await makeSupplier(t, 'PRD-S')).id;
});
afterAll(async () => t.close());

const kit = (sku: string, ground = '4 AWG') => ({
  supplierId,
  sku,
  kind: 'kit',
  description: `Amplifier wiring kit ${sku}`,
  inspectionLevel: 'S-3',
  aql: '1.0',
  conductors: [
    { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' },
    { purpose: 'ground', gauge: ground, claimedMaterial: 'copper' },
    { purpose: 'remote', gauge: '18 ga', claimedMaterial: 'copper', claimedStrands: 19 },
  ],
});

describe('POST /api/products', () => {
  it('creates a spool with the defaults, the canonical label and a normal inspection state', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/products', spoolBody(supplierId, 'SP-4'));
    expect(res.status).toBe(201);
    expect(res.body).toMatchObject({
      supplier: { id: supplierId, code: 'PRD-S', status: 'approved' },
      sku: 'SP-4',
      kind: 'spool',
      inspectionLevel: 'S-3',
      aql: '1.0',
      minAreaRatio: 0.98,
      active: true,
      inspectionState: { severity: 'normal', reason: null, reducedEligible: false },
      warnings: [],
    });
    expect(res.body.conductors).toHaveLength(1);
    expect(res.body.conductors[0]).toMatchObject({
      position: 0,
      purpose: 'power',
      gauge: '4 AWG',
      gaugeSystem: 'awg',
      claimedMaterial: 'copper',
      claimedStrands: 380,
    });
    expect(res.body.conductors[0].nominalAreaMm2).toBeCloseTo(21.15, 1); // ASTM B258: 4 AWG
    const em = t.app.get(MikroORM).em.fork();
    const state = await em.findOneOrFail(InspectionState, { product: res.body.id });
    expect(state.severity).toBe('normal');
    expect(state.state).toMatchObject({ severity: 'normal', switchingScore: 0 });
    const events = await em.find(AuditEvent, { entityType: 'product', entityId: res.body.id });
    expect(events.map((e) => e.action)).toEqual(['product.create']);
  });

  it('lets purchasing and admin create; refuses the clerk', async () => {
    expect(
      (await call(t, DEMO.buyer, 'post', '/api/products', spoolBody(supplierId, 'SP-B'))).status,
    ).toBe(201);
    expect(
      (await call(t, DEMO.admin, 'post', '/api/products', spoolBody(supplierId, 'SP-A'))).status,
    ).toBe(201);
    expect(
      (await call(t, DEMO.clerk, 'post', '/api/products', spoolBody(supplierId, 'SP-C'))).status,
    ).toBe(403);
  });

  it('warns about a kit whose ground is not sized like its power, and reads mm² labels', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/products', kit('KIT-8G', '8'));
    expect(res.status).toBe(201);
    expect(res.body.conductors.map((c: { gauge: string }) => c.gauge)).toEqual([
      '4 AWG',
      '8 AWG',
      '18 AWG',
    ]);
    expect(res.body.warnings).toEqual([
      'Power is 4 AWG but ground is 8 AWG: ground should be sized like power (common practice).',
    ]);
    const even = await call(t, DEMO.qa, 'post', '/api/products', kit('KIT-4G'));
    expect(even.body.warnings).toEqual([]);
    const metric = await call(t, DEMO.qa, 'post', '/api/products', {
      ...spoolBody(supplierId, 'SP-25'),
      conductors: [{ purpose: 'power', gauge: '25 mm2', claimedMaterial: 'copper' }],
    });
    expect(metric.body.conductors[0]).toMatchObject({
      gauge: '25 mm²',
      gaugeSystem: 'metric',
      nominalAreaMm2: 25,
    });
  });

  it('refuses a label parseGauge refuses, naming the field and the label', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/products', kit('KIT-BAD', '4 SAE'));
    expect(res.status).toBe(400);
    expect(res.body.message).toHaveLength(1);
    expect(res.body.message[0]).toMatch(/^conductors\[1\]\.gauge: "4 SAE" is an SAE size/);
    const unknown = await call(t, DEMO.qa, 'post', '/api/products', kit('KIT-BAD', 'thick'));
    expect(unknown.body.message[0]).toMatch(
      /^conductors\[1\]\.gauge: "thick" is not a size we know/,
    );
  });

  it('names every bad field of the body and its conductors', async () => {
    const res = await call(t, DEMO.qa, 'post', '/api/products', {
      supplierId: 'x',
      sku: '',
      kind: 'reel',
      description: '',
      inspectionLevel: 'IV',
      aql: '3.0',
      minAreaRatio: 0.4,
      conductors: [{ purpose: 'signal', gauge: '', claimedMaterial: 'gold', claimedStrands: 0 }],
    });
    expect(res.status).toBe(400);
    expect(res.body.message).toEqual(
      expect.arrayContaining([
        'supplierId must be the id of a supplier',
        'sku must be 1 to 64 characters, no spaces at the ends',
        'kind must be one of spool, kit',
        'description is required',
        expect.stringMatching(/^inspectionLevel must be one of S-1, S-2, S-3, S-4, I, II, III/),
        expect.stringMatching(/^aql must be one of .*1\.0/),
        'minAreaRatio must be from 0.5 to 1.0',
        expect.stringMatching(/^conductors\.0\.purpose must be one of power, ground/),
        'conductors.0.gauge is required',
        expect.stringMatching(/^conductors\.0\.claimedMaterial must be one of copper/),
        'conductors.0.claimedStrands must be a whole number from 1 to 100000',
      ]),
    );
    const none = await call(t, DEMO.qa, 'post', '/api/products', {
      ...spoolBody(supplierId, 'SP-0'),
      conductors: [],
    });
    expect(none.body.message).toEqual(['conductors must hold at least one conductor']);
    const missing = await call(t, DEMO.qa, 'post', '/api/products', {
      ...spoolBody(supplierId, 'SP-0'),
      conductors: undefined,
    });
    expect(missing.body.message).toContain('conductors must hold at least one conductor');
    const noSupplier = await call(t, DEMO.qa, 'post', '/api/products', spoolBody(99999, 'SP-0'));
    expect(noSupplier.status).toBe(400);
    expect(noSupplier.body.message).toEqual(['supplierId must be the id of a supplier']);
  });

  it('answers 409 for a SKU the supplier already has', async () => {
    await makeProduct(t, spoolBody(supplierId, 'SP-DUP'));
    const res = await call(t, DEMO.qa, 'post', '/api/products', spoolBody(supplierId, 'SP-DUP'));
    expect(res.status).toBe(409);
    expect(res.body.message).toBe('Test Supplier PRD-S already has a product with SKU SP-DUP');
    const other = await makeSupplier(t, 'PRD-T');
    expect(
      (await call(t, DEMO.qa, 'post', '/api/products', spoolBody(other.id, 'SP-DUP'))).status,
    ).toBe(201);
  });
});

describe('PATCH /api/products/:id', () => {
  it('replaces conductors, keeping the old specs inactive, and audits before and after', async () => {
    const made = await makeProduct(t, kit('KIT-PATCH'));
    const [powerId, groundId, remoteId] = made.conductors.map((c) => c.id);
    expect(
      (await call(t, DEMO.clerk, 'patch', `/api/products/${made.id}`, { active: false })).status,
    ).toBe(403);
    const res = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      description: 'Kit with the heavier ground',
      aql: '0.65',
      inspectionLevel: 'II',
      minAreaRatio: 0.95,
      conductors: [
        { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'copper' },
        { purpose: 'ground', gauge: '1/0', claimedMaterial: 'copper' },
        { purpose: 'remote', gauge: '18', claimedMaterial: 'copper', claimedStrands: 19 },
      ],
    });
    expect(res.status).toBe(200);
    expect(res.body).toMatchObject({
      description: 'Kit with the heavier ground',
      aql: '0.65',
      inspectionLevel: 'II',
      minAreaRatio: 0.95,
    });
    const ids = res.body.conductors.map((c: { id: number }) => c.id);
    expect(ids[0]).toBe(powerId);
    expect(ids[2]).toBe(remoteId);
    expect(ids[1]).not.toBe(groundId);
    expect(res.body.conductors[1].gauge).toBe('1/0 AWG');
    expect(res.body.warnings).toEqual([
      'Power is 4 AWG but ground is 1/0 AWG: ground should be sized like power (common practice).',
    ]);
    const em = t.app.get(MikroORM).em.fork();
    const old = await em.findOneOrFail(ConductorSpec, { id: groundId });
    expect(old.active).toBe(false);
    expect(old.gaugeLabel).toBe('4 AWG');
    const [event] = await em.find(AuditEvent, {
      entityType: 'product',
      entityId: made.id,
      action: 'product.update',
    });
    expect(event.before).toMatchObject({ aql: '1.0' });
    expect(event.after).toMatchObject({ aql: '0.65' });
    const [criteria] = await em.find(AuditEvent, {
      entityType: 'product',
      entityId: made.id,
      action: 'product.criteria',
    });
    expect(criteria.before).toMatchObject({
      aql: '1.0',
      inspectionLevel: 'S-3',
      minAreaRatio: 0.98,
    });
    expect(criteria.after).toMatchObject({
      aql: '0.65',
      inspectionLevel: 'II',
      minAreaRatio: 0.95,
    });
    expect((criteria.after as { conductors: { gauge: string }[] }).conductors[1].gauge).toBe(
      '1/0 AWG',
    );
  });

  it('lets only a QA lead or admin change acceptance criteria; purchasing edits the rest', async () => {
    const made = await makeProduct(t, kit('KIT-CRIT'));
    const em = () => t.app.get(MikroORM).em.fork();
    const loosen = [
      { minAreaRatio: 0.5 },
      { aql: '6.5' },
      { inspectionLevel: 'S-1' },
      {
        conductors: [
          { purpose: 'power', gauge: '8 AWG', claimedMaterial: 'copper' },
          { purpose: 'ground', gauge: '8 AWG', claimedMaterial: 'copper' },
          { purpose: 'remote', gauge: '18 ga', claimedMaterial: 'copper', claimedStrands: 19 },
        ],
      },
    ];
    for (const change of loosen) {
      const res = await call(t, DEMO.buyer, 'patch', `/api/products/${made.id}`, {
        version: made.version,
        description: 'Changed by purchasing',
        ...change,
      });
      expect(res.status, JSON.stringify(change)).toBe(403);
      expect(res.body.message).toContain('Only a QA lead or an admin');
    }
    const kept = await call(t, DEMO.qa, 'get', `/api/products/${made.id}`);
    expect(kept.body).toMatchObject({
      description: 'Amplifier wiring kit KIT-CRIT',
      aql: '1.0',
      inspectionLevel: 'S-3',
      minAreaRatio: 0.98,
    });
    expect(kept.body.conductors[0].gauge).toBe('4 AWG');
    // Purchasing may edit the description, even sending the unchanged criteria along.
    const ok = await call(t, DEMO.buyer, 'patch', `/api/products/${made.id}`, {
      version: kept.body.version,
      description: 'Renamed by purchasing',
      aql: '1.0',
      minAreaRatio: 0.98,
    });
    expect(ok.status).toBe(200);
    expect(ok.body.description).toBe('Renamed by purchasing');
    expect(await em().count(AuditEvent, { entityId: made.id, action: 'product.criteria' })).toBe(0);
    // Nor may purchasing create a product with criteria other than the defaults.
    const created = await call(t, DEMO.buyer, 'post', '/api/products', {
      ...kit('KIT-LOOSE'),
      minAreaRatio: 0.6,
    });
    expect(created.status).toBe(403);
    let version = ok.body.version as number;
    for (const who of [DEMO.qa, DEMO.admin]) {
      const res = await call(t, who, 'patch', `/api/products/${made.id}`, { version, aql: '0.65' });
      expect(res.status).toBe(200);
      const back = await call(t, who, 'patch', `/api/products/${made.id}`, {
        version: res.body.version,
        aql: '1.0',
      });
      version = back.body.version;
    }
    expect(await em().count(AuditEvent, { entityId: made.id, action: 'product.criteria' })).toBe(4);
    // Each names who changed the criteria, with them before and after.
    const events = await em().find(
      AuditEvent,
      { entityId: made.id, action: 'product.criteria' },
      { orderBy: { id: 'asc' } },
    );
    expect(events.map((e) => e.actorEmail)).toEqual([DEMO.qa, DEMO.qa, DEMO.admin, DEMO.admin]);
    expect(events.map((e) => [e.before?.aql, e.after?.aql])).toEqual([
      ['1.0', '0.65'],
      ['0.65', '1.0'],
      ['1.0', '0.65'],
      ['0.65', '1.0'],
    ]);
    expect(events[0].before).toMatchObject({ inspectionLevel: 'S-3', minAreaRatio: 0.98 });
  });

  it('validates like create, refuses fixed fields and deactivates', async () => {
    const made = await makeProduct(t, spoolBody(supplierId, 'SP-PATCH'));
    const bad = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      conductors: [
        { purpose: 'power', gauge: '4', claimedMaterial: 'copper' },
        { purpose: 'ground', gauge: '3/0 SAE', claimedMaterial: 'copper' },
      ],
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message[0]).toMatch(/^conductors\[1\]\.gauge: "3\/0 SAE"/);
    const fixed = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      sku: 'NEW',
    });
    expect(fixed.body.message).toEqual(['property sku should not exist']);
    const off = await call(t, DEMO.qa, 'patch', `/api/products/${made.id}`, {
      version: made.version,
      active: false,
    });
    expect(off.body.active).toBe(false);
    expect(
      (await call(t, DEMO.qa, 'patch', '/api/products/99999', { version: 1, active: false }))
        .status,
    ).toBe(404);
  });
});

describe('GET /api/products', () => {
  it('lets every role read; filters by supplier, kind and text; sorts and pages', async () => {
    for (const who of [DEMO.clerk, DEMO.qa, DEMO.buyer, DEMO.admin]) {
      expect((await call(t, who, 'get', '/api/products')).status).toBe(200);
    }
    const kits = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products?supplierId=${supplierId}&kind=kit&pageSize=100`,
    );
    expect(kits.body.items.length).toBeGreaterThanOrEqual(3);
    for (const p of kits.body.items)
      expect(p).toMatchObject({ kind: 'kit', supplier: { id: supplierId } });
    const text = await call(t, DEMO.clerk, 'get', '/api/products?q=heavier%20GROUND');
    expect(text.body.items.map((p: { sku: string }) => p.sku)).toEqual(['KIT-PATCH']);
    const bySupplierName = await call(t, DEMO.clerk, 'get', '/api/products?q=supplier%20prd-t');
    expect(bySupplierName.body.items.map((p: { sku: string }) => p.sku)).toEqual(['SP-DUP']);
    const sorted = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products?supplierId=${supplierId}&sort=sku:desc&pageSize=100`,
    );
    const skus = sorted.body.items.map((p: { sku: string }) => p.sku);
    expect(skus).toEqual([...skus].sort().reverse());
    expect(sorted.body.total).toBe(skus.length);
    const page = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products?supplierId=${supplierId}&sort=sku:desc&pageSize=3&page=2`,
    );
    expect(page.body.items.map((p: { sku: string }) => p.sku)).toEqual(skus.slice(3, 6));
    expect(page.body.total).toBe(skus.length);
    const one = await call(t, DEMO.clerk, 'get', `/api/products/${kits.body.items[0].id}`);
    expect(one.body.id).toBe(kits.body.items[0].id);
    expect((await call(t, DEMO.clerk, 'get', '/api/products?kind=reel')).status).toBe(400);
  });
});

describe('GET /api/products/:id/sampling-plan', () => {
  it('gives J, n=80, Ac 2, Re 3 for 501–1200 at level II, AQL 1.0 (MIL-STD-105E / ANSI/ASQ Z1.4)', async () => {
    const p = await makeProduct(
      t,
      spoolBody(supplierId, 'SP-II', { inspectionLevel: 'II', aql: '1.0' }),
    );
    for (const quantity of [501, 800, 1200]) {
      const res = await call(
        t,
        DEMO.clerk,
        'get',
        `/api/products/${p.id}/sampling-plan?quantity=${quantity}`,
      );
      expect(res.status).toBe(200);
      expect(res.body).toMatchObject({
        severity: 'normal',
        discontinued: false,
        samplingPlan: {
          severity: 'normal',
          level: 'II',
          aql: '1.0',
          codeLetter: 'J',
          sampleSize: 80,
          accept: 2,
          reject: 3,
          inspectAll: false,
        },
      });
      expect(res.body.message).toBe(
        `Normal inspection: cut 80 of the ${quantity} units (code letter J, level II, AQL 1.0); accept with up to 2 nonconforming, reject at 3. ANSI/ASQ Z1.4 / MIL-STD-105E single sampling; switching per ISO 2859-1.`,
      );
    }
  });

  it('at the S-3 default: 501–1200 is code letter E, 13 units, Ac 0, Re 1', async () => {
    const p = await makeProduct(t, spoolBody(supplierId, 'SP-S3'));
    const res = await call(
      t,
      DEMO.buyer,
      'get',
      `/api/products/${p.id}/sampling-plan?quantity=600`,
    );
    // MIL-STD-105E Table I: S-3 for 501–1200 is E; Table II-A, E at AQL 1.0: n=13, Ac 0, Re 1.
    expect(res.body.samplingPlan).toMatchObject({
      level: 'S-3',
      codeLetter: 'E',
      sampleSize: 13,
      accept: 0,
      reject: 1,
    });
    const small = await call(
      t,
      DEMO.buyer,
      'get',
      `/api/products/${p.id}/sampling-plan?quantity=5`,
    );
    expect(small.body.samplingPlan).toMatchObject({ sampleSize: 5, inspectAll: true });
    expect(small.body.message).toMatch(/inspect every one of the 5 units/);
    for (const q of ['0', '2.5', 'many']) {
      const bad = await call(
        t,
        DEMO.clerk,
        'get',
        `/api/products/${p.id}/sampling-plan?quantity=${q}`,
      );
      expect(bad.status).toBe(400);
      expect(bad.body.message).toEqual(['quantity must be a whole number of at least 1']);
    }
  });

  it('mentions tightened inspection, and refuses a plan for a discontinued stream', async () => {
    const p = await makeProduct(t, spoolBody(supplierId, 'SP-SEV', { inspectionLevel: 'II' }));
    const em = t.app.get(MikroORM).em.fork();
    const state = await em.findOneOrFail(InspectionState, { product: p.id });
    state.severity = 'tightened';
    state.state = { ...state.state, severity: 'tightened' };
    await em.flush();
    const tight = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products/${p.id}/sampling-plan?quantity=800`,
    );
    expect(tight.body).toMatchObject({
      severity: 'tightened',
      samplingPlan: {
        severity: 'tightened',
        codeLetter: 'J',
        sampleSize: 80,
        accept: 1,
        reject: 2,
      },
    });
    expect(tight.body.message).toMatch(/^Tightened inspection/);
    state.severity = 'reduced';
    await em.flush();
    const reduced = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products/${p.id}/sampling-plan?quantity=800`,
    );
    expect(reduced.body.samplingPlan).toMatchObject({ severity: 'reduced', sampleSize: 32 });
    expect(reduced.body.message).toMatch(/^Reduced inspection/);
    state.severity = 'discontinued';
    await em.flush();
    const stopped = await call(
      t,
      DEMO.clerk,
      'get',
      `/api/products/${p.id}/sampling-plan?quantity=800`,
    );
    expect(stopped.body).toMatchObject({
      severity: 'discontinued',
      discontinued: true,
      samplingPlan: null,
    });
    expect(stopped.body.message).toMatch(
      /is discontinued \(ISO 2859-1\).*QA lead restores inspection/,
    );
  });
});

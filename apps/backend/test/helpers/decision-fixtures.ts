import { EntityManager, MikroORM } from '@mikro-orm/core';
import { areaFromMass, samplingPlan, type Severity } from '@gaugeproof/standards';
import { Reading, type Verdict } from '../../src/inspection/entities/reading.entity';
import { Sample } from '../../src/inspection/entities/sample.entity';
import { Lot, type LotStatus } from '../../src/lots/entities/lot.entity';
import { ConductorSpec } from '../../src/products/entities/conductor-spec.entity';
import { InspectionState } from '../../src/products/entities/inspection-state.entity';
import { Product } from '../../src/products/entities/product.entity';
import { storedPlanOf } from '../../src/products/sampling-plan';
import { Supplier } from '../../src/suppliers/entities/supplier.entity';
import { User } from '../../src/users/entities/user.entity';
import { initialInspectionState } from '@gaugeproof/standards';
import { DEMO, startTestApp, type TestApp } from './test-app';

/**
 * Builds suppliers, products, lots, samples and readings straight through the ORM, so the
 * decision, return and corrective-action tests need no other domain's routes. All names are
 * invented.
 */
/** Shared by every Fixtures of a test file, so codes stay unique in one database. */
let counter = 0;

/**
 * Boots the app for a test file (as `startTestApp(env)`) with its Fixtures and the bearer
 * token of the demo user `email`: `({ t, fx, token: qa } = await startWithFixtures(DEMO.qa))`.
 */
export async function startWithFixtures(email: string, env: Record<string, string> = {}) {
  const t = await startTestApp(env);
  return { t, fx: new Fixtures(t), token: await t.token(email) };
}

export class Fixtures {
  constructor(private readonly t: TestApp) {}

  em(): EntityManager {
    return this.t.app.get(MikroORM).em.fork();
  }

  async supplier(name = 'Northwind Cable Works', contactEmail = 'quality@northwind.example') {
    const em = this.em();
    const n = ++counter;
    const s = em.create(Supplier, { name, code: `SUP${n}`, contactEmail });
    await em.flush();
    return s;
  }

  /** A power-and-ground kit (4 AWG each, copper) with its switching state on normal. */
  async product(supplierId: number, sku = `KIT-4-${++counter}`) {
    const em = this.em();
    const product = em.create(Product, {
      supplier: em.getReference(Supplier, supplierId),
      sku,
      kind: 'kit',
      description: '4 AWG amplifier wiring kit, 5 m power and 1 m ground',
      lengthPerUnitM: 5,
      inspectionLevel: 'S-3',
      aql: '2.5',
    });
    for (const [position, purpose] of (['power', 'ground'] as const).entries()) {
      em.create(ConductorSpec, {
        product,
        position,
        purpose,
        gaugeLabel: '4 AWG',
        gaugeSystem: 'awg',
        nominalAreaMm2: 21.15, // ASTM B258 (REFERENCE §1)
        claimedMaterial: 'copper',
      });
    }
    const state = initialInspectionState();
    em.create(InspectionState, { product, severity: state.severity, state: { ...state } });
    await em.flush();
    return product;
  }

  /** The product's stored switching state. */
  async inspectionState(productId: number) {
    return this.em().findOneOrFail(InspectionState, { product: productId });
  }

  /**
   * A lot of `quantity` kits inspected on the plan at `severity`, with every planned unit
   * sampled on both conductors and the first `nonconforming` units failing on power.
   */
  async lot(
    productId: number,
    opts: {
      nonconforming?: number;
      inconclusive?: number;
      untested?: number;
      severity?: Severity;
      quantity?: number;
      status?: LotStatus;
      poNumber?: string;
    } = {},
  ) {
    const em = this.em();
    const product = await em.findOneOrFail(Product, productId, { populate: ['conductors'] });
    const clerk = await em.findOneOrFail(User, { email: DEMO.clerk });
    const quantity = opts.quantity ?? 200;
    const plan = samplingPlan({
      lotSize: quantity,
      level: 'S-3',
      aql: '2.5',
      severity: opts.severity ?? 'normal',
    });
    const lot = em.create(Lot, {
      product,
      supplier: product.supplier,
      poNumber: opts.poNumber ?? `PO-${7000 + ++counter}`,
      packingSlip: `PS-${counter}`,
      supplierLotCode: `L${counter}`,
      quantity,
      unit: 'kits',
      receivedBy: clerk,
      status: opts.status ?? 'awaiting_decision',
      version: 1,
      samplingPlan: storedPlanOf(plan),
    });
    const bad = opts.nonconforming ?? 0;
    const unsure = opts.inconclusive ?? 0;
    const tested = plan.sampleSize - (opts.untested ?? 0);
    for (let seq = 1; seq <= tested; seq++) {
      for (const conductor of product.conductors) {
        const sample = em.create(Sample, {
          lot,
          conductor,
          seq,
          unitRef: `K-${seq}`,
          createdBy: clerk,
        });
        let verdict: Verdict = 'conforms';
        if (conductor.purpose === 'power' && seq <= bad) verdict = 'nonconforming';
        else if (conductor.purpose === 'power' && seq <= bad + unsure) verdict = 'inconclusive';
        em.create(Reading, reading(sample, clerk, verdict));
      }
    }
    await em.flush();
    return { lot, plan };
  }
}

/** A lot rejected through the decisions API (so it has its decision and NCR). */
export async function rejectedLot(t: TestApp, fx: Fixtures, productId: number, poNumber?: string) {
  const { lot } = await fx.lot(productId, { nonconforming: 2, poNumber });
  const res = await t.http
    .post(`/api/lots/${lot.id}/decisions`)
    .set('Authorization', `Bearer ${await t.token(DEMO.qa)}`)
    .send({ outcome: 'reject', reason: '', version: lot.version });
  if (res.status !== 201) throw new Error(`reject lot ${lot.id}: ${res.status} ${res.text}`);
  return { lot, ncrNumber: res.body.ncrNumber as string };
}

/** A mass reading whose result suits its verdict (8.4 mm² measures as 8 AWG). */
function reading(sample: Sample, takenBy: User, verdict: Verdict) {
  const areaMm2 = verdict === 'nonconforming' ? 8.4 : verdict === 'inconclusive' ? 20.8 : 21.3;
  const inputs = { massG: Math.round(areaMm2 * 8.89 * 0.5 * 1.02 * 100) / 100, lengthMm: 500 };
  // The budget the standards library gives for these inputs (0.01 g balance, 1 mm rule).
  const budget = areaFromMass({
    ...inputs,
    material: 'copper',
    massResolutionG: 0.01,
    lengthResolutionMm: 1,
  }).budget;
  return {
    sample,
    method: 'mass' as const,
    inputs,
    areaMm2,
    uMm2: 0.12,
    expandedUMm2: 0.24,
    areaRatio: Math.round((areaMm2 / 21.15) * 1000) / 1000,
    measuresAs:
      verdict === 'nonconforming' ? '8 AWG' : verdict === 'inconclusive' ? '6 AWG' : '4 AWG',
    identifiedMaterial: 'copper',
    verdict,
    result: {
      reasons: [`Measures as ${verdict === 'nonconforming' ? '8 AWG' : '4 AWG'} (fixture).`],
      budget,
      coverageFactor: 2,
    },
    takenBy,
  };
}

import { MikroORM, type EntityManager } from '@mikro-orm/core';
import { parseGauge, samplingPlan, type Aql, type InspectionLevel } from '@gaugeproof/standards';
import { Instrument, type InstrumentKind } from '../../src/instruments/entities/instrument.entity';
import { Lot } from '../../src/lots/entities/lot.entity';
import {
  ConductorSpec,
  type ClaimedMaterial,
  type ConductorPurpose,
} from '../../src/products/entities/conductor-spec.entity';
import { Product } from '../../src/products/entities/product.entity';
import { storedPlanOf } from '../../src/products/sampling-plan';
import { Supplier, type SupplierStatus } from '../../src/suppliers/entities/supplier.entity';
import { User } from '../../src/users/entities/user.entity';
import { DEMO, startTestApp, type TestApp } from './test-app';

/**
 * Invented catalog records written straight through the EntityManager, so the inspection
 * tests do not depend on the catalog API.
 */
let counter = 0;
const next = () => ++counter;

const em = (t: TestApp): EntityManager => t.app.get(MikroORM).em.fork();

export interface ConductorInput {
  purpose: ConductorPurpose;
  gauge: string;
  claimedMaterial?: ClaimedMaterial;
  active?: boolean;
  claimedStrands?: number | null;
  /** IEC 60228 class of a metric size; 5 by default for metric (issue 13), null for AWG. */
  conductorClass?: number;
}

export interface Catalog {
  supplierId: number;
  productId: number;
  conductorIds: number[];
}

export async function createProduct(
  t: TestApp,
  conductors: ConductorInput[] = [{ purpose: 'power', gauge: '4 AWG' }],
  opts: { aql?: string; level?: InspectionLevel; supplierStatus?: SupplierStatus } = {},
): Promise<Catalog> {
  const m = em(t);
  const n = next();
  const supplier = m.create(Supplier, {
    name: `Northwind Test Cable ${n}`,
    code: `NTC${n}`,
    contactEmail: `quality${n}@cable.example`,
    status: opts.supplierStatus ?? 'approved',
  });
  const product = m.create(Product, {
    supplier,
    sku: `TST-${n}`,
    kind: conductors.length > 1 ? 'kit' : 'spool',
    description: `Test ${conductors.map((c) => c.gauge).join(' + ')} cable`,
    inspectionLevel: opts.level ?? 'S-3',
    aql: opts.aql ?? '15',
  });
  const specs = conductors.map((c, position) => {
    const gauge = parseGauge(c.gauge);
    return m.create(ConductorSpec, {
      product,
      position,
      purpose: c.purpose,
      gaugeLabel: gauge.label,
      gaugeSystem: gauge.system,
      nominalAreaMm2: gauge.nominalAreaMm2,
      claimedMaterial: c.claimedMaterial ?? 'copper',
      active: c.active ?? true,
      claimedStrands: c.claimedStrands ?? null,
      conductorClass: gauge.system === 'metric' ? (c.conductorClass ?? 5) : null,
    });
  });
  await m.flush();
  return { supplierId: supplier.id, productId: product.id, conductorIds: specs.map((s) => s.id) };
}

/** A lot on hold with the plan of its product at `quantity` (normal inspection). */
export async function createLot(t: TestApp, c: Catalog, quantity = 50): Promise<number> {
  const m = em(t);
  const product = await m.findOneOrFail(Product, { id: c.productId });
  const plan = samplingPlan({
    lotSize: quantity,
    level: product.inspectionLevel as InspectionLevel,
    aql: product.aql as Aql,
  });
  const lot = m.create(Lot, {
    product,
    supplier: c.supplierId,
    poNumber: `PO-T-${next()}`,
    quantity,
    unit: 'spools',
    version: 1,
    receivedBy: await m.findOneOrFail(User, { email: DEMO.clerk }),
    samplingPlan: storedPlanOf(plan),
  });
  await m.flush();
  return lot.id;
}

export async function createInstrument(
  t: TestApp,
  kind: InstrumentKind,
  resolution: number,
  resolutionUnit: string,
  calibrationDueOn = '2099-12-31',
  accuracy: Partial<
    Pick<Instrument, 'accuracyPercentOfReading' | 'accuracyAbsolute' | 'calibrationUncertainty'>
  > = {},
): Promise<{ id: number; serial: string }> {
  const m = em(t);
  const n = next();
  const i = m.create(Instrument, {
    kind,
    name: `Test ${kind.replace('_', ' ')} ${n}`,
    serial: `SN-${kind.slice(0, 3).toUpperCase()}-${n}`,
    resolution,
    resolutionUnit,
    calibratedOn: '2020-01-01',
    calibrationDueOn,
    ...accuracy,
  });
  await m.flush();
  return { id: i.id, serial: i.serial };
}

/** A full bench: balance 0.01 g, micrometer 0.001 mm, milliohm meter 0.001 mΩ, rule 1 mm, thermometer 0.1 °C, and an overdue balance. */
export async function createBench(t: TestApp) {
  return {
    balance: await createInstrument(t, 'balance', 0.01, 'g'),
    micrometer: await createInstrument(t, 'micrometer', 0.001, 'mm'),
    meter: await createInstrument(t, 'milliohm_meter', 0.001, 'mohm'),
    rule: await createInstrument(t, 'length_rule', 1, 'mm'),
    thermometer: await createInstrument(t, 'thermometer', 0.1, 'degC'),
    overdueBalance: await createInstrument(t, 'balance', 0.01, 'g', '2020-06-30'),
  };
}
export type Bench = Awaited<ReturnType<typeof createBench>>;

/** One 4 AWG copper power conductor (a spool; createProduct's default). */
export const SPOOL_4AWG: ConductorInput[] = [{ purpose: 'power', gauge: '4 AWG' }];
/** A kit of a 4 AWG copper power and a 4 AWG copper ground conductor. */
export const KIT_4AWG: ConductorInput[] = [
  { purpose: 'power', gauge: '4 AWG' },
  { purpose: 'ground', gauge: '4 AWG' },
];

/**
 * Boots the app for a test file (as `startTestApp(env)`) with a full bench and one product
 * per entry of `products`, made in that order (S-3, AQL 15 as createProduct makes them):
 * `({ t, bench, spool } = await startWithBench({ spool: SPOOL_4AWG }))`.
 */
export async function startWithBench<K extends string>(
  products: Record<K, ConductorInput[]>,
  env: Record<string, string> = {},
) {
  const t = await startTestApp(env);
  const bench = await createBench(t);
  const catalog = {} as Record<K, Catalog>;
  for (const [name, conductors] of Object.entries(products) as [K, ConductorInput[]][]) {
    catalog[name] = await createProduct(t, conductors);
  }
  return { t, bench, ...catalog };
}

export async function lotRow(t: TestApp, lotId: number): Promise<Lot> {
  return em(t).findOneOrFail(Lot, { id: lotId });
}

/** Calls the API as a demo user with a bearer token. */
export async function as(
  t: TestApp,
  email: string,
  method: 'get' | 'post',
  path: string,
  body?: object,
) {
  const req = t.http[method](path).set('Authorization', `Bearer ${await t.token(email)}`);
  return body === undefined ? req : req.send(body);
}

/** 195 g over 1000 mm of copper: about 21.5 mm², a good 4 AWG (nominal 21.15 mm²). */
export const GOOD_4AWG_MASS = { method: 'mass', massG: 195, lengthMm: 1000 } as const;

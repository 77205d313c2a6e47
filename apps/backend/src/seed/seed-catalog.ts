import type { EntityManager } from '@mikro-orm/core';
import { initialInspectionState } from '@gaugeproof/standards';
import { clock } from '../common/clock';
import { addDays, isoDate } from '../common/calendar';
import { Instrument, type InstrumentKind } from '../instruments/entities/instrument.entity';
import { parseConductors, replaceConductors } from '../products/conductor-specs';
import type { ConductorDto } from '../products/dto/conductor.dto';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product, type ProductKind } from '../products/entities/product.entity';
import { Supplier, type SupplierStatus } from '../suppliers/entities/supplier.entity';

/** Invented suppliers: every name, code and address here is made up. */
const SUPPLIERS: {
  key: string;
  name: string;
  code: string;
  status: SupplierStatus;
  notes?: string;
}[] = [
  { key: 'harborline', name: 'Harborline Cable Co.', code: 'HLC', status: 'approved' },
  { key: 'tessaro', name: 'Tessaro Conductors', code: 'TSC', status: 'approved' },
  {
    key: 'veltro',
    name: 'Veltro Wire & Harness',
    code: 'VWH',
    status: 'probation',
    notes: 'On probation after a kit whose remote lead was short of copper.',
  },
  {
    key: 'quickamp',
    name: 'Quickamp Supply',
    code: 'QAS',
    status: 'suspended',
    notes: 'Suspended: cable sold as copper found to be copper-clad aluminium.',
  },
];

const cu = (purpose: ConductorDto['purpose'], gauge: string, claimedStrands?: number) =>
  ({ purpose, gauge, claimedMaterial: 'copper', claimedStrands }) as ConductorDto;

const PRODUCTS: {
  key: string;
  supplier: string;
  sku: string;
  kind: ProductKind;
  description: string;
  lengthPerUnitM: number;
  inspectionLevel?: string;
  conductors: ConductorDto[];
}[] = [
  {
    key: 'spool4',
    supplier: 'harborline',
    sku: 'HL-4-50R',
    kind: 'spool',
    description: '4 AWG power cable, red, 50 m spool',
    lengthPerUnitM: 50,
    conductors: [cu('power', '4 AWG', 380)],
  },
  {
    key: 'spool1_0',
    supplier: 'harborline',
    sku: 'HL-1/0-30B',
    kind: 'spool',
    description: '1/0 AWG ground cable, black, 30 m spool',
    lengthPerUnitM: 30,
    inspectionLevel: 'S-4',
    conductors: [cu('ground', '1/0', 1045)],
  },
  {
    key: 'spool8',
    supplier: 'veltro',
    sku: 'VW-8-75R',
    kind: 'spool',
    description: '8 AWG power cable, red, 75 m spool',
    lengthPerUnitM: 75,
    conductors: [cu('power', '8 ga', 168)],
  },
  {
    key: 'spool25',
    supplier: 'tessaro',
    sku: 'TS-25-100',
    kind: 'spool',
    description: '25 mm² battery cable, black, 100 m drum',
    lengthPerUnitM: 100,
    conductors: [cu('power', '25 mm²', 196)],
  },
  {
    key: 'kit4',
    supplier: 'veltro',
    sku: 'VW-KIT-4',
    kind: 'kit',
    description: '4 AWG amplifier wiring kit: power, ground, remote',
    lengthPerUnitM: 5.5,
    conductors: [cu('power', '4 AWG'), cu('ground', '4 AWG'), cu('remote', '18 AWG', 19)],
  },
  {
    key: 'kitShortGround',
    supplier: 'quickamp',
    sku: 'QA-KIT-4X',
    kind: 'kit',
    description: '"4 gauge" amplifier kit with an 8 gauge ground',
    lengthPerUnitM: 5,
    conductors: [cu('power', '4'), cu('ground', '8'), cu('remote', '18')],
  },
];

/** A demo instrument; its calibration is dated in days from the day the demo starts. */
export interface DemoInstrument {
  kind: InstrumentKind;
  name: string;
  serial: string;
  resolution: number;
  resolutionUnit: string;
  /** Invented demo specifications and certificate uncertainties (k = 2), in resolutionUnit. */
  accuracyPercentOfReading?: number;
  accuracyAbsolute?: number;
  calibrationUncertainty?: number;
  cal: { sinceDays: number; dueInDays: number };
}

/** Registers a demo instrument, calibrated and due relative to `today` (YYYY-MM-DD). */
export function registerInstrument(
  em: EntityManager,
  { cal, ...i }: DemoInstrument,
  today: string,
): Instrument {
  return em.create(Instrument, {
    ...i,
    calibratedOn: addDays(today, cal.sinceDays),
    calibrationDueOn: addDays(today, cal.dueInDays),
  });
}

const INSTRUMENTS: (DemoInstrument & { key: string })[] = [
  {
    key: 'balance',
    kind: 'balance',
    name: 'Bench balance B-1',
    serial: 'GP-B-01',
    resolution: 0.01,
    resolutionUnit: 'g',
    accuracyAbsolute: 0.02,
    calibrationUncertainty: 0.01,
    cal: { sinceDays: -200, dueInDays: 165 },
  },
  // Due within 14 days: shows on Today as due soon.
  {
    key: 'rule',
    kind: 'length_rule',
    name: 'Steel rule 1 m',
    serial: 'GP-R-01',
    resolution: 1,
    resolutionUnit: 'mm',
    accuracyAbsolute: 0.5,
    calibrationUncertainty: 0.2,
    cal: { sinceDays: -356, dueInDays: 9 },
  },
  {
    key: 'micrometer',
    kind: 'micrometer',
    name: 'Outside micrometer 0–25 mm',
    serial: 'GP-M-01',
    resolution: 0.001,
    resolutionUnit: 'mm',
    accuracyAbsolute: 0.001,
    calibrationUncertainty: 0.0005,
    cal: { sinceDays: -60, dueInDays: 305 },
  },
  // Overdue: readings with it are refused.
  {
    key: 'caliper',
    kind: 'caliper',
    name: 'Digital caliper 150 mm',
    serial: 'GP-C-01',
    resolution: 0.01,
    resolutionUnit: 'mm',
    accuracyAbsolute: 0.02,
    cal: { sinceDays: -371, dueInDays: -6 },
  },
  {
    key: 'milliohm',
    kind: 'milliohm_meter',
    name: 'Four-wire milliohm meter',
    serial: 'GP-O-01',
    resolution: 0.001,
    resolutionUnit: 'mohm',
    accuracyPercentOfReading: 0.2,
    accuracyAbsolute: 0.002,
    calibrationUncertainty: 0.001,
    cal: { sinceDays: -90, dueInDays: 275 },
  },
  {
    key: 'thermometer',
    kind: 'thermometer',
    name: 'Probe thermometer',
    serial: 'GP-T-01',
    resolution: 0.1,
    resolutionUnit: 'degC',
    accuracyAbsolute: 0.5,
    calibrationUncertainty: 0.2,
    cal: { sinceDays: -30, dueInDays: 335 },
  },
];

export interface DemoCatalog {
  suppliers: Record<string, Supplier>;
  products: Record<string, Product>;
  instruments: Record<string, Instrument>;
}

/**
 * The invented demo catalog: suppliers in each status, spools and kits (one kit with a
 * ground smaller than its power), and the instrument register with one instrument overdue
 * and one due soon, dated from `now` so the demo reads right whatever day it starts.
 */
export async function seedCatalog(em: EntityManager, now = clock.now()): Promise<DemoCatalog> {
  const today = isoDate(now);
  const suppliers: Record<string, Supplier> = {};
  for (const { key, notes, ...s } of SUPPLIERS) {
    suppliers[key] = em.create(Supplier, {
      ...s,
      contactEmail: `quality@${s.code.toLowerCase()}.example`,
      notes: notes ?? null,
    });
  }
  const products: Record<string, Product> = {};
  for (const { key, supplier, conductors, ...p } of PRODUCTS) {
    const product = em.create(Product, { ...p, supplier: suppliers[supplier] });
    replaceConductors(em, product, parseConductors(conductors));
    em.create(InspectionState, {
      product,
      severity: 'normal',
      state: { ...initialInspectionState() },
    });
    products[key] = product;
  }
  const instruments: Record<string, Instrument> = {};
  for (const { key, ...i } of INSTRUMENTS) instruments[key] = registerInstrument(em, i, today);
  await em.flush();
  return { suppliers, products, instruments };
}

import { MikroORM } from '@mikro-orm/core';
import { areaFromMass, assessSample, parseGauge, samplingPlan } from '@gaugeproof/standards';
import { Reading } from '../../src/inspection/entities/reading.entity';
import { Sample } from '../../src/inspection/entities/sample.entity';
import { Lot } from '../../src/lots/entities/lot.entity';
import { ConductorSpec } from '../../src/products/entities/conductor-spec.entity';
import { Product } from '../../src/products/entities/product.entity';
import { Supplier } from '../../src/suppliers/entities/supplier.entity';
import { User } from '../../src/users/entities/user.entity';
import { DEMO, type TestApp } from './test-app';

export interface ExportLot {
  supplierId: number;
  lotId: number;
  readingIds: number[];
}

interface ExportLotInput {
  code: string;
  readings: number;
  receivedAt: string;
  unitRef?: string;
  /** Voids the second reading with this reason. */
  voidReason?: string;
}

/**
 * One spool lot of an invented supplier (created on first use of its code) with one
 * sample and `readings` mass readings, written in bulk through the EntityManager so the
 * export tests need no inspection API. Numbers from the standards library.
 */
export async function seedExportLot(t: TestApp, input: ExportLotInput): Promise<ExportLot> {
  const m = t.app.get(MikroORM).em.fork();
  const clerk = await m.findOneOrFail(User, { email: DEMO.clerk });
  let supplier = await m.findOne(Supplier, { code: input.code });
  let product: Product | null = supplier
    ? await m.findOne(Product, { supplier }, { populate: ['conductors'] })
    : null;
  if (!supplier || !product) {
    supplier = m.create(Supplier, { name: `Fennick Export ${input.code}`, code: input.code });
    product = m.create(Product, {
      supplier,
      sku: `${input.code}-4`,
      kind: 'spool',
      description: '4 AWG copper power cable',
    });
    const g = parseGauge('4 AWG');
    m.create(ConductorSpec, {
      product,
      purpose: 'power',
      gaugeLabel: g.label,
      gaugeSystem: g.system,
      nominalAreaMm2: g.nominalAreaMm2,
      claimedMaterial: 'copper',
    });
  }
  const conductor = product.conductors.getItems()[0];
  const plan = samplingPlan({ lotSize: 20, level: 'S-3', aql: '4.0' });
  const lot = m.create(Lot, {
    product,
    supplier,
    poNumber: `PO-${input.code}-${input.receivedAt}`,
    supplierLotCode: `${input.code}-L${input.receivedAt.replace(/-/g, '')}`,
    packingSlip: `PS-${input.receivedAt}`,
    quantity: 20,
    unit: 'spools',
    receivedAt: new Date(`${input.receivedAt}T08:00:00.000Z`),
    receivedBy: clerk,
    version: 1,
    status: 'inspecting',
    samplingPlan: { ...plan, severity: 'normal' },
  });
  const sample = m.create(Sample, {
    lot,
    conductor,
    seq: 1,
    unitRef: input.unitRef ?? 'Spool 1',
    createdBy: clerk,
  });
  await m.flush();
  const area = areaFromMass({ massG: 193.2, lengthMm: 1000, material: 'copper' });
  const assessment = assessSample({
    gauge: '4 AWG',
    claimedMaterial: 'copper',
    areaMm2: area.areaMm2,
    UMm2: area.UMm2,
  });
  const rows = Array.from({ length: input.readings }, (_, i) => ({
    sample: sample.id,
    method: 'mass' as const,
    inputs: { massG: 193.2, lengthMm: 1000, strandingIncrement: 0.02 },
    instruments: [
      {
        id: 1,
        kind: 'balance',
        name: 'Bench balance',
        serial: `BAL-${input.code}`,
        resolution: 0.01,
        resolutionUnit: 'g',
        calibrationDueOn: '2099-12-31',
      },
    ],
    areaMm2: area.areaMm2,
    uMm2: area.uMm2,
    expandedUMm2: area.UMm2,
    areaRatio: assessment.areaRatio,
    measuresAs: assessment.measuresAs.label,
    verdict: assessment.verdict,
    result: { reasons: assessment.reasons },
    takenBy: clerk.id,
    takenAt: new Date(),
    voided: input.voidReason !== undefined && i === 1,
    voidReason: input.voidReason !== undefined && i === 1 ? input.voidReason : null,
  }));
  await m.insertMany(Reading, rows);
  const readings = await m.find(Reading, { sample }, { orderBy: { id: 'asc' }, fields: ['id'] });
  return { supplierId: supplier.id, lotId: lot.id, readingIds: readings.map((r) => r.id) };
}

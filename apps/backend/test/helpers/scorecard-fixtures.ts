import { EntityManager, MikroORM } from '@mikro-orm/core';
import { CorrectiveAction } from '../../src/corrective-actions/entities/corrective-action.entity';
import { Reading, type Verdict } from '../../src/inspection/entities/reading.entity';
import { Sample } from '../../src/inspection/entities/sample.entity';
import { Lot, type LotStatus } from '../../src/lots/entities/lot.entity';
import {
  ConductorSpec,
  type ConductorPurpose,
} from '../../src/products/entities/conductor-spec.entity';
import { InspectionState } from '../../src/products/entities/inspection-state.entity';
import { Product } from '../../src/products/entities/product.entity';
import { VendorReturn } from '../../src/returns/entities/vendor-return.entity';
import { Supplier } from '../../src/suppliers/entities/supplier.entity';
import { User } from '../../src/users/entities/user.entity';
import { DEMO, type TestApp } from './test-app';

/**
 * One sample: the conductor (index into the product's conductors), then its readings
 * written "ratio verdict measures-as [mismatch] [void]", verdict ok | nc | inc:
 * `[0, '0.40 nc 8 AWG mismatch', '0.10 nc 14 AWG void']`.
 */
export type SampleSpec = [conductor: number, ...readings: string[]];

const VERDICT_CODES: Record<string, Verdict> = {
  ok: 'conforms',
  nc: 'nonconforming',
  inc: 'inconclusive',
};

function parseReading(text: string) {
  const words = text.split(' ');
  const flags = new Set(
    words.filter((w) => w === 'mismatch' || w === 'void' || w === 'resistance'),
  );
  const verdict = VERDICT_CODES[words[1]];
  if (!verdict) throw new Error(`reading "${text}": verdict must be ok, nc or inc`);
  return {
    ratio: Number(words[0]),
    verdict,
    measuresAs: words.slice(2, words.length - flags.size).join(' '),
    mismatch: flags.has('mismatch'),
    voided: flags.has('void'),
    method: flags.has('resistance') ? ('resistance' as const) : ('mass' as const),
  };
}

export interface ConductorInput {
  purpose: ConductorPurpose;
  gaugeLabel: string;
  gaugeSystem: 'awg' | 'metric';
  nominalAreaMm2: number;
}

const PLAN = {
  severity: 'normal' as const,
  level: 'S-3',
  aql: '1.0',
  codeLetter: 'C',
  sampleSize: 5,
  accept: 0,
  reject: 1,
  inspectAll: false,
};

/**
 * Builds suppliers, products, lots, samples, readings, corrective actions and returns
 * straight through the EntityManager, so the scorecard tests wait for no other domain's
 * routes. Every name is invented.
 */
export class ScorecardFixtures {
  constructor(private readonly t: TestApp) {}

  private em(): EntityManager {
    return this.t.app.get(MikroORM).em.fork();
  }

  private async clerk(em: EntityManager): Promise<User> {
    return em.findOneOrFail(User, { email: DEMO.clerk });
  }

  async supplier(name: string, code: string): Promise<Supplier> {
    const em = this.em();
    const s = em.create(Supplier, {
      name,
      code,
      contactEmail: `${code.toLowerCase()}@example.com`,
    });
    await em.flush();
    return s;
  }

  async product(
    supplierId: number,
    sku: string,
    conductors: ConductorInput[],
    state?: { severity: string; reason: string },
  ): Promise<{ product: Product; conductorIds: number[] }> {
    const em = this.em();
    const product = em.create(Product, {
      supplier: em.getReference(Supplier, supplierId),
      sku,
      kind: conductors.length > 1 ? 'kit' : 'spool',
      description: `${conductors.map((c) => c.gaugeLabel).join(' + ')} test cable ${sku}`,
    });
    const specs = conductors.map((c, position) =>
      em.create(ConductorSpec, { product, position, claimedMaterial: 'copper', ...c }),
    );
    if (state) {
      em.create(InspectionState, {
        product,
        severity: state.severity,
        reason: state.reason,
        state: {},
      });
    }
    await em.flush();
    return { product, conductorIds: specs.map((s) => s.id) };
  }

  /** A lot received at `receivedAt` (ISO instant) with its samples and readings. */
  async lot(
    product: { product: Product; conductorIds: number[] },
    receivedAt: string,
    status: LotStatus,
    samples: SampleSpec[],
    /** The unit (seq) of each sample; by default each sample is a unit of its own. */
    units?: number[],
  ): Promise<number> {
    const em = this.em();
    const clerk = await this.clerk(em);
    const lot = em.create(Lot, {
      product: em.getReference(Product, product.product.id),
      supplier: em.getReference(Supplier, product.product.supplier.id),
      poNumber: `PO-${receivedAt.slice(0, 10)}-${Math.random().toString(36).slice(2, 6)}`,
      quantity: 20,
      unit: 'spools',
      receivedAt: new Date(receivedAt),
      receivedBy: clerk,
      status,
      samplingPlan: PLAN,
      version: 1,
    });
    samples.forEach(([conductor, ...readings], i) => {
      const sample = em.create(Sample, {
        lot,
        conductor: em.getReference(ConductorSpec, product.conductorIds[conductor]),
        seq: units?.[i] ?? i + 1,
        createdBy: clerk,
      });
      for (const r of readings.map(parseReading)) {
        em.create(Reading, {
          sample,
          method: r.method,
          inputs:
            r.method === 'mass'
              ? { massG: 1, lengthMm: 100 }
              : { resistanceOhm: 0.001, lengthMm: 1000 },
          areaMm2: r.ratio * 21.15,
          uMm2: 0.1,
          expandedUMm2: 0.2,
          areaRatio: r.ratio,
          measuresAs: r.measuresAs,
          materialMismatch: r.mismatch,
          verdict: r.verdict,
          result: {},
          takenBy: clerk,
          voided: r.voided,
          voidReason: r.voided ? 'wrong sample length entered' : null,
          voidedBy: r.voided ? clerk : null,
          voidedAt: r.voided ? new Date(receivedAt) : null,
        });
      }
    });
    await em.flush();
    return lot.id;
  }

  /** A SCAR raised at `createdAt` (ISO instant), answered at `respondedAt` if given. */
  async correctiveAction(
    supplierId: number,
    status: CorrectiveAction['status'],
    dueOn: string,
    createdAt: string,
    respondedAt?: string,
  ): Promise<void> {
    const em = this.em();
    em.create(CorrectiveAction, {
      number: `SCAR-T-${Math.random().toString(36).slice(2, 8)}`,
      supplier: em.getReference(Supplier, supplierId),
      problem: 'Conductor below its label area',
      dueOn,
      status,
      createdAt: new Date(createdAt),
      respondedAt: respondedAt ? new Date(respondedAt) : null,
      createdBy: await this.clerk(em),
    });
    await em.flush();
  }

  async vendorReturn(
    supplierId: number,
    createdAt: string,
    chargebackTotal: number,
    currency = 'EUR',
    status: VendorReturn['status'] = 'draft',
  ): Promise<void> {
    const em = this.em();
    em.create(VendorReturn, {
      number: `RTV-T-${Math.random().toString(36).slice(2, 8)}`,
      supplier: em.getReference(Supplier, supplierId),
      chargebackTotal,
      currency,
      status,
      createdAt: new Date(createdAt),
      createdBy: await this.clerk(em),
    });
    await em.flush();
  }
}

import { ConflictException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { Lot } from '../lots/entities/lot.entity';
import type { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { User } from '../users/entities/user.entity';
import { CreateSampleDto } from './dto/create-sample.dto';
import { Sample } from './entities/sample.entity';
import { assertLotOpen } from './lot-status';
import { sampleView } from './views';

const planText = (lot: Lot) => {
  const p = lot.samplingPlan;
  return `the ${p.severity} plan (code letter ${p.codeLetter}, level ${p.level}, AQL ${p.aql}) asks for ${p.sampleSize} unit(s)`;
};

@Injectable()
export class SamplesService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  async create(lotId: number, dto: CreateSampleDto, actor: RequestUser) {
    return this.em.transactional(async (tx) => {
      const lot = await tx.findOneOrFail(Lot, { id: lotId }, { populate: ['product.conductors'] });
      assertLotOpen(lot);
      const conductor = this.conductorOf(lot, dto.conductorId);
      const sample = await this.createIn(tx, lot, conductor, dto.seq, dto.unitRef ?? null, actor);
      lot.updatedAt = new Date();
      await tx.flush();
      return sampleView(sample);
    });
  }

  /** The lot's product conductor, active; 422 otherwise. */
  conductorOf(lot: Lot, conductorId: number): ConductorSpec {
    const conductor = lot.product.conductors.getItems().find((c) => c.id === conductorId);
    if (!conductor) {
      throw new UnprocessableEntityException(
        `Conductor #${conductorId} is not a conductor of product ${lot.product.sku}.`,
      );
    }
    if (!conductor.active) {
      throw new UnprocessableEntityException(
        `The ${conductor.purpose} conductor (${conductor.gaugeLabel}) is no longer active on product ${lot.product.sku}.`,
      );
    }
    return conductor;
  }

  /**
   * Creates the sample of unit `seq` (the next free unit when omitted) for a conductor,
   * within the plan, audited; the caller flushes. Used by the route and the CSV import.
   */
  async createIn(
    em: EntityManager,
    lot: Lot,
    conductor: ConductorSpec,
    seq: number | undefined,
    unitRef: string | null,
    actor: RequestUser,
  ): Promise<Sample> {
    const planned = lot.samplingPlan.sampleSize;
    const taken = new Set(
      (await em.find(Sample, { lot, conductor }, { fields: ['seq'] })).map((s) => s.seq),
    );
    let unit = seq;
    if (unit === undefined) {
      unit = Array.from({ length: planned }, (_, i) => i + 1).find((n) => !taken.has(n));
      if (unit === undefined) {
        throw new UnprocessableEntityException(
          `All planned units already have a ${conductor.purpose} sample: ${planText(lot)}.`,
        );
      }
    } else if (unit > planned) {
      throw new UnprocessableEntityException(
        `Unit ${unit} is beyond the plan: ${planText(lot)}, numbered 1 to ${planned}.`,
      );
    } else if (taken.has(unit)) {
      throw new ConflictException(
        `Unit ${unit} already has a ${conductor.purpose} sample in this lot; add readings to it instead.`,
      );
    }
    const sample = em.create(Sample, {
      lot,
      conductor,
      seq: unit,
      unitRef: unitRef?.trim() || null,
      createdBy: await em.findOneOrFail(User, { id: actor.id }),
    });
    em.persist(sample);
    await em.flush();
    this.audit.record(em, actor, {
      action: 'sample.create',
      entityType: 'sample',
      entityId: sample.id,
      lotId: lot.id,
      after: { seq: sample.seq, conductorId: conductor.id, unitRef: sample.unitRef },
    });
    return sample;
  }
}

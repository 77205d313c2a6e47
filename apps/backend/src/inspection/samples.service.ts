import { Injectable } from '@nestjs/common';
import { DomainError } from '../common/domain-error';
import { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { Lot } from '../lots/entities/lot.entity';
import type { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { User } from '../users/entities/user.entity';
import { CreateSampleDto } from './dto/create-sample.dto';
import { Sample } from './entities/sample.entity';
import { earlierRecordUnder, keepClientKey } from './client-id';
import { assertLotOpen } from './lot-status';
import { sampleView } from './views';
import { clock } from '../common/clock';

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
    if (dto.clientId) {
      const earlier = await this.byClientId(dto.clientId, lotId);
      if (earlier) return earlier;
    }
    try {
      return await this.createNew(lotId, dto, actor);
    } catch (error) {
      // The same client id raced in on another connection (its row refused ours, or its
      // sample took the unit first): answer with its sample.
      const earlier = dto.clientId ? await this.byClientId(dto.clientId, lotId) : null;
      if (earlier) return earlier;
      throw error;
    }
  }

  /** The sample a client id already made, in this lot; 409 when it made one elsewhere. */
  private byClientId(clientId: string, lotId: number) {
    const em = this.em.fork();
    return earlierRecordUnder(em, clientId, 'sample', { kind: 'lot', id: lotId }, async (id) => {
      const sample = await em.findOneOrFail(
        Sample,
        { id },
        { populate: ['lot', 'createdBy', 'readings.takenBy', 'readings.voidedBy'] },
      );
      return { parentId: sample.lot.id, answer: sampleView(sample) };
    });
  }

  private async createNew(lotId: number, dto: CreateSampleDto, actor: RequestUser) {
    return this.em.transactional(async (tx) => {
      const lot = await tx.findOneOrFail(Lot, { id: lotId }, { populate: ['product.conductors'] });
      assertLotOpen(lot);
      const conductor = this.conductorOf(lot, dto.conductorId);
      const sample = await this.createIn(
        tx,
        lot,
        conductor,
        dto.seq,
        dto.unitRef ?? null,
        actor,
        dto.clientId ?? null,
      );
      lot.updatedAt = clock.now();
      await tx.flush();
      return sampleView(sample);
    });
  }

  /** The lot's product conductor, active; 422 otherwise. */
  conductorOf(lot: Lot, conductorId: number): ConductorSpec {
    const conductor = lot.product.conductors.getItems().find((c) => c.id === conductorId);
    if (!conductor) {
      throw DomainError.refused(
        `Conductor #${conductorId} is not a conductor of product ${lot.product.sku}.`,
        'conductorId',
      );
    }
    if (!conductor.active) {
      throw DomainError.refused(
        `The ${conductor.purpose} conductor (${conductor.gaugeLabel}) is no longer active on product ${lot.product.sku}.`,
        'conductorId',
      );
    }
    return conductor;
  }

  /**
   * Creates the sample of unit `seq` (the next free unit when omitted) for a conductor,
   * within the plan, audited; the caller flushes.
   */
  async createIn(
    em: EntityManager,
    lot: Lot,
    conductor: ConductorSpec,
    seq: number | undefined,
    unitRef: string | null,
    actor: RequestUser,
    clientId: string | null = null,
  ): Promise<Sample> {
    const taken = new Set(
      (await em.find(Sample, { lot, conductor }, { fields: ['seq'] })).map((s) => s.seq),
    );
    const unit = unitFor(lot, conductor, seq, taken);
    const [sample] = await this.add(em, lot, [{ conductor, seq: unit, unitRef }], actor);
    if (clientId) await keepClientKey(em, clientId, 'sample', sample.id);
    return sample;
  }

  /**
   * New samples of the lot, with one flush, each audited; the caller flushes again. Their
   * units must have passed `unitFor`. Used by `createIn` and the CSV import.
   */
  async add(
    em: EntityManager,
    lot: Lot,
    wanted: readonly { conductor: ConductorSpec; seq: number; unitRef: string | null }[],
    actor: RequestUser,
  ): Promise<Sample[]> {
    const createdBy = await em.findOneOrFail(User, { id: actor.id });
    const samples = wanted.map((w) =>
      em.create(Sample, {
        lot,
        conductor: w.conductor,
        seq: w.seq,
        unitRef: w.unitRef?.trim() || null,
        createdBy,
      }),
    );
    await em.flush();
    // Audited with SQL in the caller's transaction: an import makes a hundred samples and
    // more, and audit entities would be compared at every later flush of it.
    await this.audit.append(
      em,
      actor,
      samples.map((sample) => ({
        action: 'sample.create',
        entityType: 'sample',
        entityId: sample.id,
        lotId: lot.id,
        after: { seq: sample.seq, conductorId: sample.conductor.id, unitRef: sample.unitRef },
      })),
    );
    return samples;
  }
}

/**
 * The unit a new sample of `conductor` takes: `seq`, or the next free planned unit when
 * omitted; 422 beyond the plan or with every unit taken, 409 when `seq` is taken.
 */
export function unitFor(
  lot: Lot,
  conductor: ConductorSpec,
  seq: number | undefined,
  taken: ReadonlySet<number>,
): number {
  const planned = lot.samplingPlan.sampleSize;
  if (seq === undefined) {
    const unit = Array.from({ length: planned }, (_, i) => i + 1).find((n) => !taken.has(n));
    if (unit === undefined) {
      throw DomainError.refused(
        `All planned units already have a ${conductor.purpose} sample: ${planText(lot)}.`,
        'seq',
      );
    }
    return unit;
  }
  if (seq > planned) {
    throw DomainError.refused(
      `Unit ${seq} is beyond the plan: ${planText(lot)}, numbered 1 to ${planned}.`,
      'seq',
    );
  }
  if (taken.has(seq)) {
    throw DomainError.conflict(
      `Unit ${seq} already has a ${conductor.purpose} sample in this lot; add readings to it instead.`,
      'seq',
    );
  }
  return seq;
}

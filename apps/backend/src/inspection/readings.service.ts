import { BadRequestException, ConflictException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import type { MaterialId } from '@gaugeproof/standards';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import type { Instrument } from '../instruments/entities/instrument.entity';
import { User } from '../users/entities/user.entity';
import { CreateReadingDto, INPUT_FIELDS, METHOD_FIELDS } from './dto/create-reading.dto';
import { VoidReadingDto } from './dto/void-reading.dto';
import { Reading } from './entities/reading.entity';
import { Sample } from './entities/sample.entity';
import { resolutionsFor, snapshot } from './instrument-resolutions';
import { LotStatusService } from './lot-status';
import { computeReading, type ReadingInputs } from './reading-compute';
import { readingView } from './views';
import { auditShapeOf, outcomeOf } from './reading-rules';
import { asInstrument, ReadingWriter } from './reading-writer';

/** The inputs of the reading's method; 400 naming any field another method uses. */
export function methodInputs(dto: CreateReadingDto): ReadingInputs {
  const allowed = METHOD_FIELDS[dto.method];
  const foreign = INPUT_FIELDS.filter((f) => dto[f] !== undefined && !allowed.includes(f));
  if (foreign.length) {
    throw new BadRequestException(
      foreign.map((f) => `${f} is not used by the ${dto.method} method`),
    );
  }
  const inputs: ReadingInputs = {};
  for (const f of allowed) {
    const v = dto[f as (typeof INPUT_FIELDS)[number]];
    if (v !== undefined) inputs[f as keyof ReadingInputs] = v;
  }
  return inputs;
}

@Injectable()
export class ReadingsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly lotStatus: LotStatusService,
    private readonly writer: ReadingWriter,
  ) {}

  /** One reading from the clerk's form: written by the SQL writer (see ReadingWriter). */
  async create(sampleId: number, dto: CreateReadingDto, actor: RequestUser) {
    const inputs = methodInputs(dto);
    return this.writer.create(sampleId, dto.method, inputs, dto, actor);
  }

  /**
   * Computes and stores one reading on a sample, audited, and flushes it; the caller then
   * refreshes the lot status. Shared by the route and the CSV import.
   */
  async record(
    em: EntityManager,
    sample: Sample,
    method: CreateReadingDto['method'],
    inputs: ReadingInputs,
    instruments: Instrument[],
    actor: RequestUser,
  ): Promise<Reading> {
    const siblings = await em.find(
      Reading,
      { sample, voided: false },
      { orderBy: { takenAt: 'desc', id: 'desc' } },
    );
    const computed = computeReading({
      method,
      inputs,
      resolutions: resolutionsFor(method, instruments),
      gaugeLabel: sample.conductor.gaugeLabel,
      claimedMaterial: sample.conductor.claimedMaterial as MaterialId,
      minAreaRatio: sample.lot.product.minAreaRatio,
      siblings: siblings.map((r) => ({
        method: r.method,
        inputs: r.inputs as ReadingInputs,
        areaMm2: r.areaMm2,
      })),
    });
    const reading = em.create(Reading, {
      sample,
      method,
      inputs: inputs as Record<string, number>,
      instruments: instruments.map(snapshot),
      ...computed,
      takenBy: await em.findOneOrFail(User, { id: actor.id }),
    });
    em.persist(reading);
    await em.flush();
    const live = [reading, ...siblings];
    await this.recomputeSiblings(em, sample, actor, reading.id, live);
    this.audit.record(em, actor, {
      action: 'reading.create',
      entityType: 'reading',
      entityId: reading.id,
      lotId: sample.lot.id,
      after: auditShapeOf(reading),
    });
    return reading;
  }

  /**
   * When a reading is added or voided, the sample's other live readings are computed again
   * with the readings that now stand: a material finding needs mass and resistance together,
   * and must follow when one of them arrives or is voided. Each changed reading is updated
   * in place and audited as `reading.recompute`. `known`: the live readings, newest first (the order identification picks from), when the
   * caller has just read them (spares the query on every create).
   */
  private async recomputeSiblings(
    em: EntityManager,
    sample: Sample,
    actor: RequestUser,
    exceptId?: number,
    known?: Reading[],
  ) {
    await em.populate(sample, ['lot.product', 'conductor']);
    const live =
      known ??
      (await em.find(
        Reading,
        { sample, voided: false },
        { orderBy: { takenAt: 'desc', id: 'desc' } },
      ));
    for (const r of live.filter((x) => x.id !== exceptId)) {
      const others = live.filter((o) => o.id !== r.id);
      const computed = computeReading({
        method: r.method,
        inputs: r.inputs as ReadingInputs,
        resolutions: resolutionsFor(r.method, r.instruments.map(asInstrument)),
        gaugeLabel: sample.conductor.gaugeLabel,
        claimedMaterial: sample.conductor.claimedMaterial as MaterialId,
        minAreaRatio: sample.lot.product.minAreaRatio,
        siblings: others.map((o) => ({
          method: o.method,
          inputs: o.inputs as ReadingInputs,
          areaMm2: o.areaMm2,
        })),
      });
      if (outcomeOf(computed) === outcomeOf(r)) continue;
      const before = auditShapeOf(r);
      Object.assign(r, computed);
      this.audit.record(em, actor, {
        action: 'reading.recompute',
        entityType: 'reading',
        entityId: r.id,
        lotId: sample.lot.id,
        before,
        after: auditShapeOf(r),
      });
    }
    await em.flush();
  }

  async void(id: number, dto: VoidReadingDto, actor: RequestUser) {
    return this.em.transactional(async (tx) => {
      const reading = await tx.findOneOrFail(
        Reading,
        { id },
        { populate: ['sample.lot', 'takenBy', 'voidedBy'] },
      );
      if (reading.voided) {
        throw new ConflictException(
          `This reading was already voided on ${reading.voidedAt?.toISOString().slice(0, 10)}: ${reading.voidReason}`,
        );
      }
      const before = auditShapeOf(reading);
      reading.voided = true;
      reading.voidReason = dto.reason;
      reading.voidedBy = await tx.findOneOrFail(User, { id: actor.id });
      reading.voidedAt = new Date();
      await tx.flush();
      await this.recomputeSiblings(tx, reading.sample, actor);
      this.audit.record(tx, actor, {
        action: 'reading.void',
        entityType: 'reading',
        entityId: reading.id,
        lotId: reading.sample.lot.id,
        before,
        after: auditShapeOf(reading),
      });
      await this.lotStatus.refresh(tx, reading.sample.lot, actor);
      return readingView(reading);
    });
  }
}

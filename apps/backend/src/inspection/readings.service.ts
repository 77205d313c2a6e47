import { ForbiddenException, Injectable } from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { earlierRecordUnder } from './client-id';
import { Reading } from './entities/reading.entity';
import { readingView } from './views';
import { DomainError } from '../common/domain-error';
import type { RequestUser } from '../auth/request-user';
import { CreateReadingDto, INPUT_FIELDS, METHOD_FIELDS } from './dto/create-reading.dto';
import { VoidReadingDto } from './dto/void-reading.dto';
import type { ReadingInputs } from './reading-compute';
import { ReadingsRefused, ReadingWriter } from './reading-writer';

/** The inputs of the reading's method; 400 naming any field another method uses. */
export function methodInputs(dto: CreateReadingDto): ReadingInputs {
  const allowed = METHOD_FIELDS[dto.method];
  const foreign: string[] = INPUT_FIELDS.filter(
    (f) => dto[f] !== undefined && !allowed.includes(f),
  );
  if (dto.fourWire !== undefined && dto.method !== 'resistance') foreign.push('fourWire');
  if (foreign.length) {
    throw DomainError.invalid(
      foreign.map((f) => ({ field: f, message: `${f} is not used by the ${dto.method} method` })),
    );
  }
  if (dto.strandDiametersMm !== undefined && dto.strandDiameterMm !== undefined) {
    throw DomainError.invalid([
      {
        field: 'strandDiametersMm',
        message: 'strandDiameterMm and strandDiametersMm cannot both be given: send the list only',
      },
    ]);
  }
  const inputs: Record<string, number | number[]> = {};
  for (const f of allowed) {
    const v = dto[f as (typeof INPUT_FIELDS)[number]];
    if (v !== undefined) inputs[f] = Array.isArray(v) ? [...v] : v;
  }
  return inputs as ReadingInputs;
}

/** The clerk's form and QA's void, through the one reading write path (ReadingWriter). */
/** Lot statuses before a decision: a clerk may still correct their own readings. */
const OPEN_STATUSES: readonly string[] = ['on_hold', 'inspecting', 'awaiting_decision'];

@Injectable()
export class ReadingsService {
  constructor(
    private readonly writer: ReadingWriter,
    private readonly em: EntityManager,
  ) {}

  async create(sampleId: number, dto: CreateReadingDto, actor: RequestUser) {
    const entry = {
      sampleId,
      method: dto.method,
      inputs: methodInputs(dto),
      instrumentIds: dto.instrumentIds,
      clientId: dto.clientId ?? null,
      fourWire: dto.fourWire,
      confirmUnusual: dto.confirmUnusual,
    };
    if (dto.clientId) {
      const earlier = await this.byClientId(dto.clientId, sampleId);
      if (earlier) return earlier;
    }
    try {
      const [view] = await this.writer.write([entry], actor);
      return view;
    } catch (e) {
      const error = e instanceof ReadingsRefused ? e.refusals[0].error : e;
      // The same client id raced in on another connection (its row refused ours, or its
      // sample took the unit first): answer with its reading.
      const earlier = dto.clientId ? await this.byClientId(dto.clientId, sampleId) : null;
      if (earlier) return earlier;
      throw error;
    }
  }

  /** The reading a client id already made, on this sample; 409 when it made one elsewhere. */
  private byClientId(clientId: string, sampleId: number) {
    const em = this.em.fork();
    return earlierRecordUnder(
      em,
      clientId,
      'reading',
      { kind: 'sample', id: sampleId },
      async (id) => {
        const reading = await em.findOneOrFail(
          Reading,
          { id },
          { populate: ['sample', 'takenBy', 'voidedBy'] },
        );
        return { parentId: reading.sample.id, answer: readingView(reading) };
      },
    );
  }

  async void(id: number, dto: VoidReadingDto, actor: RequestUser) {
    if (actor.role === 'clerk') {
      // A clerk corrects their own slip while the lot is undecided; the QA lead and the
      // admin may void any reading.
      const reading = await this.em
        .fork()
        .findOne(Reading, { id }, { populate: ['sample.lot', 'takenBy'] });
      if (reading && reading.takenBy?.id !== actor.id) {
        throw new ForbiddenException(
          'A receiving clerk may void only readings they took; ask a QA lead to void this one.',
        );
      }
      const lot = reading?.sample.lot;
      if (lot && !OPEN_STATUSES.includes(lot.status)) {
        throw DomainError.refused(
          `Lot ${lot.poNumber} is already ${lot.status.replace(/_/g, ' ')}: after the decision only a QA lead can void its readings.`,
        );
      }
    }
    return this.writer.void(id, dto.reason, actor);
  }
}

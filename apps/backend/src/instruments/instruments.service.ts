import { Injectable } from '@nestjs/common';
import { EntityManager, type FilterQuery } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { addDays, isoDate } from '../common/calendar';
import { DomainError } from '../common/domain-error';
import { paging, parseSort, type Page } from '../common/paging';
import { CreateInstrumentDto } from './dto/create-instrument.dto';
import { ListInstrumentsDto } from './dto/list-instruments.dto';
import { UpdateInstrumentDto } from './dto/update-instrument.dto';
import { versionedEdit } from '../common/versioned-edit';
import { Instrument } from './entities/instrument.entity';
import {
  instrumentProblems,
  instrumentView,
  KIND_NAMES,
  type InstrumentView,
} from './instrument-rules';
import { clock } from '../common/clock';

const SORTS = ['name', 'kind', 'serial', 'calibrationDueOn'] as const;

/** What the usability rule reads of a register row. */
export type InstrumentRecord = Pick<
  Instrument,
  | 'id'
  | 'kind'
  | 'name'
  | 'serial'
  | 'resolution'
  | 'resolutionUnit'
  | 'calibrationDueOn'
  | 'active'
>;

/**
 * Refuses instruments that may not be used on `on`: unknown, retired or past their
 * calibration due date (ISO 9001 7.1.5: measuring equipment must be fit for its purpose).
 * `found`: the register rows of `ids` that exist. Returns them in the order of `ids`.
 */
export function usableInstruments<T extends InstrumentRecord>(
  ids: readonly number[],
  found: readonly T[],
  on: Date,
): T[] {
  const byId = new Map(found.map((i) => [i.id, i]));
  const day = isoDate(on);
  const problems: string[] = [];
  for (const id of new Set(ids)) {
    const i = byId.get(id);
    if (!i) {
      problems.push(`Instrument #${id} is not in the instrument register.`);
      continue;
    }
    const label = `${KIND_NAMES[i.kind]} '${i.name}' (serial ${i.serial})`;
    if (!i.active) {
      problems.push(`${label} is retired; readings with it are refused.`);
    } else if (i.calibrationDueOn < day) {
      problems.push(
        `${label} was due for calibration on ${i.calibrationDueOn}; readings with it are refused until it is recalibrated.`,
      );
    }
  }
  if (problems.length) throw DomainError.refused(problems.join(' '), 'instrumentIds');
  return ids.map((id) => byId.get(id) as T);
}

/**
 * `usableInstruments` on the register rows read through `em`, so a reading can check
 * inside its own unit of work.
 */
export async function assertUsableInstruments(
  em: EntityManager,
  ids: readonly number[],
  on: Date,
): Promise<Instrument[]> {
  const unique = [...new Set(ids)];
  const found = unique.length ? await em.find(Instrument, { id: { $in: unique } }) : [];
  return usableInstruments(ids, found, on);
}

@Injectable()
export class InstrumentsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
  ) {}

  /** See assertUsableInstruments; uses this request's EntityManager. */
  assertUsable(ids: readonly number[], on: Date = clock.now()): Promise<Instrument[]> {
    return assertUsableInstruments(this.em, ids, on);
  }

  async list(q: ListInstrumentsDto): Promise<Page<InstrumentView>> {
    const { page, pageSize, offset } = paging(q);
    const [field, dir] = parseSort(q.sort, SORTS, ['name', 'asc']);
    const where: FilterQuery<Instrument> = {};
    if (q.kind) where.kind = q.kind;
    if (q.active !== undefined) where.active = q.active;
    if (q.dueWithinDays !== undefined) {
      where.calibrationDueOn = { $lte: addDays(isoDate(clock.now()), q.dueWithinDays) };
    }
    const [rows, total] = await this.em.findAndCount(Instrument, where, {
      orderBy: { [field]: dir, id: 'asc' },
      limit: pageSize,
      offset,
    });
    return { items: rows.map((i) => instrumentView(i)), total, page, pageSize };
  }

  async get(id: number): Promise<InstrumentView> {
    return instrumentView(await this.em.findOneOrFail(Instrument, { id }));
  }

  async create(dto: CreateInstrumentDto, actor: RequestUser): Promise<InstrumentView> {
    const fields = { ...dto, name: dto.name.trim(), serial: dto.serial.trim() };
    this.check(fields);
    await this.assertSerialFree(fields.serial);
    const instrument = this.em.create(Instrument, fields);
    await this.em.flush();
    this.audit.record(this.em, actor, {
      action: 'instrument.create',
      entityType: 'instrument',
      entityId: instrument.id,
      after: instrumentView(instrument),
    });
    await this.em.flush();
    return instrumentView(instrument);
  }

  async update(id: number, dto: UpdateInstrumentDto, actor: RequestUser) {
    const { version, ...fields } = dto;
    return versionedEdit(this.em, {
      version,
      load: (em) => em.findOneOrFail(Instrument, { id }),
      view: (_em, instrument) => instrumentView(instrument),
      name: (instrument) => `instrument ${instrument.serial}`,
      change: async (em, instrument) => {
        const before = instrumentView(instrument);
        const next = {
          kind: fields.kind ?? instrument.kind,
          resolutionUnit: fields.resolutionUnit ?? instrument.resolutionUnit,
          calibratedOn: fields.calibratedOn ?? instrument.calibratedOn,
          calibrationDueOn: fields.calibrationDueOn ?? instrument.calibrationDueOn,
        };
        this.check(next);
        const serial = fields.serial?.trim();
        if (serial !== undefined && serial !== instrument.serial) {
          await this.assertSerialFree(serial, em);
        }
        const given = Object.fromEntries(Object.entries(fields).filter(([, v]) => v !== undefined));
        em.assign(instrument, {
          ...given,
          ...next,
          ...(fields.name !== undefined ? { name: fields.name.trim() } : {}),
          ...(serial !== undefined ? { serial } : {}),
        });
        await em.flush();
        const after = instrumentView(instrument);
        this.audit.record(em, actor, {
          action: 'instrument.update',
          entityType: 'instrument',
          entityId: instrument.id,
          before,
          after,
        });
        await em.flush();
        return after;
      },
    });
  }

  private check(i: Parameters<typeof instrumentProblems>[0]): void {
    const problems = instrumentProblems(i);
    if (problems.length) {
      throw DomainError.invalid(
        problems.map((message) => ({ field: message.split(' ', 1)[0], message })),
      );
    }
  }

  private async assertSerialFree(serial: string, em: EntityManager = this.em): Promise<void> {
    if (await em.count(Instrument, { serial })) {
      throw DomainError.conflict(
        `An instrument with serial ${serial} is already registered`,
        'serial',
      );
    }
  }
}

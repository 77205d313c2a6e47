import {
  BadRequestException,
  HttpException,
  Injectable,
  UnprocessableEntityException,
} from '@nestjs/common';
import { EntityManager } from '@mikro-orm/core';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import Papa from 'papaparse';
import type { RequestUser } from '../auth/request-user';
import { assertUsableInstruments } from '../instruments/instruments.service';
import { Instrument } from '../instruments/entities/instrument.entity';
import { Lot } from '../lots/entities/lot.entity';
import type { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { CreateReadingDto, INPUT_FIELDS } from './dto/create-reading.dto';
import { Sample } from './entities/sample.entity';
import { assertLotOpen, LotStatusService } from './lot-status';
import { methodInputs, ReadingsService } from './readings.service';
import { SamplesService } from './samples.service';
import { readingView, type ReadingView } from './views';

export interface RowError {
  /** Spreadsheet row: the header is row 1, the first reading row 2. */
  row: number;
  column: string | null;
  message: string;
}
type Row = Record<string, string | undefined>;

const REQUIRED = ['unit', 'conductor', 'method', 'instruments'] as const;
const messageOf = (e: unknown): string => {
  if (e instanceof HttpException) {
    const body = e.getResponse();
    const m = typeof body === 'string' ? body : (body as { message?: unknown }).message;
    return Array.isArray(m) ? m.join('; ') : String(m ?? e.message);
  }
  throw e;
};

/**
 * Readings from a bench logger's CSV, all or nothing: every row is checked and recorded
 * inside one transaction; any problem rolls it all back and lists every error.
 */
@Injectable()
export class ReadingsImportService {
  constructor(
    private readonly em: EntityManager,
    private readonly samples: SamplesService,
    private readonly readings: ReadingsService,
    private readonly lotStatus: LotStatusService,
  ) {}

  async import(lotId: number, file: Express.Multer.File | undefined, actor: RequestUser) {
    if (!file) throw new BadRequestException(['file is required: attach the CSV of readings']);
    const parsed = Papa.parse<Row>(file.buffer.toString('utf8').replace(/^\uFEFF/, ''), {
      header: true,
      skipEmptyLines: 'greedy',
      transformHeader: (h) => h.trim(),
    });
    const errors: RowError[] = parsed.errors.map((e) => ({
      row: (e.row ?? 0) + 2,
      column: null,
      message: e.message,
    }));
    const headers = parsed.meta.fields ?? [];
    const missing = REQUIRED.filter((c) => !headers.includes(c));
    for (const c of missing) errors.push({ row: 1, column: c, message: `column ${c} is missing` });
    if (!missing.length && parsed.data.length === 0) {
      errors.push({ row: 2, column: null, message: 'the file has no reading rows' });
    }
    if (errors.length) throw refusal(errors);

    return this.em.transactional(async (tx) => {
      const lot = await tx.findOneOrFail(Lot, { id: lotId }, { populate: ['product.conductors'] });
      assertLotOpen(lot);
      const saved: ReadingView[] = [];
      for (const [i, row] of parsed.data.entries()) {
        const reading = await this.row(tx, lot, row, i + 2, errors, actor);
        if (reading) saved.push(reading);
      }
      if (errors.length) throw refusal(errors);
      await this.lotStatus.refresh(tx, lot, actor);
      return { imported: saved.length, readings: saved };
    });
  }

  /** Checks and records one row; pushes its problems to `errors` and returns null if any. */
  private async row(
    em: EntityManager,
    lot: Lot,
    row: Row,
    rowNo: number,
    errors: RowError[],
    actor: RequestUser,
  ): Promise<ReadingView | null> {
    const before = errors.length;
    const fail = (column: string | null, message: string) =>
      errors.push({ row: rowNo, column, message });
    const cell = (c: string) => row[c]?.trim() ?? '';

    const unit = Number(cell('unit'));
    if (!Number.isInteger(unit) || unit < 1)
      fail('unit', `unit must be a whole unit number of at least 1 (got "${cell('unit')}")`);
    const conductor = conductorFor(lot, cell('conductor'));
    if (typeof conductor === 'string') fail('conductor', conductor);

    const body: Record<string, unknown> = { method: cell('method'), instrumentIds: [0] };
    for (const f of INPUT_FIELDS) {
      if (cell(f) === '') continue;
      const n = Number(cell(f).replace(',', '.'));
      if (Number.isFinite(n)) body[f] = n;
      else fail(f, `${f} must be a number (got "${cell(f)}")`);
    }
    const dto = plainToInstance(CreateReadingDto, body);
    for (const v of validateSync(dto)) {
      for (const m of Object.values(v.constraints ?? {})) fail(v.property, m);
    }
    const serials = cell('instruments')
      .split(';')
      .map((s) => s.trim())
      .filter(Boolean);
    const found = serials.length ? await em.find(Instrument, { serial: { $in: serials } }) : [];
    for (const s of serials.filter((s) => !found.some((i) => i.serial === s))) {
      fail('instruments', `no instrument with serial ${s} in the register`);
    }
    if (serials.length === 0)
      fail('instruments', 'instruments must list the serials used, separated by ;');
    if (errors.length > before || typeof conductor === 'string') return null;

    try {
      const inputs = methodInputs(dto);
      const ids = serials.map((s) => (found.find((i) => i.serial === s) as Instrument).id);
      const instruments = await assertUsableInstruments(em, ids, new Date());
      const sample = await this.sampleFor(em, lot, conductor, unit, cell('unitRef'), actor);
      const reading = await this.readings.record(
        em,
        sample,
        dto.method,
        inputs,
        instruments,
        actor,
      );
      return readingView(reading);
    } catch (e) {
      fail(columnOf(e), messageOf(e));
      return null;
    }
  }

  private async sampleFor(
    em: EntityManager,
    lot: Lot,
    conductor: ConductorSpec,
    unit: number,
    unitRef: string,
    actor: RequestUser,
  ): Promise<Sample> {
    const existing = await em.findOne(Sample, { lot, conductor, seq: unit });
    if (existing) return existing;
    try {
      return await this.samples.createIn(em, lot, conductor, unit, unitRef || null, actor);
    } catch (e) {
      throw Object.assign(e as object, { column: 'unit' });
    }
  }
}

/** A conductor by purpose (power, ground …) or by its number in the product's list, from 1. */
function conductorFor(lot: Lot, text: string): ConductorSpec | string {
  const active = lot.product.conductors
    .getItems()
    .filter((c) => c.active)
    .sort((a, b) => a.position - b.position);
  const byNumber = /^\d+$/.test(text) ? active[Number(text) - 1] : undefined;
  const byPurpose = active.filter((c) => c.purpose === text.toLowerCase());
  if (byNumber) return byNumber;
  if (byPurpose.length === 1) return byPurpose[0];
  const known = active.map((c, i) => `${i + 1} = ${c.purpose} ${c.gaugeLabel}`).join(', ');
  if (byPurpose.length > 1)
    return `the product has several ${text} conductors: use their number (${known})`;
  return `conductor "${text}" is not on product ${lot.product.sku}: use a purpose or number (${known})`;
}

function columnOf(e: unknown): string | null {
  const c = (e as { column?: unknown }).column;
  if (typeof c === 'string') return c;
  return e instanceof UnprocessableEntityException ? 'instruments' : null;
}

function refusal(errors: RowError[]) {
  return new UnprocessableEntityException({
    message: `${errors.length} problem(s) in the file; nothing was imported. Correct them and send the whole file again.`,
    errors,
  });
}

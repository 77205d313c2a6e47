import { MAX_IMPORT_ROWS, parseDecimal, parseDecimalList } from '@gaugeproof/api-types';
import { HttpException, Injectable, UnprocessableEntityException } from '@nestjs/common';
import { EntityManager, UniqueConstraintViolationException } from '@mikro-orm/core';
import { plainToInstance } from 'class-transformer';
import { validateSync } from 'class-validator';
import { createHash } from 'node:crypto';
import Papa from 'papaparse';
import type { RequestUser } from '../auth/request-user';
import { DomainError } from '../common/domain-error';
import { plainSql } from '../common/plain-sql';
import { Instrument } from '../instruments/entities/instrument.entity';
import { Lot } from '../lots/entities/lot.entity';
import { ConductorSpec } from '../products/entities/conductor-spec.entity';
import { User } from '../users/entities/user.entity';
import { CreateReadingDto, INPUT_FIELDS } from './dto/create-reading.dto';
import { ReadingImport } from './entities/reading-import.entity';
import { Sample } from './entities/sample.entity';
import { assertLotOpen } from './lot-status';
import {
  ReadingsRefused,
  ReadingWriter,
  type NewReading,
  type PreparedReadings,
} from './reading-writer';
import { methodInputs } from './readings.service';
import { SamplesService, unitFor } from './samples.service';
import type { ReadingView } from './views';

export interface RowError {
  /** Spreadsheet row: the header is row 1, the first reading row 2. */
  row: number;
  column: string | null;
  message: string;
}
type Row = Record<string, string | undefined>;

export { MAX_IMPORT_ROWS };
/** Rows checked between two turns given to other requests. */
const CHECKS_BETWEEN_TURNS = 100;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

export interface ImportAnswer {
  imported: number;
  readings: ReadingView[];
}

const REQUIRED = ['unit', 'conductor', 'method', 'instruments'] as const;
const KEY = /^[\x21-\x7e]{1,200}$/;

/** The sentence of a refusal from a rule (a DomainError) or from the upload's own checks. */
const messageOf = (e: unknown): string => {
  if (e instanceof DomainError) return e.message;
  if (e instanceof HttpException) {
    const body = e.getResponse();
    const m = typeof body === 'string' ? body : (body as { message?: unknown }).message;
    return Array.isArray(m) ? m.join('; ') : String(m ?? e.message);
  }
  throw e;
};

/** The CSV column of a request field a rule names (the form's instrumentIds, seq …). */
const COLUMN_OF_FIELD: Record<string, string> = {
  instrumentIds: 'instruments',
  seq: 'unit',
  sampleId: 'unit',
};

/**
 * Readings from a bench logger's CSV, all or nothing: every row is checked, then all are
 * recorded through the one reading write path in one transaction; any problem rolls it
 * all back and lists every error. Lookups are made once per file, never per row, so the
 * time grows with the rows, not their square. A retry (same Idempotency-Key, or the same
 * file) is answered with the first import's answer.
 */
@Injectable()
export class ReadingsImportService {
  constructor(
    private readonly em: EntityManager,
    private readonly samples: SamplesService,
    private readonly writer: ReadingWriter,
  ) {}

  async import(
    lotId: number,
    file: Express.Multer.File | undefined,
    actor: RequestUser,
    idempotencyKey?: string,
  ): Promise<ImportAnswer & { replayed: boolean }> {
    if (!file)
      throw DomainError.invalid([
        { field: 'file', message: 'file is required: attach the CSV of readings' },
      ]);
    if (idempotencyKey !== undefined && !KEY.test(idempotencyKey)) {
      throw DomainError.invalid([
        {
          field: null,
          message:
            'Idempotency-Key must be 1 to 200 visible characters (letters, digits, punctuation)',
        },
      ]);
    }
    const fileSha256 = createHash('sha256').update(file.buffer).digest('hex');
    const key = idempotencyKey ?? `sha256:${fileSha256}`;
    const rows = parse(file.buffer);
    // A retry of an import that went through is answered at once, computing nothing.
    const earlier = await this.em.fork().findOne(ReadingImport, { lot: lotId, key });
    if (earlier) return { ...replay(earlier, fileSha256), replayed: true };
    // Checked and computed before the write transaction, so the one SQLite connection is
    // free meanwhile and other requests (health included) are answered (issue 17).
    const plan = await this.plan(this.em.fork(), lotId, rows);
    try {
      const answer = await this.em.transactional(async (tx) => {
        const first = await tx.findOne(ReadingImport, { lot: lotId, key });
        if (first) return { ...replay(first, fileSha256), replayed: true };
        const lot = await tx.findOneOrFail(Lot, { id: lotId });
        assertLotOpen(lot);
        // Taken first: a retry sent while this import runs waits for it, then replays it.
        const record = tx.create(ReadingImport, {
          lot,
          key,
          fileSha256,
          importedBy: tx.getReference(User, actor.id),
        });
        await tx.flush();
        const answer = await this.record(tx, lot, plan, actor);
        // Written as it is, not through the entity: MikroORM would compare the whole answer
        // (every reading of the file) at each flush, holding the connection for a second.
        await plainSql(
          tx,
          'update reading_imports set answer = ? where id = ?',
          [JSON.stringify(answer), record.id],
          'run',
        );
        return { ...answer, replayed: false };
      });
      return answer;
    } catch (e) {
      if (!(e instanceof UniqueConstraintViolationException)) throw e;
      // The same import committed first on another connection: answer with its answer.
      const first = await this.em.fork().findOne(ReadingImport, { lot: lotId, key });
      if (!first) throw e;
      return { ...replay(first, fileSha256), replayed: true };
    }
  }

  /**
   * Checks every row, finds or plans the sample each needs and computes every reading,
   * reading the database outside any transaction; 422 with every problem by row and column.
   */
  private async plan(em: EntityManager, lotId: number, rows: Row[]): Promise<ImportPlan> {
    const lot = await em.findOneOrFail(Lot, { id: lotId }, { populate: ['product.conductors'] });
    assertLotOpen(lot);
    const errors: RowError[] = [];
    const checked: ReturnType<typeof checkRow>[] = [];
    for (const [i, row] of rows.entries()) {
      // Other requests get a turn every few rows here too: 5 000 rows are seconds of work.
      if (i % CHECKS_BETWEEN_TURNS === CHECKS_BETWEEN_TURNS - 1) await nextTurn();
      checked.push(checkRow(lot, row, i + 2, errors));
    }
    const serials = [...new Set(checked.flatMap((c) => c.serials))];
    const register = serials.length
      ? await em.find(Instrument, { serial: { $in: serials } }, { fields: ['id', 'serial'] })
      : [];
    const idOf = new Map(register.map((i) => [i.serial, i.id]));
    for (const c of checked) {
      for (const s of c.serials.filter((s) => !idOf.has(s))) {
        errors.push({
          row: c.rowNo,
          column: 'instruments',
          message: `no instrument with serial ${s} in the register`,
        });
      }
    }
    const valid = checked.filter(
      (c): c is CheckedRow => c.ok && c.serials.every((s) => idOf.has(s)),
    );
    const { sampleIds, newSamples } = await this.samplesFor(em, lot, valid, errors);
    const entries: ImportEntry[] = [];
    for (const c of valid) {
      const sampleId = sampleIds.get(c);
      if (sampleId === undefined) continue;
      entries.push({
        rowNo: c.rowNo,
        columns: c.columns,
        entry: {
          sampleId,
          method: c.method,
          inputs: c.inputs,
          instrumentIds: c.serials.map((s) => idOf.get(s) as number),
          fourWire: c.fourWire,
          confirmUnusual: c.confirmUnusual,
        },
      });
    }
    let prepared: PreparedReadings | null = null;
    try {
      prepared = await this.writer.prepare(
        em,
        entries.map((e) => e.entry),
        newSamples.map((n) => ({
          id: n.id,
          lotId: lot.id,
          conductorId: n.conductorId,
          seq: n.seq,
        })),
      );
    } catch (e) {
      if (!(e instanceof ReadingsRefused)) throw e;
      errors.push(...rowErrors(e, entries));
    }
    if (errors.length || !prepared) throw refusal(errors);
    return { prepared, newSamples, entries };
  }

  /** Creates the planned samples and writes the computed readings, in the transaction. */
  private async record(
    em: EntityManager,
    lot: Lot,
    plan: ImportPlan,
    actor: RequestUser,
  ): Promise<ImportAnswer> {
    const created = await this.samples.add(
      em,
      lot,
      plan.newSamples.map((n) => ({
        conductor: em.getReference(ConductorSpec, n.conductorId),
        seq: n.seq,
        unitRef: n.unitRef,
      })),
      actor,
    );
    const ids = new Map(plan.newSamples.map((n, i) => [n.id, created[i].id]));
    try {
      const readings = await this.writer.commit(em, plan.prepared, ids, actor);
      return { imported: readings.length, readings };
    } catch (e) {
      // Only when something changed since the plan and the readings were computed again.
      if (!(e instanceof ReadingsRefused)) throw e;
      throw refusal(rowErrors(e, plan.entries));
    }
  }

  /**
   * The sample of each row: the lot's existing one of that conductor and unit, or one to
   * make (named by a negative placeholder id until the transaction makes it).
   */
  private async samplesFor(
    em: EntityManager,
    lot: Lot,
    rows: readonly CheckedRow[],
    errors: RowError[],
  ): Promise<{ sampleIds: Map<CheckedRow, number>; newSamples: PlannedSample[] }> {
    const keyOf = (conductorId: number, seq: number) => `${conductorId}:${seq}`;
    const existing = await em.find(Sample, { lot }, { fields: ['id', 'seq', 'conductor'] });
    const ids = new Map(existing.map((s) => [keyOf(s.conductor.id, s.seq), s.id]));
    const newSamples: PlannedSample[] = [];
    const refused = new Map<string, string>();
    for (const c of rows) {
      const key = keyOf(c.conductor.id, c.unit);
      if (ids.has(key) || refused.has(key)) continue;
      try {
        unitFor(lot, c.conductor, c.unit, new Set());
        const planned = {
          id: -(newSamples.length + 1),
          conductorId: c.conductor.id,
          seq: c.unit,
          unitRef: c.unitRef || null,
        };
        newSamples.push(planned);
        ids.set(key, planned.id);
      } catch (e) {
        refused.set(key, messageOf(e));
      }
    }
    const sampleIds = new Map<CheckedRow, number>();
    for (const c of rows) {
      const key = keyOf(c.conductor.id, c.unit);
      const id = ids.get(key);
      if (id !== undefined) sampleIds.set(c, id);
      else errors.push({ row: c.rowNo, column: 'unit', message: refused.get(key) as string });
    }
    return { sampleIds, newSamples };
  }
}

/** A sample an import makes, named by a negative id until its transaction makes it. */
interface PlannedSample {
  id: number;
  conductorId: number;
  seq: number;
  unitRef: string | null;
}

/** An import checked and computed, waiting for its write transaction. */
interface ImportPlan {
  prepared: PreparedReadings;
  newSamples: PlannedSample[];
  entries: ImportEntry[];
}

/** An import's reading with the row it came from and the columns its fields were read from. */
interface ImportEntry {
  rowNo: number;
  entry: NewReading;
  columns: Record<string, string>;
}

/**
 * The refused entries of a write, as rows and columns of the file: one problem per field
 * the rule names (a questioned reading may name several), each on the column of its row.
 */
function rowErrors(e: ReadingsRefused, entries: readonly ImportEntry[]): RowError[] {
  return e.refusals.flatMap(({ index, error }) => {
    const { rowNo, columns } = entries[index];
    if (error instanceof DomainError) {
      return error.errors.map((f) => ({
        row: rowNo,
        column: columnOf(f.field, columns),
        message: f.message,
      }));
    }
    return [{ row: rowNo, column: null, message: messageOf(error) }];
  });
}

/** A row checked on its own: its serials, and when `ok` what its reading is. */
type RowCheck = CheckedRow | { ok: false; rowNo: number; serials: string[] };
interface CheckedRow {
  ok: true;
  rowNo: number;
  unit: number;
  conductor: ConductorSpec;
  method: NewReading['method'];
  inputs: NewReading['inputs'];
  serials: string[];
  unitRef: string;
  fourWire?: boolean;
  confirmUnusual?: boolean;
  /** The column of this row a request field was read from, where it is not the field's name. */
  columns: Record<string, string>;
}

/** Resistance columns, each naming its unit: Ω or mΩ (issue 13); resistanceOhm is Ω too. */
const RESISTANCE_COLUMNS = ['resistance_ohm', 'resistance_mohm', 'resistanceOhm'] as const;

/** Parses the file; 422 listing the problems of its form (columns, no rows, too many rows). */
function parse(buffer: Buffer): Row[] {
  const parsed = Papa.parse<Row>(buffer.toString('utf8').replace(/^\uFEFF/, ''), {
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
  if (parsed.data.length > MAX_IMPORT_ROWS) {
    errors.push({
      row: MAX_IMPORT_ROWS + 2,
      column: null,
      message: `the file has ${parsed.data.length} reading rows; one import takes at most ${MAX_IMPORT_ROWS}: split it into several files`,
    });
  }
  if (errors.length) throw refusal(errors);
  return parsed.data;
}

/** Checks one row on its own (no database); pushes its problems to `errors`. */
function checkRow(lot: Lot, row: Row, rowNo: number, errors: RowError[]): RowCheck {
  const before = errors.length;
  const fail = (column: string | null, message: string) =>
    errors.push({ row: rowNo, column, message });
  const cell = (c: string) => row[c]?.trim() ?? '';

  const unit = Number(cell('unit'));
  if (!/^\d+$/.test(cell('unit')) || !Number.isInteger(unit) || unit < 1)
    fail('unit', `unit must be a whole unit number of at least 1 (got "${cell('unit')}")`);
  const conductor = conductorFor(lot, cell('conductor'));
  if (typeof conductor === 'string') fail('conductor', conductor);

  const body: Record<string, unknown> = { method: cell('method'), instrumentIds: [0] };
  const numberIn = (column: string): number | undefined => {
    const n = parseDecimal(cell(column));
    if (n !== null) return n;
    fail(column, `${column} must be a number (got "${cell(column)}")`);
    return undefined;
  };
  for (const f of INPUT_FIELDS) {
    if (cell(f) === '' || f === 'strandDiametersMm') continue;
    const n = numberIn(f);
    if (n !== undefined) body[f] = n;
  }
  if (cell('strandDiametersMm') !== '') {
    // Several strands in one cell, separated by ; (a comma may be a decimal comma).
    const diameters = parseDecimalList(cell('strandDiametersMm'));
    if (diameters) body.strandDiametersMm = diameters;
    else fail('strandDiametersMm', `strandDiametersMm must be numbers of mm separated by ;`);
  }
  // The resistance names its unit in the header (issue 13): Ω or mΩ, never guessed.
  const given = RESISTANCE_COLUMNS.filter((c) => cell(c) !== '');
  const unitClash = given.length > 1;
  if (unitClash) {
    fail(
      given[1],
      `give the resistance in one column only (${given.join(' and ')} are both filled)`,
    );
  } else if (given.length === 1 && given[0] !== 'resistanceOhm') {
    const n = numberIn(given[0]);
    if (n !== undefined) body.resistanceOhm = given[0] === 'resistance_mohm' ? n / 1000 : n;
  }
  const flag = (column: string): boolean | undefined => {
    const v = cell(column).toLowerCase();
    if (v === '') return undefined;
    if (['true', 'yes', '1'].includes(v)) return true;
    if (['false', 'no', '0'].includes(v)) return false;
    fail(column, `${column} must be yes or no (got "${cell(column)}")`);
    return undefined;
  };
  const fourWire = flag('fourWire');
  if (fourWire !== undefined) body.fourWire = fourWire;
  const confirmUnusual = flag('confirmUnusual');
  const dto = plainToInstance(CreateReadingDto, body);
  for (const v of validateSync(dto)) {
    // A clash of resistance columns is said once, not again as a missing resistanceOhm.
    if (unitClash && v.property === 'resistanceOhm') continue;
    for (const m of Object.values(v.constraints ?? {})) fail(v.property, m);
  }
  const serials = cell('instruments')
    .split(';')
    .map((s) => s.trim())
    .filter(Boolean);
  if (serials.length === 0)
    fail('instruments', 'instruments must list the serials used, separated by ;');
  const refused = { ok: false as const, rowNo, serials };
  if (errors.length > before || typeof conductor === 'string') return refused;
  try {
    const inputs = methodInputs(dto);
    return {
      ok: true,
      rowNo,
      unit,
      conductor,
      method: dto.method,
      inputs,
      serials,
      unitRef: cell('unitRef'),
      fourWire: dto.fourWire,
      confirmUnusual,
      // The resistance came from the column that named its unit.
      columns: given.length === 1 ? { resistanceOhm: given[0] } : {},
    };
  } catch (e) {
    fail(null, messageOf(e));
    return refused;
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

/** The column of `field` in a row: the one it was read from, or its usual column. */
function columnOf(field: string | null, columns: Record<string, string>): string | null {
  return field ? (columns[field] ?? COLUMN_OF_FIELD[field] ?? field) : null;
}

/** The first import's answer to a retry; 422 when the key came with another file. */
function replay(first: ReadingImport, fileSha256: string): ImportAnswer {
  if (first.fileSha256 !== fileSha256 || !first.answer) {
    throw DomainError.refused(
      `This Idempotency-Key was already used on ${first.importedAt.toISOString().slice(0, 10)} for another file on this lot: send a new key with a new file.`,
    );
  }
  return first.answer as unknown as ImportAnswer;
}

function refusal(errors: RowError[]) {
  return new UnprocessableEntityException({
    message: `${errors.length} problem(s) in the file; nothing was imported. Correct them and send the whole file again.`,
    errors,
  });
}

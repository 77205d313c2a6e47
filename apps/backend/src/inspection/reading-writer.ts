import { Injectable } from '@nestjs/common';
import { DomainError } from '../common/domain-error';
import type { EntityManager } from '@mikro-orm/core';
import type { MaterialId } from '@gaugeproof/standards';
import { AuditService, type AuditEntry } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { usableInstruments, type InstrumentRecord } from '../instruments/instruments.service';
import type { InstrumentKind } from '../instruments/entities/instrument.entity';
import { instantOf, jsonOf } from '../common/sql-values';
import { isoDate } from '../common/calendar';
import type { LotStatus } from '../lots/entities/lot.entity';
import type { InstrumentSnapshot, ReadingMethod, Verdict } from './entities/reading.entity';
import { resolutionsFor, snapshot } from './instrument-resolutions';
import { assertLotOpen, evidenceOf, nextStatus, statusChange } from './lot-status';
import {
  computeReading,
  fourWireOf,
  type ComputedReading,
  type ReadingInputs,
} from './reading-compute';
import { auditShape, outcomeOf } from './reading-rules';
import { readingFactsView } from './views';
import { keepClientKey } from './client-id';
import { GroupCommit } from '../common/group-commit';
import { plainSql } from '../common/plain-sql';
import { assertEvidenceNotSent } from './evidence-freeze';
import { clock } from '../common/clock';

/** One reading to record: on a sample, by a method, with the register's instruments used. */
export interface NewReading {
  sampleId: number;
  method: ReadingMethod;
  /** The method's inputs only (see `methodInputs`). */
  inputs: ReadingInputs;
  instrumentIds: readonly number[];
  /** The client's UUID for this reading (bench mode), kept in client_keys (client-id.ts). */
  clientId?: string | null;
  /** Resistance: four-wire (default true); null for the other methods. */
  fourWire?: boolean | null;
  /** The clerk confirms a reading the plausibility checks question (issue 13). */
  confirmUnusual?: boolean;
}

export interface WriteOptions {
  /**
   * Write inside this transaction (the import's, the seed's) instead of one of the writer's
   * own; the caller then commits.
   */
  em?: EntityManager;
}

/**
 * Entries of one call that were refused, by their index in the call. Nothing of the call
 * was written. `error` is what the entry alone would have been answered with.
 */
export class ReadingsRefused extends Error {
  constructor(readonly refusals: readonly { index: number; error: unknown }[]) {
    super(`${refusals.length} reading(s) refused`);
  }
}

/** A sample the caller creates in its transaction, named until then by `id` (negative). */
export interface NewSamplePlan {
  id: number;
  lotId: number;
  conductorId: number;
  seq: number;
}

/** What `prepare` read and computed, for `commit`. */
export interface PreparedReadings {
  entries: readonly NewReading[];
  read: ReadState;
  computed: Computed;
  at: Date;
}

/** What a computation reads, and the versions of lots and instruments it read. */
interface ReadState {
  samples: Map<number, SampleRow>;
  register: (InstrumentRecord & { version: number })[];
  live: Map<number, LiveReading[]>;
  lotVersions: Map<number, number>;
  instrumentVersions: Map<number, number>;
}

interface Computed {
  added: LiveReading[];
  touched: SampleRow[];
}

/** Entries computed between two turns given to other requests (prepare only). */
const YIELD_EVERY = 25;
const nextTurn = () => new Promise<void>((resolve) => setImmediate(resolve));

/** Row of the sample with what its readings need of lot, product and conductor. */
interface SampleRow {
  id: number;
  /** The unit's number in the plan, and the conductor's purpose: how a clerk names a sample. */
  seq: number;
  purpose: string;
  lotId: number;
  status: LotStatus;
  poNumber: string;
  productId: number;
  samplingPlan: string | { sampleSize: number; reject: number };
  minAreaRatio: number;
  gaugeLabel: string;
  claimedMaterial: string;
  conductorClass: number | null;
  claimedStrands: number | null;
}

/** A live reading of a sample as the writer holds it (stored, or about to be). */
interface LiveReading extends ComputedReading {
  /** 0 until inserted. */
  id: number;
  sampleId: number;
  method: ReadingMethod;
  inputs: ReadingInputs;
  instruments: InstrumentSnapshot[];
  fourWire: boolean | null;
  confirmedUnusual: boolean;
  /** Index of the entry in this call; undefined for a reading stored before it. */
  entry?: number;
}

/** Columns a computation fills, in the order of COMPUTED_VALUES. */
const COMPUTED_COLUMNS = [
  'area_mm2',
  'u_mm2',
  'expanded_umm2',
  'area_ratio',
  'measures_as',
  'identified_material',
  'material_mismatch',
  'verdict',
  'result',
] as const;
const computedValues = (c: ComputedReading) => [
  c.areaMm2,
  c.uMm2,
  c.expandedUMm2,
  c.areaRatio,
  c.measuresAs,
  c.identifiedMaterial,
  c.materialMismatch,
  c.verdict,
  JSON.stringify(c.result),
];
/** Readings written by one INSERT statement when many are written at once (an import). */
const INSERT_BATCH = 50;
const READING_COLUMNS = `sample_id, method, inputs, instruments, ${COMPUTED_COLUMNS.join(', ')},
           taken_by_id, taken_at, voided, four_wire, confirmed_unusual`;
const READING_MARKS = `(?, ?, ?, ?, ${COMPUTED_COLUMNS.map(() => '?').join(', ')}, ?, ?, ?, ?, ?)`;
const INSERT_ONE = `insert into readings (${READING_COLUMNS}) values ${READING_MARKS} returning id`;
const INSERT_BATCH_SQL = `insert into readings (${READING_COLUMNS}) values ${Array.from(
  { length: INSERT_BATCH },
  () => READING_MARKS,
).join(', ')} returning id`;

const computedOf = (r: ComputedReading): ComputedReading => ({
  areaMm2: r.areaMm2,
  uMm2: r.uMm2,
  expandedUMm2: r.expandedUMm2,
  areaRatio: r.areaRatio,
  measuresAs: r.measuresAs,
  identifiedMaterial: r.identifiedMaterial,
  materialMismatch: r.materialMismatch,
  verdict: r.verdict,
  result: r.result,
});

const SAMPLE_SELECT = `select s.id, s.seq, c.purpose, s.lot_id as "lotId", l.status, l.po_number as "poNumber",
       l.product_id as "productId", l.sampling_plan as "samplingPlan",
       p.min_area_ratio as "minAreaRatio", c.gauge_label as "gaugeLabel",
       c.claimed_material as "claimedMaterial", c.conductor_class as "conductorClass",
       c.claimed_strands as "claimedStrands"
  from samples s join lots l on l.id = s.lot_id join products p on p.id = l.product_id
  join conductor_specs c on c.id = s.conductor_id`;
const READING_SELECT = `select id, sample_id as "sampleId", method, inputs, instruments,
       area_mm2 as "areaMm2", u_mm2 as "uMm2", expanded_umm2 as "expandedUMm2",
       area_ratio as "areaRatio", measures_as as "measuresAs",
       identified_material as "identifiedMaterial", material_mismatch as "materialMismatch",
       verdict, result, four_wire as "fourWire", confirmed_unusual as "confirmedUnusual"
  from readings`;
/**
 * Live (not voided) readings one sample may hold: a cut end is weighed, counted and measured
 * a few times, and a thousand readings made one lot page 2.4 MB (issue 17). Common practice,
 * no source; voiding a wrong one makes room.
 */
export const MAX_LIVE_READINGS_PER_SAMPLE = 20;

/** Values bound in one `in (…)` list at the most: well under SQLite's and PostgreSQL's limits. */
const CHUNK = 500;

/**
 * The one way readings are written and voided: the clerk's form, the CSV import and the
 * demo seed all call `write`, QA's void calls `void`. Each call is one transaction: the
 * instrument check and computation of every entry, the recompute of the other live readings
 * of each sample touched (a material finding needs mass and resistance together, and must
 * follow when one of them arrives or is voided), the audit and the lot status, once per
 * call however many readings it holds, so an import costs time in proportion to its rows.
 *
 * Plain, portable SQL in about ten statements for one reading, without hydrating and
 * change-tracking the sample, lot, product, conductor, instruments, user and siblings it
 * reads (that was most of a reading's time). The PostgreSQL pass runs it too.
 */
@Injectable()
export class ReadingWriter {
  constructor(
    private readonly commits: GroupCommit,
    private readonly audit: AuditService,
  ) {}

  /**
   * Records the entries, in order (a later entry is the newer reading), and returns their
   * views in the same order. Throws `ReadingsRefused` listing every refused entry; then
   * nothing of the call is written.
   */
  async write(entries: readonly NewReading[], actor: RequestUser, options: WriteOptions = {}) {
    const at = clock.now();
    if (options.em) return this.writeIn(options.em, entries, actor, at);
    // Readings posted at the same moment share one commit (common/group-commit.ts).
    return this.commits.run((em) => this.writeIn(em, entries, actor, at));
  }

  /** Voids a reading with a reason; its sample's other live readings are computed again. */
  async void(id: number, reason: string, actor: RequestUser, options: WriteOptions = {}) {
    const at = clock.now();
    if (options.em) return this.voidIn(options.em, id, reason, actor, at);
    return this.commits.run((em) => this.voidIn(em, id, reason, actor, at));
  }

  private async voidIn(
    em: EntityManager,
    id: number,
    reason: string,
    actor: RequestUser,
    at: Date,
  ) {
    const [row] = await plainSql<(LiveRow & VoidFacts)[]>(
      em,
      `${READING_SELECT.replace('from readings', VOID_FACTS)} where id = ?`,
      [id],
    );
    if (!row) throw DomainError.notFound('No such record');
    if (row.voided) {
      throw DomainError.conflict(
        `This reading was already voided on ${isoDate(instantOf(row.voidedAt))}: ${row.voidReason}`,
      );
    }
    const reading = liveOf(row);
    const [sample] = await this.samples(em, [reading.sampleId]);
    await assertEvidenceNotSent(
      em,
      { id: sample.lotId, poNumber: sample.poNumber },
      'this reading cannot be voided',
    );
    await plainSql(
      em,
      'update readings set voided = ?, void_reason = ?, voided_by_id = ?, voided_at = ? where id = ?',
      [true, reason, actor.id, at, id],
      'run',
    );
    const shaped = { ...reading, inputs: reading.inputs as Record<string, number>, ...NOT_VOIDED };
    const events: AuditEntry[] = [
      {
        action: 'reading.void',
        entityType: 'reading',
        entityId: id,
        lotId: sample.lotId,
        before: auditShape(shaped),
        after: auditShape({ ...shaped, voided: true, voidReason: reason }),
      },
    ];
    await this.settle(em, [sample], await this.liveReadings(em, [sample.id]), events, at);
    await this.audit.append(em, actor, events, at);
    return readingFactsView({
      ...shaped,
      takenAt: instantOf(row.takenAt),
      takenBy: row.takenById ? { id: row.takenById, name: row.takenByName } : null,
      voided: true,
      voidReason: reason,
      voidedAt: at,
      voidedBy: { id: actor.id, name: actor.name },
    });
  }

  private async writeIn(
    em: EntityManager,
    entries: readonly NewReading[],
    actor: RequestUser,
    at: Date,
  ) {
    const read = await this.read(em, entries, []);
    const computed = await this.compute(read, entries, at, false);
    return this.store(em, read, entries, computed, actor, at);
  }

  /**
   * The first half of a large write (the CSV import), outside any transaction: reads what
   * the entries need and computes them, yielding to other requests as it goes, so the one
   * SQLite connection is not held while it computes (issue 17). Entries may name samples the
   * caller will create in its transaction by a placeholder id (negative) in `newSamples`.
   * Throws `ReadingsRefused` like `write`. Hand the result to `commit` inside the transaction.
   */
  async prepare(
    em: EntityManager,
    entries: readonly NewReading[],
    newSamples: readonly NewSamplePlan[],
    at: Date = clock.now(),
  ): Promise<PreparedReadings> {
    const read = await this.read(em, entries, newSamples);
    const computed = await this.compute(read, entries, at, true);
    return { entries, read, computed, at };
  }

  /**
   * The second half, in the caller's transaction: `created` maps each placeholder sample id
   * to the sample made. When nothing the computation read has changed since `prepare` (the
   * lots' versions, which every reading, void and decision moves, and the instruments'), the
   * computed readings are written as they are; otherwise all is read and computed again
   * here, as `write` does.
   */
  async commit(
    em: EntityManager,
    prepared: PreparedReadings,
    created: ReadonlyMap<number, number>,
    actor: RequestUser,
  ) {
    const real = (id: number) => (id < 0 ? (created.get(id) as number) : id);
    const entries = prepared.entries.map((e) => ({ ...e, sampleId: real(e.sampleId) }));
    if (await this.changedSince(em, prepared.read)) {
      return this.writeIn(em, entries, actor, prepared.at);
    }
    const { read, computed } = prepared;
    const samples = new Map(
      [...read.samples.values()].map((s) => [real(s.id), { ...s, id: real(s.id) }]),
    );
    const live = new Map([...read.live].map(([id, list]) => [real(id), list]));
    for (const r of computed.added) r.sampleId = real(r.sampleId);
    const touched = computed.touched.map((s) => samples.get(real(s.id)) as SampleRow);
    return this.store(
      em,
      { ...read, samples, live },
      entries,
      { added: computed.added, touched },
      actor,
      prepared.at,
    );
  }

  /** Whether a lot or instrument the computation read has moved on since. */
  private async changedSince(em: EntityManager, read: ReadState): Promise<boolean> {
    const now = async (table: string, ids: readonly number[]) => {
      const out = new Map<number, number>();
      for (const chunk of chunks(ids)) {
        const rows = await plainSql<{ id: number; version: number }[]>(
          em,
          `select id, version from ${table} where id in (${marks(chunk)})`,
          chunk,
        );
        for (const r of rows) out.set(Number(r.id), Number(r.version));
      }
      return out;
    };
    const differs = (seen: ReadonlyMap<number, number>, current: ReadonlyMap<number, number>) =>
      [...seen].some(([id, v]) => current.get(id) !== v);
    return (
      differs(read.lotVersions, await now('lots', [...read.lotVersions.keys()])) ||
      differs(
        read.instrumentVersions,
        await now('instruments', [...read.instrumentVersions.keys()]),
      )
    );
  }

  /** Everything the computation of `entries` reads, with the versions it was read at. */
  private async read(
    em: EntityManager,
    entries: readonly NewReading[],
    newSamples: readonly NewSamplePlan[],
  ): Promise<ReadState> {
    const stored = await this.samples(
      em,
      entries.map((e) => e.sampleId).filter((id) => id > 0),
    );
    const planned = await this.plannedSamples(em, newSamples);
    const samples = new Map([...stored, ...planned].map((s) => [s.id, s]));
    const register = await this.register(
      em,
      entries.flatMap((e) => e.instrumentIds),
    );
    const live = await this.liveReadings(
      em,
      [...samples.keys()].filter((id) => id > 0),
    );
    for (const s of planned) live.set(s.id, []);
    const lotIds = [...new Set([...samples.values()].map((s) => s.lotId))];
    const lotVersions = new Map<number, number>();
    for (const chunk of chunks(lotIds)) {
      const rows = await plainSql<{ id: number; version: number }[]>(
        em,
        `select id, version from lots where id in (${marks(chunk)})`,
        chunk,
      );
      for (const r of rows) lotVersions.set(Number(r.id), Number(r.version));
    }
    const instrumentVersions = new Map(register.map((i) => [i.id, i.version]));
    return { samples, register, live, lotVersions, instrumentVersions };
  }

  /**
   * Checks and computes every entry against what was read (CPU only). With `yielding`,
   * gives other requests a turn of the event loop every few entries.
   */
  private async compute(
    read: ReadState,
    entries: readonly NewReading[],
    at: Date,
    yielding: boolean,
  ): Promise<Computed> {
    const { samples, register, live } = read;
    const refusals: { index: number; error: unknown }[] = [];
    const added: LiveReading[] = [];
    for (const [index, entry] of entries.entries()) {
      if (yielding && index % YIELD_EVERY === YIELD_EVERY - 1) await nextTurn();
      try {
        const sample = samples.get(entry.sampleId);
        if (!sample) throw DomainError.notFound(`Sample ${entry.sampleId} not found`);
        assertLotOpen(sample);
        const instruments = usableInstruments(entry.instrumentIds, register, at);
        const siblings = live.get(sample.id) ?? [];
        if (siblings.length >= MAX_LIVE_READINGS_PER_SAMPLE) {
          throw DomainError.refused(
            `Unit ${sample.seq}, ${sample.purpose} conductor already holds ${MAX_LIVE_READINGS_PER_SAMPLE} readings that stand, the most one sample may hold: void a wrong one before recording another.`,
            'sampleId',
          );
        }
        const fourWire = fourWireOf({ method: entry.method, fourWire: entry.fourWire });
        const computed = computeReading({
          ...context(sample),
          method: entry.method,
          inputs: entry.inputs,
          fourWire,
          resolutions: resolutionsFor(entry.method, instruments),
          siblings,
          entry: { confirmUnusual: entry.confirmUnusual === true },
        });
        const reading: LiveReading = {
          ...computed,
          id: 0,
          sampleId: sample.id,
          method: entry.method,
          inputs: entry.inputs,
          instruments: instruments.map(snapshot),
          fourWire,
          confirmedUnusual: computed.result.unusual !== null,
          entry: index,
        };
        live.set(sample.id, [reading, ...siblings]);
        added.push(reading);
      } catch (error) {
        refusals.push({ index, error });
      }
    }
    if (refusals.length) throw new ReadingsRefused(refusals);

    const touched = [...new Set(added.map((r) => r.sampleId))].map(
      (id) => samples.get(id) as SampleRow,
    );
    // The entries' final results: computed with every reading of their sample that stands.
    for (const [n, sample] of touched.entries()) {
      if (yielding && n % YIELD_EVERY === YIELD_EVERY - 1) await nextTurn();
      const all = live.get(sample.id) as LiveReading[];
      all.forEach((r, i) => {
        if (r.entry === undefined || i === 0) return; // the newest already saw all the others
        Object.assign(r, recomputed(sample, r, all));
      });
    }
    return { added, touched };
  }

  /** Writes computed readings, the recompute of stored siblings, the audit and lot status. */
  private async store(
    em: EntityManager,
    read: Pick<ReadState, 'samples' | 'live'>,
    entries: readonly NewReading[],
    { added, touched }: Computed,
    actor: RequestUser,
    at: Date,
  ) {
    const { samples, live } = read;
    const events: AuditEntry[] = [];
    // Many readings (an import) go in statements of INSERT_BATCH rows: one statement a
    // reading held the connection, and with it every other request, for seconds (issue 17).
    const values = (r: LiveReading) => [
      r.sampleId,
      r.method,
      JSON.stringify(r.inputs),
      JSON.stringify(r.instruments),
      ...computedValues(r),
      actor.id,
      at,
      false,
      r.fourWire,
      r.confirmedUnusual,
    ];
    for (let i = 0; i < added.length;) {
      const batch =
        added.length - i >= INSERT_BATCH ? added.slice(i, i + INSERT_BATCH) : [added[i]];
      i += batch.length;
      const rows = await plainSql<{ id: number }[]>(
        em,
        batch.length === 1 ? INSERT_ONE : INSERT_BATCH_SQL,
        batch.flatMap(values),
        'all',
      );
      // Ids are given in the order of the VALUES rows (SQLite's rowid, a PostgreSQL
      // sequence), whatever order RETURNING lists them in.
      const ids = rows.map((row) => Number(row.id)).sort((a, b) => a - b);
      for (const [k, r] of batch.entries()) {
        const id = ids[k];
        r.id = id;
        const clientId = r.entry === undefined ? null : entries[r.entry]?.clientId;
        if (clientId) await keepClientKey(em, clientId, 'reading', id, at);
        events.push({
          action: 'reading.create',
          entityType: 'reading',
          entityId: id,
          lotId: (samples.get(r.sampleId) as SampleRow).lotId,
          after: auditShape({ ...r, inputs: r.inputs as Record<string, number>, ...NOT_VOIDED }),
        });
      }
    }
    await this.settle(em, touched, live, events, at);
    await this.audit.append(em, actor, events, at);
    return added.map((r) =>
      readingFactsView({
        ...r,
        inputs: r.inputs as Record<string, number>,
        ...NOT_VOIDED,
        takenAt: at,
        takenBy: { id: actor.id, name: actor.name },
        voidedBy: null,
        voidedAt: null,
      }),
    );
  }

  /**
   * After readings of `touched` samples were added or voided: every reading stored before
   * that still stands is computed again with the others (`live`), updated and audited as
   * `reading.recompute` where its outcome changed; then the status of each lot concerned.
   */
  private async settle(
    em: EntityManager,
    touched: readonly SampleRow[],
    live: Map<number, LiveReading[]>,
    events: AuditEntry[],
    at: Date,
  ) {
    for (const sample of touched) {
      const all = live.get(sample.id) ?? [];
      for (const r of all) {
        if (r.entry !== undefined) continue;
        const again = recomputed(sample, r, all);
        if (outcomeOf(again) === outcomeOf(r)) continue;
        await plainSql(
          em,
          `update readings set ${COMPUTED_COLUMNS.map((c) => `${c} = ?`).join(', ')} where id = ?`,
          [...computedValues(again), r.id],
          'run',
        );
        const shaped = { ...r, inputs: r.inputs as Record<string, number>, ...NOT_VOIDED };
        events.push({
          action: 'reading.recompute',
          entityType: 'reading',
          entityId: r.id,
          lotId: sample.lotId,
          before: auditShape(shaped),
          after: auditShape({ ...shaped, ...again }),
        });
        Object.assign(r, again);
      }
    }
    const lots = new Map(touched.map((s) => [s.lotId, s]));
    for (const sample of lots.values()) await this.lotStatus(em, sample, events, at);
  }

  /** The samples of `ids` with their lot, product and conductor facts. */
  private async samples(em: EntityManager, ids: readonly number[]): Promise<SampleRow[]> {
    const rows: SampleRow[] = [];
    for (const chunk of chunks([...new Set(ids)])) {
      rows.push(
        ...(await plainSql<SampleRow[]>(
          em,
          `${SAMPLE_SELECT} where s.id in (${marks(chunk)})`,
          chunk,
        )),
      );
    }
    return rows;
  }

  /** What the readings of samples not made yet need: their lot's and conductor's facts. */
  private async plannedSamples(
    em: EntityManager,
    plans: readonly NewSamplePlan[],
  ): Promise<SampleRow[]> {
    if (!plans.length) return [];
    const conductorIds = [...new Set(plans.map((p) => p.conductorId))];
    const facts = new Map<string, Omit<SampleRow, 'id' | 'seq'>>();
    for (const lotId of new Set(plans.map((p) => p.lotId))) {
      for (const chunk of chunks(conductorIds)) {
        const rows = await plainSql<(Omit<SampleRow, 'id' | 'seq'> & { conductorId: number })[]>(
          em,
          `select c.id as "conductorId", c.purpose, l.id as "lotId", l.status,
                  l.po_number as "poNumber", l.product_id as "productId",
                  l.sampling_plan as "samplingPlan", p.min_area_ratio as "minAreaRatio",
                  c.gauge_label as "gaugeLabel", c.claimed_material as "claimedMaterial",
                  c.conductor_class as "conductorClass", c.claimed_strands as "claimedStrands"
             from lots l join products p on p.id = l.product_id
             join conductor_specs c on c.product_id = p.id
            where l.id = ? and c.id in (${marks(chunk)})`,
          [lotId, ...chunk],
        );
        for (const { conductorId, ...row } of rows) facts.set(`${lotId}:${conductorId}`, row);
      }
    }
    return plans.flatMap((p) => {
      const row = facts.get(`${p.lotId}:${p.conductorId}`);
      return row ? [{ ...row, id: p.id, seq: p.seq }] : [];
    });
  }

  /** The live readings of each sample, newest first (the order identification picks from). */
  private async liveReadings(em: EntityManager, sampleIds: readonly number[]) {
    const live = new Map<number, LiveReading[]>(sampleIds.map((id) => [id, []]));
    for (const chunk of chunks(sampleIds)) {
      const rows = await plainSql<LiveRow[]>(
        em,
        `${READING_SELECT} where sample_id in (${marks(chunk)}) and voided = ?
          order by taken_at desc, id desc`,
        [...chunk, false],
      );
      for (const row of rows) live.get(row.sampleId)?.push(liveOf(row));
    }
    return live;
  }

  /** The register rows of the instruments named (the usability rule reads them). */
  private async register(em: EntityManager, ids: readonly number[]) {
    const rows: (InstrumentRecord & { version: number })[] = [];
    for (const chunk of chunks([...new Set(ids)])) {
      const found = await plainSql<
        (InstrumentRecord & { active: number | boolean; version: number | string })[]
      >(
        em,
        `select id, kind, name, serial, resolution, resolution_unit as "resolutionUnit",
                calibration_due_on as "calibrationDueOn", active,
                accuracy_percent_of_reading as "accuracyPercentOfReading",
                accuracy_absolute as "accuracyAbsolute",
                calibration_uncertainty as "calibrationUncertainty", version
           from instruments where id in (${marks(chunk)})`,
        chunk,
      );
      rows.push(
        ...found.map((r) => ({ ...r, active: Boolean(r.active), version: Number(r.version) })),
      );
    }
    return rows;
  }

  /** The lot's next status, and a touch that bumps its version (a decision on the old evidence meets 409). */
  private async lotStatus(em: EntityManager, sample: SampleRow, events: AuditEntry[], at: Date) {
    const before = sample.status;
    const plan = jsonOf<{ sampleSize: number; reject: number }>(sample.samplingPlan);
    const lot = {
      id: sample.lotId,
      productId: sample.productId,
      sampleSize: plan.sampleSize,
      reject: plan.reject,
    };
    const after = await nextStatus(
      before,
      () => evidenceOf(em, lot),
      async () => {
        const [d] = await plainSql<{ n: number | string }[]>(
          em,
          'select count(*) as n from decisions where lot_id = ?',
          [lot.id],
        );
        return Number(d.n) > 0;
      },
    );
    await plainSql(
      em,
      'update lots set status = ?, updated_at = ?, version = version + 1 where id = ?',
      [after, at, lot.id],
      'run',
    );
    if (after !== before) events.push(statusChange(lot.id, before, after));
  }
}

const NOT_VOIDED = { voided: false, voidReason: null } as const;

/** A reading as stored (JSON as text on SQLite, parsed on PostgreSQL; booleans 0/1 or true/false). */
interface LiveRow extends Omit<
  LiveReading,
  'inputs' | 'instruments' | 'materialMismatch' | 'result' | 'fourWire' | 'confirmedUnusual'
> {
  fourWire: number | boolean | null;
  confirmedUnusual: number | boolean;
  inputs: string | ReadingInputs;
  instruments: string | InstrumentSnapshot[];
  materialMismatch: number | boolean;
  verdict: Verdict;
  result: string | Record<string, unknown>;
}
/** What a void reads beyond the computation: the state and who took the reading. */
const VOID_FACTS = `, voided, void_reason as "voidReason", voided_at as "voidedAt",
       taken_at as "takenAt", taken_by_id as "takenById",
       (select u.name from users u where u.id = taken_by_id) as "takenByName"
  from readings`;
interface VoidFacts {
  voided: number | boolean;
  voidReason: string | null;
  voidedAt: unknown;
  takenAt: unknown;
  takenById: number;
  takenByName: string;
}

function liveOf(row: LiveRow): LiveReading {
  return {
    id: row.id,
    sampleId: row.sampleId,
    method: row.method,
    inputs: jsonOf<ReadingInputs>(row.inputs),
    instruments: jsonOf<InstrumentSnapshot[]>(row.instruments),
    fourWire: row.fourWire === null || row.fourWire === undefined ? null : Boolean(row.fourWire),
    confirmedUnusual: Boolean(row.confirmedUnusual),
    ...computedOf({
      ...row,
      materialMismatch: Boolean(row.materialMismatch),
      result: jsonOf<Record<string, unknown>>(row.result),
    }),
  };
}

const context = (s: SampleRow) => ({
  gaugeLabel: s.gaugeLabel,
  claimedMaterial: s.claimedMaterial as MaterialId,
  minAreaRatio: s.minAreaRatio,
  conductorClass: s.conductorClass,
  claimedStrands: s.claimedStrands,
});

/** `r` computed again with the sample's other live readings (`all`, newest first). */
function recomputed(sample: SampleRow, r: LiveReading, all: readonly LiveReading[]) {
  return computeReading({
    ...context(sample),
    method: r.method,
    inputs: r.inputs,
    fourWire: r.fourWire,
    resolutions: resolutionsFor(r.method, r.instruments.map(asInstrument)),
    siblings: all.filter((o) => o !== r),
  });
}

function chunks<T>(values: readonly T[]): T[][] {
  const out: T[][] = [];
  for (let i = 0; i < values.length; i += CHUNK) out.push(values.slice(i, i + CHUNK));
  return out;
}
const marks = (values: readonly unknown[]) => values.map(() => '?').join(', ');

/** A reading's instrument snapshot, as the resolution rules read it. */
export function asInstrument(s: InstrumentSnapshot) {
  return { ...s, kind: s.kind as InstrumentKind };
}

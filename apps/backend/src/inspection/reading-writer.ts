import { Injectable, NotFoundException } from '@nestjs/common';
import type { SqlEntityManager } from '@mikro-orm/knex';
import type { MaterialId } from '@gaugeproof/standards';
import { AuditService, type AuditEntry } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { usableInstruments, type InstrumentRecord } from '../instruments/instruments.service';
import type { InstrumentKind } from '../instruments/entities/instrument.entity';
import { announceSqlWrite } from '../common/sql-writes';
import { jsonOf } from '../common/sql-values';
import type { LotStatus } from '../lots/entities/lot.entity';
import type { CreateReadingDto } from './dto/create-reading.dto';
import type { InstrumentSnapshot, ReadingMethod, Verdict } from './entities/reading.entity';
import { resolutionsFor, snapshot } from './instrument-resolutions';
import { assertLotOpen, evidenceOf, nextStatus, statusChange } from './lot-status';
import { computeReading, type ComputedReading, type ReadingInputs } from './reading-compute';
import { auditShape, outcomeOf } from './reading-rules';
import { readingFactsView } from './views';
import { GroupCommit } from '../common/group-commit';
import { plainSql } from '../common/plain-sql';

/** Row of the sample with what its reading needs of lot, product and conductor. */
interface SampleRow {
  lotId: number;
  status: LotStatus;
  poNumber: string;
  productId: number;
  samplingPlan: string | { sampleSize: number };
  minAreaRatio: number;
  gaugeLabel: string;
  claimedMaterial: string;
}

/** A live reading of the sample as stored (JSON as text on SQLite, parsed on PostgreSQL). */
interface ReadingRow {
  id: number;
  method: ReadingMethod;
  inputs: string | ReadingInputs;
  instruments: string | InstrumentSnapshot[];
  areaMm2: number;
  measuresAs: string;
  identifiedMaterial: string | null;
  materialMismatch: number | boolean;
  verdict: Verdict;
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

/**
 * Reading entry, the busiest write of the product, in one transaction of plain SQL: the
 * same rules as the unit-of-work path of `ReadingsService` (instrument check, computation,
 * recompute of the sample's other live readings, audit, lot status) in about ten small
 * statements, without hydrating and change-tracking the sample, lot, product, conductor,
 * instruments, user and siblings it reads (that was most of a reading's time). Portable
 * SQL: the PostgreSQL pass runs it too.
 */
@Injectable()
export class ReadingWriter {
  constructor(
    private readonly commits: GroupCommit,
    private readonly audit: AuditService,
  ) {}

  async create(
    sampleId: number,
    method: ReadingMethod,
    inputs: ReadingInputs,
    dto: CreateReadingDto,
    actor: RequestUser,
  ) {
    // Readings posted at the same moment share one commit (common/group-commit.ts).
    const view = await this.commits.run(async (em) => {
      const sql = em as SqlEntityManager;
      const [sample] = await plainSql<SampleRow[]>(
        sql,
        `select s.lot_id as "lotId", l.status, l.po_number as "poNumber", l.product_id as "productId",
                l.sampling_plan as "samplingPlan", p.min_area_ratio as "minAreaRatio",
                c.gauge_label as "gaugeLabel", c.claimed_material as "claimedMaterial"
           from samples s join lots l on l.id = s.lot_id join products p on p.id = l.product_id
           join conductor_specs c on c.id = s.conductor_id
          where s.id = ?`,
        [sampleId],
      );
      if (!sample) throw new NotFoundException(`Sample ${sampleId} not found`);
      assertLotOpen(sample);
      const instruments = await this.instruments(sql, dto.instrumentIds);
      const siblings = (
        await plainSql<ReadingRow[]>(
          sql,
          `select id, method, inputs, instruments, area_mm2 as "areaMm2", measures_as as "measuresAs",
                  identified_material as "identifiedMaterial", material_mismatch as "materialMismatch", verdict
             from readings where sample_id = ? and voided = ? order by taken_at desc, id desc`,
          [sampleId, false],
        )
      ).map((r) => ({
        ...r,
        inputs: jsonOf<ReadingInputs>(r.inputs),
        instruments: jsonOf<InstrumentSnapshot[]>(r.instruments),
        materialMismatch: Boolean(r.materialMismatch),
      }));
      const context = {
        gaugeLabel: sample.gaugeLabel,
        claimedMaterial: sample.claimedMaterial as MaterialId,
        minAreaRatio: sample.minAreaRatio,
      };
      const computed = computeReading({
        ...context,
        method,
        inputs,
        resolutions: resolutionsFor(method, instruments),
        siblings,
      });
      const takenAt = new Date();
      const snapshots = instruments.map(snapshot);
      const [{ id }] = await plainSql<{ id: number }[]>(
        sql,
        `insert into readings (sample_id, method, inputs, instruments, ${COMPUTED_COLUMNS.join(', ')},
           taken_by_id, taken_at, voided) values (?, ?, ?, ?, ${COMPUTED_COLUMNS.map(() => '?').join(', ')}, ?, ?, ?)
         returning id`,
        [
          sampleId,
          method,
          JSON.stringify(inputs),
          JSON.stringify(snapshots),
          ...computedValues(computed),
          actor.id,
          takenAt,
          false,
        ],
        'all',
      );
      const reading = {
        id,
        sampleId,
        method,
        inputs: inputs as Record<string, number>,
        instruments: snapshots,
        ...computed,
        voided: false,
        voidReason: null,
      };
      const events: AuditEntry[] = [
        {
          action: 'reading.create',
          entityType: 'reading',
          entityId: id,
          lotId: sample.lotId,
          after: auditShape(reading),
        },
      ];
      // The sample's other live readings, computed again with the new one among them.
      const live = [{ ...reading, areaMm2: computed.areaMm2 }, ...siblings];
      for (const r of siblings) {
        const again = computeReading({
          ...context,
          method: r.method,
          inputs: r.inputs,
          resolutions: resolutionsFor(r.method, r.instruments.map(asInstrument)),
          siblings: live.filter((o) => o.id !== r.id),
        });
        if (outcomeOf(again) === outcomeOf(r)) continue;
        await plainSql(
          sql,
          `update readings set ${COMPUTED_COLUMNS.map((c) => `${c} = ?`).join(', ')} where id = ?`,
          [...computedValues(again), r.id],
          'run',
        );
        const shaped = { ...r, sampleId, voided: false, voidReason: null };
        events.push({
          action: 'reading.recompute',
          entityType: 'reading',
          entityId: r.id,
          lotId: sample.lotId,
          before: auditShape(shaped),
          after: auditShape({ ...shaped, ...again }),
        });
      }
      await this.lotStatus(sql, sample, events);
      await this.audit.append(em, actor, events);
      const view = readingFactsView({
        ...reading,
        takenAt,
        takenBy: { id: actor.id, name: actor.name },
        voidedBy: null,
        voidedAt: null,
      });
      return view;
    });
    announceSqlWrite(['Reading', 'Lot', 'AuditEvent']);
    return view;
  }

  private async instruments(sql: SqlEntityManager, ids: readonly number[]) {
    const unique = [...new Set(ids)];
    const rows = unique.length
      ? await plainSql<(InstrumentRecord & { active: number | boolean })[]>(
          sql,
          `select id, kind, name, serial, resolution, resolution_unit as "resolutionUnit",
                  calibration_due_on as "calibrationDueOn", active
             from instruments where id in (${unique.map(() => '?').join(', ')})`,
          unique,
        )
      : [];
    return usableInstruments(
      ids,
      rows.map((r) => ({ ...r, active: Boolean(r.active) })),
      new Date(),
    );
  }

  /** The lot's next status, and a touch that bumps its version (see LotStatusService). */
  private async lotStatus(sql: SqlEntityManager, sample: SampleRow, events: AuditEntry[]) {
    const before = sample.status;
    const lot = {
      id: sample.lotId,
      productId: sample.productId,
      sampleSize: jsonOf<{ sampleSize: number }>(sample.samplingPlan).sampleSize,
    };
    const after = await nextStatus(
      before,
      () => evidenceOf(sql, lot),
      async () => {
        const [d] = await plainSql<{ n: number | string }[]>(
          sql,
          'select count(*) as n from decisions where lot_id = ?',
          [lot.id],
        );
        return Number(d.n) > 0;
      },
    );
    await plainSql(
      sql,
      'update lots set status = ?, updated_at = ?, version = version + 1 where id = ?',
      [after, new Date(), lot.id],
      'run',
    );
    if (after !== before) events.push(statusChange(lot.id, before, after));
  }
}

/** A reading's instrument snapshot, as the resolution rules read it. */
export function asInstrument(s: InstrumentSnapshot) {
  return { ...s, kind: s.kind as InstrumentKind };
}

import { DomainError } from '../common/domain-error';
import type { EntityManager } from '@mikro-orm/core';
import type { SqlEntityManager } from '@mikro-orm/knex';
import type { AuditEntry } from '../audit/audit.service';
import type { Lot, LotStatus } from '../lots/entities/lot.entity';
import { plainSql } from '../common/plain-sql';

/** Statuses in which samples and readings may still be added. */
const OPEN: readonly LotStatus[] = ['on_hold', 'inspecting', 'awaiting_decision'];

export function assertLotOpen(lot: Pick<Lot, 'status' | 'poNumber'>): void {
  if (!OPEN.includes(lot.status)) {
    throw DomainError.refused(
      `Lot ${lot.poNumber} is already ${lot.status.replace(/_/g, ' ')}: no more samples or readings can be added to a decided lot.`,
    );
  }
}

/** What the evidence counts need of a lot. */
export interface LotRef {
  id: number;
  productId: number;
  sampleSize: number;
  /** The plan's reject number Re: reaching it decides the lot at once (curtailed rejection). */
  reject: number;
}

export interface Evidence {
  hasReading: boolean;
  allPlannedUnitsRead: boolean;
  /** The nonconforming units already reach the reject number (issue 13: curtailed rejection). */
  rejectReached: boolean;
  /** Units of the plan with a live nonconforming reading. */
  nonconformingUnits: number;
}

/**
 * Whether the lot has any non-voided reading, and whether every planned unit (seq 1 …
 * sample size) has, for every active conductor of the product, a sample with one — counted
 * by the database, so a lot with hundreds of readings costs three small queries, not the
 * loading of all its samples and readings.
 */
export async function evidenceOf(em: EntityManager, lot: LotRef): Promise<Evidence> {
  const sql = em as SqlEntityManager;
  const live = 'exists (select 1 from readings r where r.sample_id = s.id and r.voided = ?)';
  const [read] = await plainSql<{ n: number | string }[]>(
    sql,
    `select count(*) as n from samples s where s.lot_id = ? and ${live}`,
    [lot.id, false],
  );
  const [units] = await plainSql<{ n: number | string }[]>(
    sql,
    `select count(*) as n from (select distinct s.seq, s.conductor_id from samples s
       join conductor_specs c on c.id = s.conductor_id
       where s.lot_id = ? and c.active = ? and s.seq >= 1 and s.seq <= ? and ${live}) t`,
    [lot.id, true, lot.sampleSize, false],
  );
  const [conductors] = await plainSql<{ n: number | string }[]>(
    sql,
    'select count(*) as n from conductor_specs c where c.product_id = ? and c.active = ?',
    [lot.productId, true],
  );
  // A unit is nonconforming when any live reading of any of its samples is (lot-evaluation.ts).
  const [bad] = await plainSql<{ n: number | string }[]>(
    sql,
    `select count(distinct s.seq) as n from samples s
       where s.lot_id = ? and s.seq >= 1 and s.seq <= ? and exists (select 1 from readings r
         where r.sample_id = s.id and r.voided = ? and r.verdict = ?)`,
    [lot.id, lot.sampleSize, false, 'nonconforming'],
  );
  const needed = Number(conductors.n) * Math.max(0, lot.sampleSize);
  return {
    hasReading: Number(read.n) > 0,
    allPlannedUnitsRead: Number(units.n) >= needed,
    rejectReached: Number(bad.n) >= lot.reject,
    nonconformingUnits: Number(bad.n),
  };
}

/**
 * The status a lot moves to after its evidence changed: on_hold → inspecting →
 * awaiting_decision, and back to inspecting when a void leaves a planned unit unread —
 * only before any decision (`hasDecision` is asked only then).
 */
export async function nextStatus(
  before: LotStatus,
  evidence: () => Promise<Evidence>,
  hasDecision: () => Promise<boolean>,
): Promise<LotStatus> {
  if (!OPEN.includes(before)) return before;
  const e = await evidence();
  let next: LotStatus = before;
  // Curtailed rejection (issue 13): Re reached decides the lot, more units cannot undo it;
  // acceptance still needs every planned unit.
  if (e.allPlannedUnitsRead || e.rejectReached) next = 'awaiting_decision';
  else if (e.hasReading || before !== 'on_hold') next = 'inspecting';
  if (before === 'awaiting_decision' && next !== before && (await hasDecision())) return before;
  return next;
}

/** The audit entry of a lot moving from one status to another. */
export function statusChange(lotId: number, before: LotStatus, after: LotStatus): AuditEntry {
  return {
    action: 'lot.status',
    entityType: 'lot',
    entityId: lotId,
    lotId,
    before: { status: before },
    after: { status: after },
  };
}

import { Injectable, UnprocessableEntityException } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { Decision } from '../decisions/entities/decision.entity';
import type { Lot, LotStatus } from '../lots/entities/lot.entity';

/** Statuses in which samples and readings may still be added. */
const OPEN: readonly LotStatus[] = ['on_hold', 'inspecting', 'awaiting_decision'];

export function assertLotOpen(lot: Lot): void {
  if (!OPEN.includes(lot.status)) {
    throw new UnprocessableEntityException(
      `Lot ${lot.poNumber} is already ${lot.status.replace(/_/g, ' ')}: no more samples or readings can be added to a decided lot.`,
    );
  }
}

/** Every planned unit has, for every active conductor, a sample with a non-voided reading. */
export function allPlannedUnitsRead(lot: Lot): boolean {
  const conductorIds = lot.product.conductors
    .getItems()
    .filter((c) => c.active)
    .map((c) => c.id);
  const read = new Set(
    lot.samples
      .getItems()
      .filter((s) => s.readings.getItems().some((r) => !r.voided))
      .map((s) => `${s.seq}:${s.conductor.id}`),
  );
  for (let seq = 1; seq <= lot.samplingPlan.sampleSize; seq++) {
    if (!conductorIds.every((id) => read.has(`${seq}:${id}`))) return false;
  }
  return true;
}

/**
 * Moves the lot along on_hold → inspecting → awaiting_decision after its evidence changed,
 * and back to inspecting when a void leaves a planned unit unread (only before any decision).
 * Always touches the lot so its optimistic version bumps: a decision taken on the old
 * evidence then meets a 409. Call after flushing the reading change.
 */
@Injectable()
export class LotStatusService {
  constructor(private readonly audit: AuditService) {}

  async refresh(em: EntityManager, lot: Lot, actor: RequestUser): Promise<void> {
    await em.populate(lot, ['product.conductors', 'samples.readings', 'samples.conductor'], {
      refresh: true,
    });
    const before = lot.status;
    let next = before;
    if (before === 'on_hold' || before === 'inspecting' || before === 'awaiting_decision') {
      const hasReading = lot.samples
        .getItems()
        .some((s) => s.readings.getItems().some((r) => !r.voided));
      if (allPlannedUnitsRead(lot)) next = 'awaiting_decision';
      else if (hasReading || before !== 'on_hold') next = 'inspecting';
      if (
        before === 'awaiting_decision' &&
        next !== before &&
        (await em.count(Decision, { lot }))
      ) {
        next = before;
      }
    }
    lot.updatedAt = new Date();
    if (next !== before) {
      lot.status = next;
      this.audit.record(em, actor, {
        action: 'lot.status',
        entityType: 'lot',
        entityId: lot.id,
        lotId: lot.id,
        before: { status: before },
        after: { status: next },
      });
    }
    await em.flush();
  }
}

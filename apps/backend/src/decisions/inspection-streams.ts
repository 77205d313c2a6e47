import { DomainError } from '../common/domain-error';
import { Injectable } from '@nestjs/common';
import type { EntityManager } from '@mikro-orm/core';
import {
  initialInspectionState,
  nextInspectionState,
  type InspectionState as SwitchingState,
} from '@gaugeproof/standards';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import type { Evaluation } from '../inspection/lot-evaluation';
import type { Lot } from '../lots/entities/lot.entity';
import { InspectionState } from '../products/entities/inspection-state.entity';
import { Product } from '../products/entities/product.entity';
import { Decision } from './entities/decision.entity';
import {
  applySwitching,
  lotResultFor,
  switchingNotice,
  type SwitchingNotice,
  type SwitchingRecord,
} from './switching';

function storedState(row: InspectionState): SwitchingState {
  const s = row.state as unknown as SwitchingState;
  return s && typeof s.severity === 'string' ? s : initialInspectionState();
}

/** The ISO 2859-1 switching state of each product's stream, moved on by decisions. */
@Injectable()
export class InspectionStreams {
  constructor(private readonly audit: AuditService) {}

  private async row(tx: EntityManager, product: Product): Promise<InspectionState> {
    const found = await tx.findOne(InspectionState, { product });
    if (found) return found;
    const state = initialInspectionState();
    const created = tx.create(InspectionState, {
      product,
      severity: state.severity,
      state: { ...state },
    });
    return created;
  }

  /**
   * Counts the decided lot in its stream once. A superseding decision recounts from the state
   * before the lot's counted decision when no other lot of the product has been counted since;
   * otherwise the stream is left as it is and the notice says so.
   */
  async recordDecision(
    tx: EntityManager,
    actor: RequestUser,
    lot: Lot,
    decision: Decision,
    opts: { evaluation: Evaluation; approveReduced: boolean },
  ): Promise<SwitchingNotice> {
    const row = await this.row(tx, lot.product);
    const current = storedState(row);
    const counted = await this.countedDecision(tx, lot, decision);
    let base = current;
    if (counted) {
      const later = await tx.count(Decision, {
        id: { $gt: counted.id },
        lot: { product: lot.product, id: { $ne: lot.id } },
      });
      if (later > 0) {
        decision.evaluation = {
          ...decision.evaluation,
          switching: { applied: false, before: current, after: current },
        };
        return {
          ...switchingNotice(current, current),
          message: `Inspection stays ${current.severity}: this lot was already counted in the switching rules and later lots have been counted since.`,
        };
      }
      base = (counted.evaluation.switching as SwitchingRecord).before;
    }
    const after = applySwitching(
      base,
      lotResultFor(lot, decision.outcome, opts.evaluation, opts.approveReduced),
    );
    const record: SwitchingRecord = { applied: true, before: base, after };
    decision.evaluation = { ...decision.evaluation, switching: record };
    this.save(tx, actor, row, current, after, lot.id);
    return switchingNotice(current, after);
  }

  private async countedDecision(tx: EntityManager, lot: Lot, current: Decision) {
    const earlier = await tx.find(
      Decision,
      { lot, id: { $ne: current.id } },
      { orderBy: { id: 'desc' } },
    );
    return earlier.find((d) => (d.evaluation.switching as SwitchingRecord | undefined)?.applied);
  }

  private save(
    tx: EntityManager,
    actor: RequestUser,
    row: InspectionState,
    before: SwitchingState,
    after: SwitchingState,
    lotId: number | null,
    note: string | null = null,
  ): void {
    row.state = { ...after };
    row.severity = after.severity;
    if (before.severity !== after.severity) row.reason = after.lastChange?.reason ?? null;
    tx.persist(row);
    if (before.severity === after.severity && before.reducedEligible === after.reducedEligible) {
      return;
    }
    this.audit.record(tx, actor, {
      action: 'inspection_state.change',
      entityType: 'inspection_state',
      entityId: row.id ?? null,
      lotId,
      before: {
        productId: row.product.id,
        severity: before.severity,
        reducedEligible: before.reducedEligible,
      },
      after: {
        productId: row.product.id,
        severity: after.severity,
        reducedEligible: after.reducedEligible,
        reason: after.lastChange?.reason ?? null,
        ...(note ? { note } : {}),
      },
    });
  }

  /** ISO 2859-1: a discontinued stream resumes on tightened after the supplier's corrective action. */
  async restore(tx: EntityManager, actor: RequestUser, productId: number, reason: string) {
    const product = await tx.findOneOrFail(Product, productId);
    const row = await this.row(tx, product);
    const before = storedState(row);
    if (before.severity !== 'discontinued') {
      throw DomainError.refused(
        `Inspection of this product is ${before.severity}, not discontinued: there is nothing to restore`,
      );
    }
    // No lot is counted here: `accepted` is required by the type and ignored when resuming.
    const after = nextInspectionState(before, {
      accepted: false,
      resumeAfterCorrectiveAction: true,
    });
    this.save(tx, actor, row, before, after, null, reason);
    row.reason = `${after.lastChange?.reason ?? ''} ${reason}`.trim();
    await tx.flush();
    return {
      productId: product.id,
      severity: after.severity,
      reason: row.reason,
      switching: switchingNotice(before, after),
    };
  }
}

import {
  BadRequestException,
  ConflictException,
  Injectable,
  NotFoundException,
  UnprocessableEntityException,
} from '@nestjs/common';
import { EntityManager, OptimisticLockError } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { retryOnUniqueConflict } from '../common/numbering';
import { LotEvaluationService, type Evaluation } from '../inspection/lot-evaluation';
import { Lot, type LotStatus } from '../lots/entities/lot.entity';
import { lotSummary } from '../lots/lot-summary';
import { User } from '../users/entities/user.entity';
import { decisionView } from './decision-view';
import { CreateDecisionDto } from './dto/create-decision.dto';
import { Decision, type DecisionOutcome } from './entities/decision.entity';
import { openNonconformance } from './nonconformances';
import { InspectionStreams } from './inspection-streams';

/** Lots a decision may be taken on: awaiting one, or decided (a later one supersedes). */
const DECIDABLE: readonly LotStatus[] = [
  'awaiting_decision',
  'accepted',
  'accepted_on_concession',
  'rejected',
];
const STATUS_OF: Record<DecisionOutcome, LotStatus> = {
  accept: 'accepted',
  accept_on_concession: 'accepted_on_concession',
  reject: 'rejected',
};
/** Shortest reason for a decision against the recommendation or on concession (issue 5). */
const MIN_REASON = 20;

@Injectable()
export class DecisionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly evaluations: LotEvaluationService,
    private readonly streams: InspectionStreams,
  ) {}

  async decide(lotId: number, dto: CreateDecisionDto, actor: RequestUser) {
    try {
      return await retryOnUniqueConflict(() =>
        this.em.transactional((tx) => this.decideIn(tx, lotId, dto, actor)),
      );
    } catch (e) {
      if (e instanceof OptimisticLockError) throw await this.stale(lotId);
      throw e;
    }
  }

  /** The 409 with the lot as it stands; inside a transaction pass its manager (one connection). */
  private async stale(lotId: number, em = this.em.fork()): Promise<ConflictException> {
    const lot = await em.findOneOrFail(Lot, lotId, {
      populate: ['product', 'supplier', 'receivedBy'],
      refresh: true,
    });
    return new ConflictException({
      message: 'Someone decided this lot first; review the current state and decide again',
      current: lotSummary(lot),
    });
  }

  private async decideIn(
    tx: EntityManager,
    lotId: number,
    dto: CreateDecisionDto,
    actor: RequestUser,
  ) {
    const lot = await tx.findOne(Lot, lotId, { populate: ['product', 'supplier', 'receivedBy'] });
    if (!lot) throw new NotFoundException(`There is no lot ${lotId}`);
    if (dto.version !== lot.version) throw await this.stale(lotId, tx);
    if (!DECIDABLE.includes(lot.status)) {
      throw new UnprocessableEntityException(
        lot.status === 'returned'
          ? 'This lot has gone back to the supplier; it cannot be decided again'
          : 'This lot is still on hold or being inspected; finish the planned samples first',
      );
    }
    const evaluation = await this.evaluations.evaluate(lot, tx);
    if (dto.outcome === 'accept' && evaluation.samplesTested < evaluation.samplesPlanned) {
      // Curtailed rejection decides a lot early; acceptance still needs every planned unit
      // (ISO 2859-1; issue 13).
      throw new UnprocessableEntityException(
        `Acceptance needs every planned unit: ${evaluation.samplesTested} of ${evaluation.samplesPlanned} tested. The lot awaits a decision because its nonconforming units reached the reject number; reject it, or finish the planned units first.`,
      );
    }
    const reason = dto.reason.trim();
    checkReason(dto.outcome, evaluation, reason);

    const before = { status: lot.status, version: lot.version };
    const decision = tx.create(Decision, {
      lot,
      outcome: dto.outcome,
      recommendation: evaluation.recommendation,
      reason,
      evaluation: { ...evaluation },
      lotVersion: lot.version,
      decidedBy: tx.getReference(User, actor.id),
    });
    lot.status = STATUS_OF[dto.outcome];
    await tx.flush();

    const ncrNumber =
      dto.outcome === 'reject'
        ? await openNonconformance(tx, this.audit, actor, lot, decision)
        : null;
    const switching = await this.streams.recordDecision(tx, actor, lot, decision, {
      evaluation,
      approveReduced: dto.approveReduced === true,
    });
    this.audit.record(tx, actor, {
      action: 'decision.create',
      entityType: 'decision',
      entityId: decision.id,
      lotId: lot.id,
      before,
      after: {
        status: lot.status,
        outcome: decision.outcome,
        recommendation: decision.recommendation,
        reason,
        ncrNumber,
        severity: switching.to,
      },
    });
    await tx.flush();
    await tx.populate(decision, ['decidedBy']);
    return {
      decision: decisionView(decision, ncrNumber),
      lot: lotSummary(lot),
      evaluation,
      ncrNumber,
      switching,
    };
  }

  restore(productId: number, reason: string, actor: RequestUser) {
    return this.em.transactional((tx) => this.streams.restore(tx, actor, productId, reason));
  }
}

function checkReason(outcome: DecisionOutcome, evaluation: Evaluation, reason: string): void {
  const concession = outcome === 'accept_on_concession';
  if (!concession && outcome === evaluation.recommendation) return;
  if (reason.length >= MIN_REASON) return;
  const why = concession
    ? 'a concession'
    : `a decision against the recommendation (${evaluation.recommendation})`;
  throw new BadRequestException([`reason must be at least ${MIN_REASON} characters for ${why}`]);
}

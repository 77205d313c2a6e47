import { TEXT_MIN } from '@gaugeproof/api-types';
import { Injectable } from '@nestjs/common';
import { EntityManager, OptimisticLockError } from '@mikro-orm/core';
import { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { isCalendarDate, isoDate } from '../common/calendar';
import { DomainError } from '../common/domain-error';
import { retryOnUniqueConflict } from '../common/numbering';
import { LotEvaluationService, type Evaluation } from '../inspection/lot-evaluation';
import { assertEvidenceNotSent } from '../inspection/evidence-freeze';
import { Lot, type LotStatus } from '../lots/entities/lot.entity';
import { lotSummary } from '../lots/lot-summary';
import { NoticesService } from '../notices/notices.service';
import { User } from '../users/entities/user.entity';
import { concessionView } from './concession-view';
import { decisionView } from './decision-view';
import { ReviewConcessionDto } from './dto/concession.dto';
import { CreateDecisionDto } from './dto/create-decision.dto';
import { Concession } from './entities/concession.entity';
import { Decision, type DecisionOutcome } from './entities/decision.entity';
import { openNonconformance } from './nonconformances';
import { InspectionStreams } from './inspection-streams';
import { clock } from '../common/clock';

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
/** Shortest reason for a decision against the recommendation or on concession (the contract's). */
const MIN_REASON = TEXT_MIN.decisionReason;
/** Shortest note that refuses a concession (the contract's, as for a reopened SCAR). */
const MIN_REFUSAL = TEXT_MIN.answer;

@Injectable()
export class DecisionsService {
  constructor(
    private readonly em: EntityManager,
    private readonly audit: AuditService,
    private readonly evaluations: LotEvaluationService,
    private readonly streams: InspectionStreams,
    private readonly notices: NoticesService,
  ) {}

  async decide(lotId: number, dto: CreateDecisionDto, actor: RequestUser) {
    try {
      const result = await retryOnUniqueConflict(() =>
        this.em.transactional((tx) => this.decideIn(tx, lotId, dto, actor)),
      );
      if (result.decision?.outcome === 'reject' || result.pendingApproval) this.notices.deliver();
      return result;
    } catch (e) {
      if (e instanceof OptimisticLockError) throw await this.stale(lotId);
      throw e;
    }
  }

  /** The 409 with the lot as it stands; inside a transaction pass its manager (one connection). */
  private async stale(lotId: number, em = this.em.fork()): Promise<DomainError> {
    const lot = await em.findOneOrFail(Lot, lotId, {
      populate: ['product', 'supplier', 'receivedBy'],
      refresh: true,
    });
    return new DomainError(
      'conflict',
      [
        {
          field: null,
          message: 'Someone decided this lot first; review the current state and decide again',
        },
      ],
      { current: lotSummary(lot) },
    );
  }

  private async decideIn(
    tx: EntityManager,
    lotId: number,
    dto: CreateDecisionDto,
    actor: RequestUser,
  ) {
    const lot = await tx.findOne(Lot, lotId, { populate: ['product', 'supplier', 'receivedBy'] });
    if (!lot) throw DomainError.notFound(`There is no lot ${lotId}`);
    if (dto.version !== lot.version) throw await this.stale(lotId, tx);
    // A later decision would supersede the one the supplier was sent (issue 17 item 10).
    await assertEvidenceNotSent(tx, lot, 'its decision cannot be superseded');
    if (!DECIDABLE.includes(lot.status)) {
      throw DomainError.refused(
        lot.status === 'returned'
          ? 'This lot has gone back to the supplier; it cannot be decided again'
          : 'This lot is still on hold or being inspected; finish the planned samples first',
      );
    }
    const evaluation = await this.evaluations.evaluate(lot, tx);
    if (dto.outcome === 'accept' && evaluation.samplesTested < evaluation.samplesPlanned) {
      // Curtailed rejection decides a lot early; acceptance still needs every planned unit
      // (ISO 2859-1; issue 13).
      throw DomainError.refused(
        `Acceptance needs every planned unit: ${evaluation.samplesTested} of ${evaluation.samplesPlanned} tested. The lot awaits a decision because its nonconforming units reached the reject number; reject it, or finish the planned units first.`,
      );
    }
    const reason = dto.reason.trim();
    checkReason(dto.outcome, evaluation, reason);
    const pending = await tx.findOne(
      Concession,
      { lot: lot.id, status: 'pending' },
      { populate: ['requestedBy'] },
    );
    if (pending) {
      throw DomainError.refused(
        `A concession on this lot waits for approval (asked by ${pending.requestedBy.name} on ${isoDate(pending.requestedAt)}): approve or refuse it first`,
      );
    }

    /** The decision as the QA lead takes it: they are its approver too. */
    const recordAsDecided = () =>
      this.record(
        tx,
        lot,
        dto.outcome,
        reason,
        evaluation,
        actor,
        actor.id,
        dto.approveReduced === true,
      );
    if (dto.outcome !== 'accept_on_concession') {
      return {
        ...(await recordAsDecided()),
        pendingApproval: false,
        concession: null,
      };
    }
    const terms = checkTerms(dto, lot);
    const needsSecondApproval =
      evaluation.recommendation === 'reject' && lot.product.concessionNeedsApproval;
    const concession = tx.create(Concession, {
      lot,
      scope: terms.scope,
      quantity: terms.quantity,
      expiresOn: terms.expiresOn,
      reason,
      recommendation: evaluation.recommendation,
      needsSecondApproval,
      lotVersion: lot.version,
      requestedBy: tx.getReference(User, actor.id),
    });
    await tx.flush();
    this.audit.record(tx, actor, {
      action: 'concession.request',
      entityType: 'concession',
      entityId: concession.id,
      lotId: lot.id,
      after: { ...terms, reason, recommendation: evaluation.recommendation, needsSecondApproval },
    });
    if (needsSecondApproval) {
      await tx.flush();
      await tx.populate(concession, ['requestedBy', 'lot']);
      await this.askForApproval(tx, concession, lot, evaluation, actor);
      return {
        pendingApproval: true,
        concession: concessionView(concession),
        decision: null,
        lot: lotSummary(lot),
        evaluation,
        ncrNumber: null,
        switching: null,
      };
    }
    // No second approval needed: the QA lead who decides is the approver.
    const result = await recordAsDecided();
    concession.status = 'approved';
    concession.reviewedBy = tx.getReference(User, actor.id);
    concession.reviewedAt = clock.now();
    concession.decision = tx.getReference(Decision, result.decision.id);
    await tx.flush();
    await tx.populate(concession, ['requestedBy', 'reviewedBy', 'lot']);
    return { ...result, pendingApproval: false, concession: concessionView(concession) };
  }

  /**
   * Tells whoever may approve a pending concession (QA leads and admins who want it, never
   * its requester), once each, in the unit of work that asked for it.
   */
  private async askForApproval(
    tx: EntityManager,
    concession: Concession,
    lot: Lot,
    evaluation: Evaluation,
    actor: RequestUser,
  ) {
    const url = this.notices.link('');
    await this.notices.raise(tx, {
      kind: 'concession_awaits_approval',
      key: `concession_awaits:${concession.id}`,
      subject: `Lot ${lot.id}: a concession awaits your approval (asked by ${actor.name})`,
      body: [
        `${actor.name} asks to accept lot ${lot.id} on concession against a reject recommendation: PO ${lot.poNumber}, ${lot.supplier.name}, ${lot.product.sku}, ${lot.quantity} ${lot.unit}; ${evaluation.nonconforming} nonconforming of ${evaluation.samplesTested} tested.`,
        `Terms asked for: may be used only for ${concession.scope}; ${concession.quantity} ${lot.unit}; until ${concession.expiresOn}.`,
        `Their reason: ${concession.reason}`,
        `The product's policy wants a second QA lead or an admin to approve it; nothing is decided until then. Approve or refuse it here: ${url}/lots/${lot.id}`,
      ].join('\n\n'),
      exceptUserIds: [actor.id],
    });
  }

  /** Concessions waiting for a second approval that `actor` may give (not their own), oldest first. */
  async awaitingApproval(actor: RequestUser) {
    const rows = await this.em.fork().find(
      Concession,
      { status: 'pending', needsSecondApproval: true, requestedBy: { $ne: actor.id } },
      {
        populate: ['requestedBy', 'reviewedBy', 'lot', 'lot.supplier', 'lot.product'],
        orderBy: { requestedAt: 'asc', id: 'asc' },
      },
    );
    return {
      items: rows.map((c) => ({
        ...concessionView(c),
        lot: {
          id: c.lot.id,
          poNumber: c.lot.poNumber,
          supplier: { id: c.lot.supplier.id, name: c.lot.supplier.name },
          product: { id: c.lot.product.id, sku: c.lot.product.sku },
        },
      })),
    };
  }

  /** Writes a decision: the lot's status, its NCR on a reject, the switching state, audit. */
  private async record(
    tx: EntityManager,
    lot: Lot,
    outcome: DecisionOutcome,
    reason: string,
    evaluation: Evaluation,
    actor: RequestUser,
    decidedById: number,
    approveReduced: boolean,
  ) {
    const before = { status: lot.status, version: lot.version };
    const decision = tx.create(Decision, {
      lot,
      outcome,
      recommendation: evaluation.recommendation,
      reason,
      evaluation: { ...evaluation },
      lotVersion: lot.version,
      decidedBy: tx.getReference(User, decidedById),
    });
    lot.status = STATUS_OF[outcome];
    await tx.flush();

    const ncrNumber =
      outcome === 'reject' ? await openNonconformance(tx, this.audit, actor, lot, decision) : null;
    const switching = await this.streams.recordDecision(tx, actor, lot, decision, {
      evaluation,
      approveReduced,
    });
    if (outcome === 'reject') {
      const url = this.notices.link('');
      await this.notices.raise(tx, {
        kind: 'lot_rejected',
        key: `lot_rejected:${decision.id}`,
        subject: `Lot ${lot.id} was rejected: ${lot.supplier.name}, PO ${lot.poNumber}`,
        body: [
          `${actor.name} rejected lot ${lot.id} on ${isoDate(decision.decidedAt)}: PO ${lot.poNumber}, ${lot.supplier.name}, ${lot.product.sku}, ${lot.quantity} ${lot.unit}. ${evaluation.nonconforming} nonconforming of ${evaluation.samplesTested} tested${ncrNumber ? `; ${ncrNumber}` : ''}.`,
          `It has no return yet. Raise one here: ${url}/returns?raiseLot=${lot.id}&raiseSupplier=${lot.supplier.id}`,
          `The lot: ${url}/lots/${lot.id}`,
        ].join('\n\n'),
      });
    }
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

  /** A lot's concessions, newest first. */
  async concessionsOf(lotId: number) {
    const rows = await this.em
      .fork()
      .find(
        Concession,
        { lot: lotId },
        { populate: ['requestedBy', 'reviewedBy', 'lot'], orderBy: { id: 'desc' } },
      );
    return rows.map((c) => concessionView(c));
  }

  private async pendingConcession(tx: EntityManager, id: number, dto: ReviewConcessionDto) {
    const c = await tx.findOne(Concession, id, {
      populate: ['lot', 'lot.product', 'lot.supplier', 'lot.receivedBy', 'requestedBy'],
    });
    if (!c) throw DomainError.notFound(`There is no concession ${id}`);
    if (c.status !== 'pending') {
      throw DomainError.refused(`This concession is ${c.status} already; nothing to review`);
    }
    if (dto.version !== c.version) {
      throw DomainError.conflict('Someone changed this concession first; reload it', 'version');
    }
    return c;
  }

  /**
   * A second QA lead or an admin approves a pending concession: the accept-on-concession
   * decision is written then, as the requester's, with the approver recorded. The approver
   * cannot be the requester.
   */
  async approve(id: number, dto: ReviewConcessionDto, actor: RequestUser) {
    try {
      return await retryOnUniqueConflict(() =>
        this.em.transactional(async (tx) => {
          const c = await this.pendingConcession(tx, id, dto);
          if (c.requestedBy.id === actor.id) {
            throw DomainError.refused(
              'You asked for this concession: a second QA lead or an admin must approve it',
            );
          }
          const lot = c.lot;
          if (lot.version !== c.lotVersion || !DECIDABLE.includes(lot.status)) {
            throw DomainError.conflict(
              'The lot changed since this concession was asked for (a reading or a decision): refuse it and ask again on the lot as it is now',
            );
          }
          const evaluation = await this.evaluations.evaluate(lot, tx);
          const result = await this.record(
            tx,
            lot,
            'accept_on_concession',
            c.reason,
            evaluation,
            actor,
            c.requestedBy.id,
            false,
          );
          c.status = 'approved';
          c.reviewedBy = tx.getReference(User, actor.id);
          c.reviewedAt = clock.now();
          c.reviewNote = dto.note?.trim() || null;
          c.decision = tx.getReference(Decision, result.decision.id);
          this.audit.record(tx, actor, {
            action: 'concession.approve',
            entityType: 'concession',
            entityId: c.id,
            lotId: lot.id,
            before: { status: 'pending' },
            after: { status: 'approved', decisionId: result.decision.id, note: c.reviewNote },
          });
          await tx.flush();
          await tx.populate(c, ['reviewedBy']);
          return { ...result, pendingApproval: false, concession: concessionView(c) };
        }),
      );
    } catch (e) {
      if (e instanceof OptimisticLockError) {
        throw DomainError.conflict('Someone reviewed this concession or the lot first; reload');
      }
      throw e;
    }
  }

  /** Turns a pending concession down with a note (its requester may withdraw it so too). */
  async refuse(id: number, dto: ReviewConcessionDto, actor: RequestUser) {
    const note = dto.note?.trim() ?? '';
    if (note.length < MIN_REFUSAL) {
      throw DomainError.invalid([
        { field: 'note', message: `note must say in at least ${MIN_REFUSAL} characters why` },
      ]);
    }
    try {
      return await this.em.transactional(async (tx) => {
        const c = await this.pendingConcession(tx, id, dto);
        c.status = 'refused';
        c.reviewedBy = tx.getReference(User, actor.id);
        c.reviewedAt = clock.now();
        c.reviewNote = note;
        this.audit.record(tx, actor, {
          action: 'concession.refuse',
          entityType: 'concession',
          entityId: c.id,
          lotId: c.lot.id,
          before: { status: 'pending' },
          after: { status: 'refused', note, withdrawn: c.requestedBy.id === actor.id },
        });
        await tx.flush();
        await tx.populate(c, ['reviewedBy']);
        return concessionView(c);
      });
    } catch (e) {
      if (e instanceof OptimisticLockError) {
        throw DomainError.conflict('Someone reviewed this concession first; reload');
      }
      throw e;
    }
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
  throw DomainError.invalid([
    { field: 'reason', message: `reason must be at least ${MIN_REASON} characters for ${why}` },
  ]);
}

/** The terms a concession needs: what for, how much (at most the lot), until when. */
function checkTerms(dto: CreateDecisionDto, lot: Lot) {
  const t = dto.concession;
  if (!t) {
    throw DomainError.invalid([
      {
        field: 'concession',
        message: 'concession must give the terms: scope, quantity and expiresOn',
      },
    ]);
  }
  const errors: { field: string; message: string }[] = [];
  if (t.quantity > lot.quantity) {
    errors.push({
      field: 'concession.quantity',
      message: `concession.quantity must be at most the lot's ${lot.quantity} ${lot.unit}`,
    });
  }
  if (!isCalendarDate(t.expiresOn)) {
    errors.push({
      field: 'concession.expiresOn',
      message: 'concession.expiresOn must be a real date',
    });
  } else if (t.expiresOn < isoDate(clock.now())) {
    errors.push({
      field: 'concession.expiresOn',
      message: 'concession.expiresOn must be today or later',
    });
  }
  if (errors.length) throw DomainError.invalid(errors);
  return { scope: t.scope.trim(), quantity: t.quantity, expiresOn: t.expiresOn };
}

import type { EntityManager } from '@mikro-orm/core';
import type { AuditService } from '../audit/audit.service';
import type { RequestUser } from '../auth/request-user';
import { formatNumber, nextSeqInYear } from '../common/numbering';
import type { Lot } from '../lots/entities/lot.entity';
import type { Decision } from './entities/decision.entity';
import { Nonconformance } from './entities/nonconformance.entity';
import { clock } from '../common/clock';

/**
 * A reject opens a nonconformance report numbered NCR-YYYY-NNNN, sequential per year. A lot
 * rejected again while its report is still open keeps that report.
 */
export async function openNonconformance(
  tx: EntityManager,
  audit: AuditService,
  actor: RequestUser,
  lot: Lot,
  decision: Decision,
): Promise<string> {
  const open = await tx.findOne(Nonconformance, { lot, status: 'open' });
  if (open) return open.number;
  const year = clock.now().getUTCFullYear();
  const seq = await nextSeqInYear(tx, Nonconformance, 'NCR', year);
  const ncr = tx.create(Nonconformance, {
    number: formatNumber('NCR', year, seq),
    year,
    seq,
    lot,
    decision,
  });
  await tx.flush();
  audit.record(tx, actor, {
    action: 'ncr.create',
    entityType: 'nonconformance',
    entityId: ncr.id,
    lotId: lot.id,
    after: { number: ncr.number, decisionId: decision.id },
  });
  return ncr.number;
}

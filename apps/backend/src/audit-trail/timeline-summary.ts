import type { AuditEvent } from '../audit/entities/audit-event.entity';

/** What a sentence about a reading needs of its sample. */
export interface SampleContext {
  seq: number;
  purpose: string;
}

type Data = Record<string, unknown> | null;
const str = (d: Data, k: string): string | null =>
  d && (typeof d[k] === 'string' || typeof d[k] === 'number') ? String(d[k]) : null;
const words = (v: string | null) => (v ?? '').replace(/_/g, ' ');

const OUTCOME: Record<string, string> = {
  accept: 'accepted the lot',
  accept_on_concession: 'accepted the lot on concession',
  reject: 'rejected the lot',
};

/**
 * One sentence for a timeline event, e.g. "Rosa Okafor recorded a mass reading on unit 3
 * (power): measures as 8 AWG, nonconforming". Unknown actions still read as a sentence.
 */
export function summarize(e: AuditEvent, actorName: string, sample?: SampleContext): string {
  const a = e.after;
  const b = e.before;
  const onUnit = sample ? ` on unit ${sample.seq} (${sample.purpose})` : '';
  switch (e.action) {
    case 'lot.create':
      return `${actorName} received the lot`;
    case 'lot.status':
      return `${actorName} moved the lot from ${words(str(b, 'status'))} to ${words(str(a, 'status'))}`;
    case 'sample.create':
      return `${actorName} cut a sample${onUnit}`;
    case 'reading.create':
      return `${actorName} recorded a ${str(a, 'method') ?? ''} reading${onUnit}: measures as ${str(a, 'measuresAs') ?? '?'}, ${str(a, 'verdict') ?? '?'}`;
    case 'reading.void':
      return `${actorName} voided a ${str(a, 'method') ?? ''} reading${onUnit}: ${str(a, 'voidReason') ?? ''}`;
    case 'photo.create':
      return `${actorName} uploaded a photo${onUnit}`;
    case 'decision.create': {
      const reason = str(a, 'reason');
      return `${actorName} ${OUTCOME[str(a, 'outcome') ?? ''] ?? 'decided the lot'} (recommendation: ${str(a, 'recommendation') ?? '?'})${reason ? `: ${reason}` : ''}`;
    }
    case 'ncr.create':
      return `${actorName} opened nonconformance report ${str(a, 'number') ?? ''}`;
    case 'inspection_state.change':
      return `Inspection of the product moved from ${str(b, 'severity')} to ${str(a, 'severity')}${str(a, 'reason') ? `: ${str(a, 'reason')}` : ''}`;
    case 'return.create':
      return `${actorName} raised return ${str(a, 'number') ?? ''} to the supplier`;
    case 'return.update':
      return `${actorName} updated return ${str(a, 'number') ?? ''}${str(b, 'status') !== str(a, 'status') ? ` from ${str(b, 'status')} to ${str(a, 'status')}` : ''}`;
    case 'lot.returned':
      return `${actorName} sent the lot back to the supplier on return ${str(a, 'returnNumber') ?? ''}`;
    case 'return.export':
      return `${actorName} exported the ${str(a, 'format') ?? ''} of return ${str(a, 'number') ?? ''}`;
    case 'return.email':
      return `${actorName} e-mailed return ${str(a, 'number') ?? ''} to ${str(a, 'to') ?? '?'} (${str(a, 'status') ?? '?'})`;
    case 'corrective_action.create':
      return `${actorName} requested corrective action ${str(a, 'number') ?? ''} from the supplier`;
    case 'corrective_action.update':
      return `${actorName} updated corrective action ${str(a, 'number') ?? ''}${str(b, 'status') !== str(a, 'status') ? ` from ${str(b, 'status')} to ${str(a, 'status')}` : ''}`;
    default:
      return `${actorName}: ${e.action.replace(/[._]/g, ' ')} (${e.entityType.replace(/_/g, ' ')}${e.entityId ? ` ${e.entityId}` : ''})`;
  }
}

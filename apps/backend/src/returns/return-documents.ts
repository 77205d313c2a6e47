import { Injectable, Logger } from '@nestjs/common';
import {
  formatPercent,
  formatWithUncertainty,
  INSTALLER_CAUTIONS,
  SAMPLING_PLAN_NAME,
  type BudgetComponent,
  type InstallerConsequence,
} from '@gaugeproof/standards';
import { Readable } from 'node:stream';
import { inputsInWords, materialWords, methodWords } from '../common/reading-words';
import { drawnMetal, type CrossSection } from '../documents/cross-section';
import {
  evidencePackPdf,
  type EvidenceBudgetLine,
  type EvidenceLot,
  type EvidenceReading,
  type Paper,
} from '../documents/evidence-pack';
import { paperDate } from '../documents/pdf';
import { coverageFactorOf } from '../exports/readings-csv';
import type { InstrumentSnapshot, Reading } from '../inspection/entities/reading.entity';
import { disagreementOf } from '../inspection/views';
import { StorageService } from '../storage/storage.service';
import type { VendorReturn } from './entities/vendor-return.entity';
import { ReadingsExportService } from '../exports/readings-export.service';
import { money } from './return-money';
import { ReturnEvidence, type LotEvidence } from './return-evidence';
import { clock } from '../common/clock';

const OUTCOME: Record<string, string> = {
  accept: 'Accepted',
  accept_on_concession: 'Accepted on concession',
  reject: 'Rejected',
};

async function toBuffer(stream: Readable): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const c of stream) parts.push(Buffer.isBuffer(c) ? c : Buffer.from(c as string));
  return Buffer.concat(parts);
}

/** The return's status as the supplier reads it: never "draft" once the notice has left. */
export function statusWords(ret: VendorReturn): string {
  switch (ret.status) {
    case 'draft':
      return 'Draft: not yet sent to the supplier';
    case 'emailed':
      return `Notice e-mailed ${paperDate(ret.emailedAt)}`;
    case 'shipped':
      return `Goods shipped ${ret.shippedOn ?? ''}${ret.carrier ? ` by ${ret.carrier}` : ''}${ret.trackingNumber ? `, tracking ${ret.trackingNumber}` : ''}`;
    case 'acknowledged':
      return `Acknowledged by the supplier ${paperDate(ret.acknowledgedAt)}`;
    case 'credited':
      return `Credited${ret.creditNoteNumber ? `, credit note ${ret.creditNoteNumber}` : ''}`;
    case 'closed':
      return `Closed ${paperDate(ret.closedAt)}`;
    case 'cancelled':
      return `Cancelled ${paperDate(ret.cancelledAt)}`;
    default:
      return ret.status;
  }
}

const unitOf = (r: Reading) => r.sample.unitRef ?? `Unit ${r.sample.seq}`;
/** Two significant figures, the trade's minus sign. */
const sig2 = (v: number) => (v === 0 ? '0' : Number(v.toPrecision(2)).toString().replace('-', '−'));
const full = (v: number) => Number(v.toPrecision(6)).toString().replace('-', '−');

function budgetLine(b: BudgetComponent): EvidenceBudgetLine {
  // A dimensionless input (a factor) has unit '1': printed without one.
  const unit = b.unit && b.unit !== '1' ? ` ${b.unit}` : '';
  return {
    name: b.name,
    value: `${full(b.value)}${unit}`,
    u: `${sig2(b.standardUncertainty)}${unit}`,
    sensitivity: full(b.sensitivity),
    share: `${sig2(b.relativeContribution * 100)} %`,
    note:
      b.degreesOfFreedom !== undefined ? `${b.note}; ν = ${b.degreesOfFreedom} (Type A)` : b.note,
  };
}

function instrumentsText(list: readonly InstrumentSnapshot[]): string {
  return list
    .map((i) => `${i.name} (${i.serial}), calibration due ${i.calibrationDueOn}`)
    .join('; ');
}

/** A reading as the evidence pack prints it: one size name, inputs in words, full budget. */
export function evidenceReading(r: Reading): EvidenceReading {
  const result = r.result as {
    budget?: BudgetComponent[];
    reasons?: string[];
    coverageFactor?: number;
    effectiveDegreesOfFreedom?: number | null;
    note?: string;
  };
  const k = result.coverageFactor ?? coverageFactorOf(r.uMm2, r.expandedUMm2) ?? 2;
  const dof = result.effectiveDegreesOfFreedom;
  const rel = r.areaMm2 > 0 ? r.uMm2 / r.areaMm2 : 0;
  return {
    id: r.id,
    unit: unitOf(r),
    conductor: r.sample.conductor.purpose,
    label: r.sample.conductor.gaugeLabel,
    method: methodWords(r.method, r.fourWire),
    inputs: inputsInWords(r.inputs),
    instruments: instrumentsText(r.instruments ?? []),
    result: formatWithUncertainty(r.areaMm2, r.expandedUMm2, 'mm²'),
    coverage: `k = ${k}`,
    ofNominal: formatPercent(r.areaRatio),
    measuresAs: r.measuresAs,
    material: materialWords(r.identifiedMaterial),
    verdict: r.verdict,
    voided: r.voided,
    voidReason: r.voidReason,
    confirmedUnusual: r.confirmedUnusual,
    takenAt: paperDate(r.takenAt),
    reasons: result.reasons ?? [],
    budget: (result.budget ?? []).map(budgetLine),
    budgetSummary: [
      `Combined relative standard uncertainty ${sig2(rel * 100)} %`,
      `U = k·u = ${sig2(r.expandedUMm2)} mm² with k = ${k}${dof ? ` (ν_eff = ${Math.floor(dof)}, Welch–Satterthwaite, GUM G.4.1)` : ''}.`,
      result.note ?? '',
    ]
      .filter(Boolean)
      .join('; '),
  };
}

/** The smallest live reading per conductor (the worst unit), drawn against the label. */
function sections(e: LotEvidence): CrossSection[] {
  return e.lot.product.conductors
    .getItems()
    .filter((c) => c.active)
    .map((c) => {
      const live = e.readings.filter((r) => !r.voided && r.sample.conductor.id === c.id);
      const worst = live.length ? live.reduce((a, b) => (b.areaMm2 < a.areaMm2 ? b : a)) : null;
      return {
        title: `${c.purpose} conductor ${c.gaugeLabel}: smallest of ${live.length} reading(s)${worst ? `, ${unitOf(worst)}` : ''}`,
        labelText: c.gaugeLabel,
        claimedMetal: drawnMetal(c.claimedMaterial),
        nominalAreaMm2: c.nominalAreaMm2,
        measuredAreaMm2: worst?.areaMm2 ?? null,
        measuredText: worst
          ? formatWithUncertainty(worst.areaMm2, worst.expandedUMm2, 'mm²')
          : null,
        measuresAs: worst?.measuresAs ?? null,
        foundMetal: drawnMetal(worst?.identifiedMaterial),
        ratioText: worst
          ? `${formatPercent(worst.areaRatio)} of the ${c.gaugeLabel} nominal area`
          : null,
        failing: worst?.verdict === 'nonconforming',
      };
    });
}

/** Samples whose readings disagree by more than their combined U, in words. */
function disagreements(e: LotEvidence): string[] {
  const bySample = new Map<number, Reading[]>();
  for (const r of e.readings) {
    const list = bySample.get(r.sample.id) ?? [];
    list.push(r);
    bySample.set(r.sample.id, list);
  }
  const out: string[] = [];
  for (const list of bySample.values()) {
    const d = disagreementOf(list);
    if (d) out.push(`${unitOf(list[0])}, ${list[0].sample.conductor.purpose}: ${d.message}`);
  }
  return out;
}

/**
 * The installer's consequence of each conductor (purpose and label), from its worst live
 * nonconforming reading: one that meets no standard size, else the one with the smallest
 * area (the safe side for fusing and voltage drop). One line per conductor: two methods, or
 * two units, never tell the installer two different sizes for one conductor.
 */
export function consequences(e: Pick<LotEvidence, 'readings'>): string[] {
  const worst = new Map<string, { rank: number; text: string }>();
  for (const r of e.readings) {
    if (r.voided || r.verdict !== 'nonconforming') continue;
    const c = (r.result as { consequence?: InstallerConsequence | null }).consequence;
    if (!c?.text) continue;
    const conductor = `${r.sample.conductor.purpose} ${r.sample.conductor.gaugeLabel}`;
    const rank = c.treatAs === null ? -Infinity : r.areaRatio;
    const known = worst.get(conductor);
    if (!known || rank < known.rank) worst.set(conductor, { rank, text: c.text });
  }
  return [...worst].map(([conductor, w]) => `${conductor}: ${w.text}`);
}

/** The return's CSV and evidence pack, from the same evidence. */
@Injectable()
export class ReturnDocuments {
  private readonly logger = new Logger(ReturnDocuments.name);

  constructor(
    private readonly evidence: ReturnEvidence,
    private readonly storage: StorageService,
    private readonly readings: ReadingsExportService,
  ) {}

  /**
   * One row per reading of every lot on the return, voided ones included: the readings
   * export's own columns and paging, so a recall of hundreds of lots streams like a
   * supplier's history.
   */
  csvStream(ret: { id: number }): Readable {
    return Readable.from(this.readings.chunks({ returnId: ret.id }), { objectMode: false });
  }

  /** The same CSV whole, for the e-mail attachment. */
  async csvBuffer(ret: VendorReturn): Promise<Buffer> {
    return toBuffer(this.csvStream(ret));
  }

  private async thumbnails(e: LotEvidence) {
    const out: { image: Buffer; caption: string }[] = [];
    for (const p of e.photos) {
      try {
        out.push({
          image: await toBuffer(await this.storage.get(p.thumbnailKey)),
          caption: p.caption ?? `Photo ${p.id}`,
        });
      } catch (err) {
        // A missing thumbnail must not stop the pack; the log says which one.
        this.logger.warn({ err, photoId: p.id }, 'thumbnail left out of an evidence pack');
      }
    }
    return out;
  }

  async pdf(ret: VendorReturn, paper: Paper = 'A4'): Promise<Buffer> {
    const lots: EvidenceLot[] = [];
    for (const e of await this.evidence.lots(ret)) {
      const p = e.lot.samplingPlan;
      const last = e.decisions.at(-1);
      // The QA lead's reason is internal unless purchasing ticked "share decision reason".
      const reason =
        last && ret.shareDecisionReason && last.reason ? ` Reason: ${last.reason}` : '';
      lots.push({
        title: `Lot ${e.lot.id} · ${e.lot.product.sku}`,
        facts: [
          ['PO', e.lot.poNumber],
          ['Your lot code', e.lot.supplierLotCode ?? '—'],
          ['Packing slip', e.lot.packingSlip ?? '—'],
          ['Received', paperDate(e.lot.receivedAt)],
          ['Quantity', `${e.lot.quantity} ${e.lot.unit}`],
          ['NCR', last?.ncrNumber ?? '—'],
          ['Product', e.lot.product.description],
          ['Supplier', e.lot.supplier.name],
        ],
        plan: `${p.severity} inspection, level ${p.level}, AQL ${p.aql}, code letter ${p.codeLetter}: ${p.sampleSize} units, accept at ${p.accept} nonconforming, reject at ${p.reject} (${SAMPLING_PLAN_NAME}).`,
        counts: e.evaluation.message,
        decision: last
          ? `${OUTCOME[last.outcome]} by ${last.decidedBy.name} on ${paperDate(last.decidedAt)}${last.ncrNumber ? `, ${last.ncrNumber}` : ''}.${reason}`
          : 'not decided',
        sections: sections(e),
        disagreements: disagreements(e),
        consequences: consequences(e),
        readings: e.readings.map(evidenceReading),
        thumbnails: await this.thumbnails(e),
      });
    }
    const c = ret.costs;
    const m = (amount: number) => money(amount, ret.currency);
    const hours = c.inspectionHours ?? 0;
    const rate = c.hourlyRate ?? 0;
    return evidencePackPdf({
      number: ret.number,
      documentNumber: `${ret.number}-EP${ret.version}`,
      issuedAt: clock.now(),
      paper,
      supplier: `${ret.supplier.name} (${ret.supplier.code})`,
      status: statusWords(ret),
      rmaNumber: ret.rmaNumber,
      raisedAt: ret.createdAt,
      supplierNote: ret.supplierNote,
      chargeback: [
        ['Inspection', `${hours} h × ${m(rate)} = ${m(hours * rate)}`],
        ['Freight', m(c.freight ?? 0)],
        ['Other', m(c.other ?? 0)],
        ['Currency', `${ret.currency} (ISO 4217)`],
      ],
      total: m(ret.chargebackTotal),
      lots,
      cautions: INSTALLER_CAUTIONS,
    });
  }
}

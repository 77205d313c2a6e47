import { Injectable, Logger } from '@nestjs/common';
import { INSTALLER_CAUTIONS, largestSizeReached } from '@gaugeproof/standards';
import { Readable } from 'node:stream';
import type { CrossSection } from '../documents/cross-section';
import { evidencePackPdf, type EvidenceLot } from '../documents/evidence-pack';
import { StorageService } from '../storage/storage.service';
import type { VendorReturn } from './entities/vendor-return.entity';
import { ReadingsExportService } from '../exports/readings-export.service';
import { ReturnEvidence, type LotEvidence } from './return-evidence';

const OUTCOME: Record<string, string> = {
  accept: 'accepted',
  accept_on_concession: 'accepted on concession',
  reject: 'rejected',
};

async function toBuffer(stream: Readable): Promise<Buffer> {
  const parts: Buffer[] = [];
  for await (const c of stream) parts.push(Buffer.isBuffer(c) ? c : Buffer.from(c as string));
  return Buffer.concat(parts);
}

/** The smallest live reading per conductor (the worst unit), drawn against the label. */
function sections(e: LotEvidence): CrossSection[] {
  return e.lot.product.conductors
    .getItems()
    .filter((c) => c.active)
    .map((c) => {
      const live = e.readings.filter((r) => !r.voided && r.sample.conductor.id === c.id);
      const smallest = live.length ? Math.min(...live.map((r) => r.areaMm2)) : null;
      const reached = smallest ? largestSizeReached(smallest, c.gaugeSystem) : null;
      return {
        title: `${c.purpose} conductor, smallest of ${live.length} reading(s)`,
        labelText: c.gaugeLabel,
        nominalAreaMm2: c.nominalAreaMm2,
        measuredAreaMm2: smallest,
        measuresAs: smallest ? (reached?.gauge.label ?? 'below the smallest size') : null,
        minAreaRatio: e.lot.product.minAreaRatio,
      };
    });
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

  async pdf(ret: VendorReturn): Promise<Buffer> {
    const lots: EvidenceLot[] = [];
    for (const e of await this.evidence.lots(ret)) {
      const p = e.lot.samplingPlan;
      const last = e.decisions.at(-1);
      lots.push({
        title: `Lot ${e.lot.id} · PO ${e.lot.poNumber} · ${e.lot.product.sku} · ${e.lot.quantity} ${e.lot.unit}`,
        plan: `${p.severity} inspection, level ${p.level}, AQL ${p.aql}, code ${p.codeLetter}: ${p.sampleSize} units, accept ${p.accept}, reject ${p.reject} (ISO 2859-1)`,
        counts: e.evaluation.message,
        decision: last
          ? `${OUTCOME[last.outcome]} by ${last.decidedBy.name}, ${last.decidedAt.toISOString().slice(0, 10)}${last.ncrNumber ? `, ${last.ncrNumber}` : ''}. Reason: ${last.reason || '(followed the recommendation)'}`
          : 'not decided',
        sections: sections(e),
        readings: e.readings.map((r) => ({
          unit: r.sample.seq,
          conductor: r.sample.conductor.purpose,
          method: r.method,
          inputs: Object.entries(r.inputs)
            .map(([k, v]) => `${k} ${v}`)
            .join(', '),
          areaMm2: r.areaMm2,
          expandedUMm2: r.expandedUMm2,
          areaRatio: r.areaRatio,
          measuresAs: r.measuresAs,
          material: r.identifiedMaterial,
          verdict: r.verdict,
          voided: r.voided,
        })),
        thumbnails: await this.thumbnails(e),
      });
    }
    const c = ret.costs;
    return evidencePackPdf({
      number: ret.number,
      supplier: `${ret.supplier.name} (${ret.supplier.code})`,
      status: ret.status,
      rmaNumber: ret.rmaNumber,
      createdAt: ret.createdAt,
      chargeback: [
        `Inspection: ${c.inspectionHours ?? 0} h × ${(c.hourlyRate ?? 0).toFixed(2)} = ${((c.inspectionHours ?? 0) * (c.hourlyRate ?? 0)).toFixed(2)}`,
        `Freight: ${(c.freight ?? 0).toFixed(2)}    Other: ${(c.other ?? 0).toFixed(2)}`,
        `Total chargeback: ${ret.chargebackTotal.toFixed(2)}`,
      ],
      lots,
      cautions: INSTALLER_CAUTIONS,
    });
  }
}

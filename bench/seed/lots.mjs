// Lots over the years with their samples, readings, decisions and NCRs, in every status.
import { samplingPlan } from '@gaugeproof/standards';
import { sampleReadings } from './readings.mjs';

const DAY = 86_400_000;
const HOUR = 3_600_000;

/** How far inspection got: recent lots are still open, older ones decided. */
function stage(r, ageDays, recent) {
  const x = r.next();
  if (ageDays < 2 || recent)
    return x < 0.4 ? 'on_hold' : x < 0.8 ? 'inspecting' : 'awaiting_decision';
  if (ageDays < 7) {
    return x < 0.05
      ? 'on_hold'
      : x < 0.25
        ? 'inspecting'
        : x < 0.5
          ? 'awaiting_decision'
          : 'decided';
  }
  return x < 0.005 ? 'awaiting_decision' : 'decided';
}

function storedPlan(plan) {
  const { severity, level, aql, codeLetter, sampleSize, accept, reject, inspectAll } = plan;
  return { severity, level, aql, codeLetter, sampleSize, accept, reject, inspectAll };
}

function audit(w, actor, action, entityType, entityId, lotId, at, before, after) {
  w.insert('audit_events', {
    id: w.nextId('audit_events'),
    actor_id: actor.id,
    actor_email: actor.email,
    action,
    entity_type: entityType,
    entity_id: entityId,
    lot_id: lotId,
    before,
    after,
    at,
  });
}

/** Weighted supplier list: a few suppliers deliver far more often than the rest. */
export function deliveryWeights(r, suppliers) {
  const list = [];
  suppliers.forEach((s, i) => {
    // The first supplier is the main source: about a twentieth of all deliveries.
    for (let n = i === 0 ? 40 : r.int(1, 6); n > 0; n--) list.push(s);
  });
  return list;
}

export class LotWriter {
  constructor(w, r, ctx) {
    this.w = w;
    this.r = r;
    this.ctx = ctx; // { now, users, instruments, rejected: [] }
    this.ncrSeq = new Map();
    this.poSeq = new Map();
  }

  /** `recent`: among the newest deliveries, still open whatever the spacing of a small set. */
  write(supplier, product, receivedAt, recent = false) {
    const { w, r, ctx } = this;
    const id = w.nextId('lots');
    const year = new Date(receivedAt).getUTCFullYear();
    const po = (this.poSeq.get(year) ?? 0) + 1;
    this.poSeq.set(year, po);
    const quantity = product.kit
      ? r.chance(0.95)
        ? r.int(10, 50)
        : r.int(60, 100)
      : r.int(5, 150);
    const severity = supplier.tier === 'bad' ? 'tightened' : 'normal';
    const plan = samplingPlan({ lotSize: quantity, level: 'S-3', aql: product.aql, severity });
    const ageDays = (ctx.now - receivedAt) / DAY;
    const how = stage(r, ageDays, recent);
    const clerk = ctx.users.clerk[id % ctx.users.clerk.length];
    const qa = ctx.users.qa_lead[id % ctx.users.qa_lead.length];
    const lotShift = supplier.tier !== 'good' && r.chance(0.15) ? 0.9 : 1;
    const poNumber = `PO-${year}-${String(po).padStart(5, '0')}`;
    audit(w, clerk, 'lot.create', 'lot', id, id, receivedAt, null, { poNumber, quantity });

    const units =
      how === 'on_hold'
        ? 0
        : how === 'inspecting'
          ? Math.ceil(plan.sampleSize / 2)
          : plan.sampleSize;
    let t = receivedAt + 2 * HOUR;
    let readingCount = 0;
    let ncUnits = 0;
    let inconclusiveUnits = 0;
    for (let seq = 1; seq <= units; seq++) {
      let unitNc = false;
      let unitInc = false;
      for (const spec of product.conductors) {
        const sampleId = w.nextId('samples');
        w.insert('samples', {
          id: sampleId,
          lot_id: id,
          conductor_id: spec.id,
          seq,
          unit_ref: `${product.kit ? 'Kit' : 'Spool'} ${seq}`,
          created_by_id: clerk.id,
          created_at: t,
        });
        const area = spec.nominalAreaMm2 * spec.truth.ratio * lotShift * r.normal(1, 0.006);
        const voidOne = r.chance(0.02);
        for (const [i, reading] of sampleReadings(r, spec, area, ctx.instruments, 0.98).entries()) {
          if (voidOne && i === 0) this.voided(reading, sampleId, id, clerk, qa, (t += 60_000));
          this.reading(reading, sampleId, id, clerk, (t += 180_000));
          readingCount++;
          if (reading.computed.verdict === 'nonconforming') unitNc = true;
          if (reading.computed.verdict === 'inconclusive') unitInc = true;
        }
      }
      if (unitNc) ncUnits++;
      else if (unitInc) inconclusiveUnits++;
    }
    let status = how === 'decided' ? 'awaiting_decision' : how;
    if (units > 0) {
      audit(
        w,
        clerk,
        'lot.status',
        'lot',
        id,
        id,
        receivedAt + 2 * HOUR,
        { status: 'on_hold' },
        { status: 'inspecting' },
      );
      if (units === plan.sampleSize) {
        audit(
          w,
          clerk,
          'lot.status',
          'lot',
          id,
          id,
          t,
          { status: 'inspecting' },
          { status: 'awaiting_decision' },
        );
      }
    }
    let version = 1 + readingCount;
    if (how === 'decided') {
      const decidedAt = Math.min(t + r.int(2, 60) * HOUR, ctx.now - HOUR);
      status = this.decide({
        id,
        version,
        plan,
        ncUnits,
        inconclusiveUnits,
        decidedAt,
        qa,
        supplier,
        ageDays,
      });
      version++;
    }
    w.insert('lots', {
      id,
      product_id: product.id,
      supplier_id: supplier.id,
      po_number: poNumber,
      packing_slip: `PS-${String(100000 + id * 7).slice(-6)}`,
      supplier_lot_code: `${supplier.code}-${String(year).slice(2)}${String(1 + (po % 52)).padStart(2, '0')}-${(id % 97) + 1}`,
      quantity,
      unit: product.unit,
      received_at: receivedAt,
      received_by_id: clerk.id,
      status,
      sampling_plan: storedPlan(plan),
      notes: r.chance(0.05) ? 'Outer carton crushed on one corner; reels inside intact.' : null,
      version,
      created_at: receivedAt,
      updated_at: t,
    });
  }

  reading(reading, sampleId, lotId, clerk, at) {
    const { w } = this;
    const c = reading.computed;
    const id = w.nextId('readings');
    w.insert('readings', {
      id,
      sample_id: sampleId,
      method: reading.method,
      inputs: reading.inputs,
      instruments: reading.instruments,
      area_mm2: c.areaMm2,
      u_mm2: c.uMm2,
      expanded_umm2: c.expandedUMm2,
      area_ratio: c.areaRatio,
      measures_as: c.measuresAs,
      identified_material: c.identifiedMaterial,
      material_mismatch: c.materialMismatch,
      verdict: c.verdict,
      result: c.result,
      taken_by_id: clerk.id,
      taken_at: at,
      voided: false,
    });
    audit(w, clerk, 'reading.create', 'reading', id, lotId, at, null, {
      sampleId,
      method: reading.method,
      inputs: reading.inputs,
      areaMm2: c.areaMm2,
      measuresAs: c.measuresAs,
      verdict: c.verdict,
    });
  }

  /** A mistyped reading (mass keyed 10 % low), voided by the QA lead before the real one. */
  voided(reading, sampleId, lotId, clerk, qa, at) {
    const { w } = this;
    const c = reading.computed;
    const id = w.nextId('readings');
    const inputs = { ...reading.inputs, massG: Math.round(reading.inputs.massG * 90) / 100 };
    const reason = 'Mass keyed from the wrong specimen on the balance; re-weighed.';
    w.insert('readings', {
      id,
      sample_id: sampleId,
      method: reading.method,
      inputs,
      instruments: reading.instruments,
      area_mm2: c.areaMm2 * 0.9,
      u_mm2: c.uMm2,
      expanded_umm2: c.expandedUMm2,
      area_ratio: c.areaRatio * 0.9,
      measures_as: c.measuresAs,
      identified_material: c.identifiedMaterial,
      material_mismatch: c.materialMismatch,
      verdict: 'nonconforming',
      result: { ...c.result, reasons: ['Area below the minimum'] },
      taken_by_id: clerk.id,
      taken_at: at,
      voided: true,
      void_reason: reason,
      voided_by_id: qa.id,
      voided_at: at + 30_000,
    });
    audit(
      w,
      qa,
      'reading.void',
      'reading',
      id,
      lotId,
      at + 30_000,
      { voided: false },
      { voided: true, voidReason: reason },
    );
  }

  decide({ id, version, plan, ncUnits, inconclusiveUnits, decidedAt, qa, supplier, ageDays }) {
    const { w, r, ctx } = this;
    const recommendation =
      ncUnits >= plan.reject
        ? 'reject'
        : ncUnits + inconclusiveUnits >= plan.reject
          ? 'incomplete'
          : 'accept';
    const outcome =
      recommendation === 'accept'
        ? 'accept'
        : recommendation === 'incomplete' || r.chance(0.12)
          ? 'accept_on_concession'
          : 'reject';
    const decisionId = w.nextId('decisions');
    const evaluation = {
      samplesPlanned: plan.sampleSize,
      samplesTested: plan.sampleSize,
      nonconforming: ncUnits,
      inconclusive: inconclusiveUnits,
      recommendation,
      message: `${ncUnits} of ${plan.sampleSize} units nonconforming (accept ${plan.accept}, reject ${plan.reject}).`,
    };
    w.insert('decisions', {
      id: decisionId,
      lot_id: id,
      outcome,
      recommendation,
      reason:
        outcome === 'accept'
          ? 'Every sampled unit meets its label.'
          : outcome === 'reject'
            ? 'Conductors below the labelled size or not the metal claimed.'
            : 'Accepted on concession for low-current runs; supplier informed.',
      evaluation,
      lot_version: version,
      decided_by_id: qa.id,
      decided_at: decidedAt,
    });
    audit(w, qa, 'decision.create', 'decision', decisionId, id, decidedAt, null, {
      outcome,
      recommendation,
    });
    if (outcome === 'accept') return 'accepted';
    if (outcome === 'accept_on_concession') return 'accepted_on_concession';
    const year = new Date(decidedAt).getUTCFullYear();
    const seq = (this.ncrSeq.get(year) ?? 0) + 1;
    this.ncrSeq.set(year, seq);
    const returned = ageDays > 20 && r.chance(0.6);
    w.insert('nonconformances', {
      id: w.nextId('nonconformances'),
      number: `NCR-${year}-${String(seq).padStart(4, '0')}`,
      year,
      seq,
      lot_id: id,
      decision_id: decisionId,
      disposition: returned ? 'return_to_vendor' : null,
      status: returned ? 'closed' : 'open',
      created_at: decidedAt,
    });
    ctx.rejected.push({ lotId: id, supplierId: supplier.id, decidedAt, returned });
    return returned ? 'returned' : 'rejected';
  }
}

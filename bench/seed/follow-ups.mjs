// Returns to vendor of rejected lots and corrective-action requests (SCARs) per supplier.
const DAY = 86_400_000;

function numbered(counters, prefix, at) {
  const year = new Date(at).getUTCFullYear();
  const seq = (counters.get(`${prefix}${year}`) ?? 0) + 1;
  counters.set(`${prefix}${year}`, seq);
  return `${prefix}-${year}-${String(seq).padStart(4, '0')}`;
}

function groupBy(list, key) {
  const groups = new Map();
  for (const item of list) {
    const k = key(item);
    if (!groups.has(k)) groups.set(k, []);
    groups.get(k).push(item);
  }
  return groups;
}

const monthOf = (at) => new Date(at).toISOString().slice(0, 7);

/** One return per supplier and month of the lots sent back; older returns are further along. */
export function seedReturns(w, r, rejected, users, now) {
  const counters = new Map();
  const returned = rejected.filter((x) => x.returned);
  const groups = groupBy(returned, (x) => `${x.supplierId}:${monthOf(x.decidedAt)}`);
  const returnIds = [];
  for (const lots of groups.values()) {
    const createdAt = Math.max(...lots.map((l) => l.decidedAt)) + DAY;
    const age = (now - createdAt) / DAY;
    const status = age > 60 ? 'closed' : age > 30 ? 'acknowledged' : age > 10 ? 'emailed' : 'draft';
    const id = w.nextId('vendor_returns');
    const costs = { inspectionHours: lots.length * 1.5, hourlyRate: 48, freight: r.int(40, 180) };
    const buyer = users.purchasing[id % users.purchasing.length];
    w.insert('vendor_returns', {
      id,
      number: numbered(counters, 'RTV', createdAt),
      supplier_id: lots[0].supplierId,
      rma_number: status === 'draft' ? null : `RA${r.int(100000, 999999)}`,
      notes: null,
      status,
      costs,
      chargeback_total: costs.inspectionHours * costs.hourlyRate + costs.freight,
      currency: 'USD',
      created_by_id: buyer.id,
      created_at: createdAt,
      updated_at: createdAt,
    });
    for (const l of lots) {
      w.insert('vendor_return_lots', { vendor_return_id: id, lot_id: l.lotId });
      // A lot is on at most one open return (the table's key says so).
      if (status !== 'closed')
        w.insert('open_return_lots', { vendor_return_id: id, lot_id: l.lotId });
    }
    w.insert('audit_events', {
      id: w.nextId('audit_events'),
      actor_id: buyer.id,
      actor_email: buyer.email,
      action: 'return.create',
      entity_type: 'return',
      entity_id: id,
      lot_id: null,
      before: null,
      after: { lotIds: lots.map((l) => l.lotId), status },
      at: createdAt,
    });
    returnIds.push(id);
  }
  const recall = seedRecall(w, rejected, users, now, counters);
  if (recall) returnIds.push(recall);
  return returnIds;
}

/**
 * A recall: the supplier with the most rejected lots still in stock sends them all back on
 * one draft return, hundreds of lots at once (what a distributor does on finding a brand's
 * cable is CCA), so the return export is measured on a return of realistic worst size.
 */
function seedRecall(w, rejected, users, now, counters) {
  const kept = groupBy(
    rejected.filter((x) => !x.returned),
    (x) => x.supplierId,
  );
  const lots = [...kept.values()].sort((a, b) => b.length - a.length)[0];
  if (!lots) return null;
  const id = w.nextId('vendor_returns');
  const buyer = users.purchasing[0];
  const costs = { inspectionHours: lots.length * 0.5, hourlyRate: 48, freight: 900 };
  w.insert('vendor_returns', {
    id,
    number: numbered(counters, 'RTV', now),
    supplier_id: lots[0].supplierId,
    rma_number: null,
    notes: 'Recall: every rejected lot still in stock',
    status: 'draft',
    costs,
    chargeback_total: costs.inspectionHours * costs.hourlyRate + costs.freight,
    currency: 'USD',
    created_by_id: buyer.id,
    created_at: now - DAY,
    updated_at: now - DAY,
  });
  for (const l of lots) {
    w.insert('vendor_return_lots', { vendor_return_id: id, lot_id: l.lotId });
    w.insert('open_return_lots', { vendor_return_id: id, lot_id: l.lotId });
  }
  return id;
}

/** A SCAR per supplier and quarter with rejections; responses come in a few weeks later. */
export function seedCorrectiveActions(w, r, rejected, users, now) {
  const counters = new Map();
  const quarter = (at) => {
    const d = new Date(at);
    return `${d.getUTCFullYear()}Q${Math.floor(d.getUTCMonth() / 3)}`;
  };
  const groups = groupBy(rejected, (x) => `${x.supplierId}:${quarter(x.decidedAt)}`);
  for (const lots of groups.values()) {
    if (lots.length < 2 && r.chance(0.5)) continue;
    const createdAt = Math.min(...lots.map((l) => l.decidedAt)) + 2 * DAY;
    if (createdAt > now) continue;
    const age = (now - createdAt) / DAY;
    const status =
      age > 90
        ? 'closed'
        : age > 45
          ? r.pick(['verified', 'closed'])
          : age > 20
            ? 'responded'
            : 'open';
    const respondedAt = status === 'open' ? null : createdAt + r.int(5, 20) * DAY;
    const id = w.nextId('corrective_actions');
    const buyer = users.purchasing[id % users.purchasing.length];
    w.insert('corrective_actions', {
      id,
      number: numbered(counters, 'SCAR', createdAt),
      supplier_id: lots[0].supplierId,
      problem: `${lots.length} lot(s) rejected: conductor area below the labelled gauge or metal not as claimed.`,
      due_on: new Date(createdAt + 30 * DAY).toISOString().slice(0, 10),
      status,
      containment: respondedAt ? 'Stock on hand quarantined and re-inspected.' : null,
      root_cause: respondedAt ? 'Drawing die wear not caught by the in-process check.' : null,
      corrective_action: respondedAt
        ? 'Die change interval halved; weigh check per reel added.'
        : null,
      responded_at: respondedAt,
      closed_at: status === 'closed' ? respondedAt + 14 * DAY : null,
      created_by_id: buyer.id,
      created_at: createdAt,
      updated_at: respondedAt ?? createdAt,
    });
    for (const l of lots)
      w.insert('corrective_action_lots', { corrective_action_id: id, lot_id: l.lotId });
    w.insert('audit_events', {
      id: w.nextId('audit_events'),
      actor_id: buyer.id,
      actor_email: buyer.email,
      action: 'car.create',
      entity_type: 'corrective_action',
      entity_id: id,
      lot_id: null,
      before: null,
      after: { lotIds: lots.map((l) => l.lotId), status },
      at: createdAt,
    });
  }
}

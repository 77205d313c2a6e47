// Users, suppliers, products with their conductors, switching states and instruments.
import bcrypt from 'bcryptjs';
import { initialInspectionState, parseGauge } from '@gaugeproof/standards';
import { personName, supplierName } from './names.mjs';

export const BENCH_PASSWORD = 'gaugeproof-bench';
export const BENCH_USERS = {
  clerk: 'clerk1@bench.example',
  qa: 'qa1@bench.example',
  buyer: 'buyer1@bench.example',
  admin: 'admin@bench.example',
};

const ROLES = [
  ['clerk', 6],
  ['qa_lead', 2],
  ['purchasing', 2],
  ['admin', 1],
];

export function seedUsers(w, now) {
  const hash = bcrypt.hashSync(BENCH_PASSWORD, 10);
  const byRole = { clerk: [], qa_lead: [], purchasing: [], admin: [] };
  let n = 0;
  for (const [role, count] of ROLES) {
    for (let i = 1; i <= count; i++) {
      const id = w.nextId('users');
      const prefix = { clerk: 'clerk', qa_lead: 'qa', purchasing: 'buyer', admin: 'admin' }[role];
      const email = role === 'admin' ? 'admin@bench.example' : `${prefix}${i}@bench.example`;
      w.insert('users', {
        id,
        email,
        name: personName(n++),
        password_hash: hash,
        role,
        active: true,
        created_at: now,
        updated_at: now,
      });
      byRole[role].push({ id, email });
    }
  }
  return byRole;
}

/** Supplier quality tiers: most honest, some mixed, a few that skimp or sell CCA as copper. */
function tier(r) {
  const x = r.next();
  return x < 0.7 ? 'good' : x < 0.9 ? 'mixed' : 'bad';
}

const SPOOL_GAUGES = ['1/0', '2', '4', '4', '8', '8', '10', '25 mm²', '35 mm²'];
const KIT_POWER = ['4', '4', '8', '1/0'];

/**
 * What the cable really is, per conductor: the true material and the true area as a
 * fraction of nominal. Honest products hover just above nominal.
 */
function truth(r, supplierTier, claimed) {
  if (claimed !== 'copper') return { material: claimed, ratio: r.normal(1.01, 0.012) };
  if (supplierTier === 'bad' && r.chance(0.5))
    return { material: 'cca10', ratio: r.normal(1.0, 0.02) };
  if (supplierTier === 'bad') return { material: 'copper', ratio: r.normal(0.72, 0.08) };
  if (supplierTier === 'mixed' && r.chance(0.3))
    return { material: 'copper', ratio: r.normal(0.95, 0.02) };
  return { material: 'copper', ratio: r.normal(1.012, 0.01) };
}

function conductor(w, r, productId, position, purpose, label, claimed, supplierTier) {
  const gauge = parseGauge(label);
  const id = w.nextId('conductor_specs');
  w.insert('conductor_specs', {
    id,
    product_id: productId,
    position,
    purpose,
    gauge_label: gauge.label,
    gauge_system: gauge.system,
    nominal_area_mm2: gauge.nominalAreaMm2,
    claimed_material: claimed,
    claimed_strands: null,
    active: true,
  });
  return {
    id,
    purpose,
    gaugeLabel: gauge.label,
    nominalAreaMm2: gauge.nominalAreaMm2,
    claimed,
    truth: truth(r, supplierTier, claimed),
  };
}

export function seedSuppliers(w, r, count, createdAt) {
  const suppliers = [];
  for (let i = 0; i < count; i++) {
    const id = w.nextId('suppliers');
    const { name, code } = supplierName(i);
    const t = tier(r);
    const status = t === 'bad' ? (r.chance(0.5) ? 'suspended' : 'probation') : 'approved';
    w.insert('suppliers', {
      id,
      name,
      code,
      contact_email: `quality@${code.toLowerCase()}.example`,
      status,
      notes: null,
      created_at: createdAt,
      updated_at: createdAt,
    });
    const products = [];
    const nProducts = r.int(2, 6);
    for (let p = 0; p < nProducts; p++)
      products.push(product(w, r, { id, code, tier: t }, p, createdAt));
    suppliers.push({ id, name, code, tier: t, products });
  }
  return suppliers;
}

function product(w, r, supplier, p, createdAt) {
  const id = w.nextId('products');
  const kit = r.chance(0.4);
  let conductors;
  const power = kit ? r.pick(KIT_POWER) : r.pick(SPOOL_GAUGES);
  const claimed = !kit && r.chance(0.1) ? 'cca15' : 'copper';
  const sku = `${supplier.code}-${kit ? 'KIT' : 'SP'}-${power.replace(/[^0-9a-z]/gi, '')}-${p + 1}`;
  const label = /mm²/.test(power) ? power : `${power} AWG`;
  w.insert('products', {
    id,
    supplier_id: supplier.id,
    sku,
    kind: kit ? 'kit' : 'spool',
    description: kit
      ? `Amplifier wiring kit, ${label} power and ground`
      : `${label} ${claimed === 'copper' ? 'copper' : 'copper-clad aluminium'} power cable, ${r.pick(['red', 'black', 'blue'])} jacket`,
    length_per_unit_m: kit ? 5.2 : r.pick([30, 50, 100]),
    inspection_level: 'S-3',
    aql: kit ? '6.5' : '4.0',
    min_area_ratio: 0.98,
    active: true,
    created_at: createdAt,
    updated_at: createdAt,
  });
  if (kit) {
    conductors = [
      conductor(w, r, id, 0, 'power', label, 'copper', supplier.tier),
      conductor(w, r, id, 1, 'ground', label, 'copper', supplier.tier),
      conductor(w, r, id, 2, 'remote', '18 AWG', 'copper', supplier.tier),
    ];
  } else {
    conductors = [conductor(w, r, id, 0, 'power', label, claimed, supplier.tier)];
  }
  const severity = supplier.tier === 'bad' ? 'tightened' : 'normal';
  w.insert('inspection_states', {
    id: w.nextId('inspection_states'),
    product_id: id,
    severity,
    state: { ...initialInspectionState(), severity },
    reason: severity === 'tightened' ? '2 of the last 5 lots were not accepted' : null,
    updated_at: createdAt,
  });
  return { id, kit, aql: kit ? '6.5' : '4.0', unit: kit ? 'kits' : 'spools', conductors };
}

const INSTRUMENTS = [
  ['balance', 'Bench balance', 0.01, 'g'],
  ['length_rule', 'Steel rule 1 m', 1, 'mm'],
  ['milliohm_meter', 'Four-wire milliohm meter', 0.000001, 'ohm'],
  ['thermometer', 'Probe thermometer', 0.1, 'degC'],
  ['micrometer', 'Outside micrometer', 0.001, 'mm'],
];

/** Two of each kind, calibrated a few months ago and due well after today. */
export function seedInstruments(w, now) {
  const day = (ms) => new Date(ms).toISOString().slice(0, 10);
  const byKind = {};
  for (const [kind, name, resolution, unit] of INSTRUMENTS) {
    for (let i = 1; i <= 2; i++) {
      const id = w.nextId('instruments');
      const row = {
        id,
        kind,
        name: `${name} ${i}`,
        serial: `BN-${kind.slice(0, 3).toUpperCase()}-${1000 + id}`,
        resolution,
        resolution_unit: unit,
        calibrated_on: day(now - 90 * 86400000),
        calibration_due_on: day(now + 275 * 86400000),
        active: true,
        created_at: now,
        updated_at: now,
      };
      w.insert('instruments', row);
      byKind[kind] ??= [];
      byKind[kind].push({
        id,
        kind,
        name: row.name,
        serial: row.serial,
        resolution,
        resolutionUnit: unit,
        calibrationDueOn: row.calibration_due_on,
      });
    }
  }
  return byKind;
}

import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { MATERIALS } from '@gaugeproof/standards';
import { call, dayFromToday } from './helpers/api';
import { makeSupplier, spoolBody } from './helpers/catalog';
import {
  as,
  createInstrument,
  createLot,
  createProduct,
  lotRow,
  type Bench,
  startWithBench,
} from './helpers/fixtures';
import { DEMO, type TestApp } from './helpers/test-app';

/**
 * Issue 13, "verdicts a supplier cannot dispute": every rule through the API, on the real app
 * and database (SQLite here; the PostgreSQL pass runs this file again).
 */
let t: TestApp;
let bench: Bench;
beforeAll(async () => ({ t, bench } = await startWithBench({})));
afterAll(async () => t.close());

async function sampleOf(lotId: number, conductorId: number, seq = 1) {
  const s = await as(t, DEMO.clerk, 'post', `/api/lots/${lotId}/samples`, { conductorId, seq });
  expect(s.status, JSON.stringify(s.body)).toBe(201);
  return s.body.id as number;
}
const post = (sampleId: number, body: object) =>
  as(t, DEMO.clerk, 'post', `/api/samples/${sampleId}/readings`, body);
const resistance = (ohm: number, extra: object = {}) => ({
  method: 'resistance',
  resistanceOhm: ohm,
  lengthMm: 1000,
  temperatureC: 20,
  instrumentIds: [bench.meter.id, bench.thermometer.id],
  ...extra,
});
const mass = (massG: number) => ({
  method: 'mass',
  massG,
  lengthMm: 1000,
  instrumentIds: [bench.balance.id],
});
const detail = async (lotId: number) => (await as(t, DEMO.qa, 'get', `/api/lots/${lotId}`)).body;

describe('metric conductors by resistance (IEC 60228)', () => {
  it('a 25 mm² class 5 copper conductor within 0.780 Ω/km conforms although its area is 91 %', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '25 mm²' }]);
    const s = await sampleOf(await createLot(t, p), p.conductorIds[0]);
    // 0.770 Ω/km at 20 °C against IEC 60228 Table 3, class 5 plain: 0.780 Ω/km
    const r = await post(s, resistance(0.00077));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body.areaRatio).toBeCloseTo((0.017241379 * 1.02) / 0.00077 / 25, 6); // ≈ 0.913
    expect(r.body).toMatchObject({
      criterion: 'resistance',
      verdict: 'conforms',
      measuresAs: '25 mm²',
      limit: { maxOhmPerKm: 0.78, conductorClass: 5, coating: 'plain' },
    });
    expect(r.body.limit.source).toMatch(/IEC 60228 Table 3/);
    expect(r.body.resistanceOhmPerKm).toBeCloseTo(0.77, 9);
  });

  it('class 2 takes Table 2 (25 mm²: 0.727 Ω/km) and tinned copper its own column', async () => {
    const p = await createProduct(t, [
      { purpose: 'power', gauge: '25 mm²', conductorClass: 2 },
      { purpose: 'ground', gauge: '25 mm²', claimedMaterial: 'tinned_copper' },
    ]);
    const lotId = await createLot(t, p);
    const c2 = await post(await sampleOf(lotId, p.conductorIds[0]), resistance(0.00077));
    expect(c2.body).toMatchObject({ verdict: 'nonconforming', limit: { maxOhmPerKm: 0.727 } });
    expect(c2.body.measuresAs).not.toBe('25 mm²');
    // 0.790 Ω/km tinned: within IEC 60228 Table 3's 0.795 for metal-coated copper
    const tinned = await post(await sampleOf(lotId, p.conductorIds[1]), resistance(0.00079));
    expect(tinned.body).toMatchObject({
      verdict: 'conforms',
      limit: { maxOhmPerKm: 0.795, coating: 'tinned' },
    });
  });

  it('full-size tinned AWG copper conforms by resistance (ASTM B33 resistivity)', async () => {
    const p = await createProduct(t, [
      { purpose: 'power', gauge: '4 AWG', claimedMaterial: 'tinned_copper' },
    ]);
    const s = await sampleOf(await createLot(t, p), p.conductorIds[0]);
    // 21.15 mm² (ASTM B258) of tinned copper, 0.15940 Ω·g/m² ÷ 8.89 (ASTM B33 Table 2), k 2 %
    const ohm = (MATERIALS.tinned_copper.resistivityOhmMm2PerM * 1.02) / 21.15;
    const r = await post(s, resistance(Number(ohm.toFixed(7))));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body.areaRatio).toBeCloseTo(1, 3);
    expect(r.body.verdict).toBe('conforms');
  });

  it('conductor specs carry the class: 5 by default for mm², refused for AWG', async () => {
    const supplier = await makeSupplier(t, 'VRD-CLS');
    const metric = await call(
      t,
      DEMO.qa,
      'post',
      '/api/products',
      spoolBody(supplier.id, 'VRD-M', {
        conductors: [{ purpose: 'power', gauge: '25 mm²', claimedMaterial: 'copper' }],
      }),
    );
    expect(metric.status, JSON.stringify(metric.body)).toBe(201);
    expect(metric.body.conductors[0].conductorClass).toBe(5);
    const awg = await call(
      t,
      DEMO.qa,
      'post',
      '/api/products',
      spoolBody(supplier.id, 'VRD-A', {
        conductors: [
          { purpose: 'power', gauge: '4', claimedMaterial: 'copper', conductorClass: 5 },
        ],
      }),
    );
    expect(awg.status).toBe(400);
    expect(awg.body.message[0]).toMatch(/conductors\[0\]\.conductorClass: .*metric/);
    const bad = await call(
      t,
      DEMO.qa,
      'post',
      '/api/products',
      spoolBody(supplier.id, 'VRD-B', {
        conductors: [
          { purpose: 'power', gauge: '25', claimedMaterial: 'copper', conductorClass: 3 },
        ],
      }),
    );
    expect(bad.status).toBe(400);
    expect(JSON.stringify(bad.body.message)).toMatch(/conductorClass must be 1, 2, 5 or 6/);
  });
});

describe('a complete uncertainty budget (GUM)', () => {
  it('registers stated accuracy and calibration uncertainty, and refuses bad ones by name', async () => {
    const body = {
      kind: 'milliohm_meter',
      name: 'Kelvin meter K-9',
      serial: 'VRD-K9',
      resolution: 0.001,
      resolutionUnit: 'mohm',
      accuracyPercentOfReading: 0.2,
      accuracyAbsolute: 0.002,
      calibrationUncertainty: 0.001,
      calibratedOn: dayFromToday(-10),
      calibrationDueOn: dayFromToday(300),
    };
    const ok = await call(t, DEMO.qa, 'post', '/api/instruments', body);
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    expect(ok.body).toMatchObject({
      accuracyPercentOfReading: 0.2,
      accuracyAbsolute: 0.002,
      calibrationUncertainty: 0.001,
    });
    const bad = await call(t, DEMO.qa, 'post', '/api/instruments', {
      ...body,
      serial: 'VRD-K10',
      calibrationUncertainty: -1,
    });
    expect(bad.status).toBe(400);
    expect(bad.body.message).toContain('calibrationUncertainty must be 0 or more');
  });

  it("puts each instrument's resolution, accuracy and calibration, and the temperature difference, in the budget", async () => {
    const meter = await createInstrument(t, 'milliohm_meter', 0.001, 'mohm', '2099-12-31', {
      accuracyPercentOfReading: 0.2,
      accuracyAbsolute: 0.002,
      calibrationUncertainty: 0.001,
    });
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const s = await sampleOf(await createLot(t, p), p.conductorIds[0]);
    const r = await post(
      s,
      resistance(0.000835, { instrumentIds: [meter.id, bench.thermometer.id] }),
    );
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const line = (name: string) =>
      r.body.budget.find((b: { name: string }) => b.name === name)?.standardUncertainty;
    // ±(0.2 % × 0.835 mΩ + 0.002 mΩ) = ±3.67 µΩ, a/√3 (GUM 4.3.7); certificate 1 µΩ, U/2
    expect(line('resistance: stated accuracy')).toBeCloseTo(
      (0.002 * 0.000835 + 2e-6) / Math.sqrt(3),
      12,
    );
    expect(line('resistance: calibration')).toBeCloseTo(0.5e-6, 12);
    expect(line('resistance: resolution')).toBeCloseTo(1e-6 / Math.sqrt(12), 12); // GUM F.2.2.1
    // ±1 °C between conductor and thermometer (no source), ΔT/√3 times α₂₀ 0.00393 (IACS)
    expect(line('conductor − thermometer temperature')).toBeCloseTo(0.00393 / Math.sqrt(3), 9);
    expect(r.body.instruments[0].accuracyPercentOfReading).toBe(0.2);
  });
});

describe('methods that cannot mislead', () => {
  it('takes 1 to 10 strand diameters, k from Welch–Satterthwaite, and checks the count', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG', claimedStrands: 420 }]);
    const lotId = await createLot(t, p);
    const s = await sampleOf(lotId, p.conductorIds[0]);
    const strands = (extra: object) => ({
      method: 'strands',
      count: 420,
      strandDiametersMm: [0.253, 0.254, 0.255],
      instrumentIds: [bench.micrometer.id],
      ...extra,
    });
    const r = await post(s, strands({}));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    const spread = r.body.budget.find(
      (b: { name: string }) => b.name === 'spread of strand diameters',
    );
    expect(spread.degreesOfFreedom).toBe(2); // three strands: ν = 2 (GUM G.3.3)
    expect(r.body.coverageFactor).toBe(3.31); // ν_eff ≈ 3.1: GUM Table G.2
    expect(r.body.inputs.strandDiametersMm).toEqual([0.253, 0.254, 0.255]);

    const eleven = await post(s, strands({ strandDiametersMm: Array(11).fill(0.254) }));
    expect(eleven.status).toBe(400);
    expect(eleven.body.message).toContain('strandDiametersMm must hold 1 to 10 strand diameters');

    const off = await post(s, strands({ count: 370 })); // 11.9 % off the claimed 420
    expect(off.status).toBe(422);
    expect(off.body.questions[0].field).toBe('count');
    expect(off.body.message).toMatch(/product claims 420/);
    const confirmed = await post(s, strands({ count: 370, confirmUnusual: true }));
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.confirmedUnusual).toBe(true);
  });

  it("refuses a stranded conductor's overall diameter, keeps a solid one's", async () => {
    const p = await createProduct(t, [
      { purpose: 'power', gauge: '4 AWG', claimedStrands: 380 },
      { purpose: 'ground', gauge: '4 AWG', claimedStrands: 1 },
    ]);
    const lotId = await createLot(t, p);
    const body = { method: 'diameter', diameterMm: 6.2, instrumentIds: [bench.micrometer.id] };
    const stranded = await post(await sampleOf(lotId, p.conductorIds[0]), body);
    expect(stranded.status).toBe(422);
    expect(stranded.body.message).toMatch(/^diameterMm: the conductor is stranded .*mass.*strands/);
    expect(stranded.body.errors).toEqual([{ field: 'diameterMm', message: stranded.body.message }]);
    const solid = await post(await sampleOf(lotId, p.conductorIds[1]), {
      ...body,
      diameterMm: 5.19, // 4 AWG 0.2043 in (ASTM B258)
    });
    expect(solid.status, JSON.stringify(solid.body)).toBe(201);
    expect(solid.body.verdict).toBe('conforms');
  });

  it('stores a two-wire resistance reading but lets it decide nothing', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const s = await sampleOf(await createLot(t, p), p.conductorIds[0]);
    const r = await post(s, resistance(0.000805, { fourWire: false }));
    expect(r.status, JSON.stringify(r.body)).toBe(201);
    expect(r.body).toMatchObject({ fourWire: false, verdict: 'inconclusive' });
    expect(r.body.reasons[0]).toMatch(/Two-wire/);
    const m = await post(s, mass(195));
    expect(m.body.identifiedMaterial).toBe('unknown'); // the two-wire reading does not count
    const foreign = await post(s, { ...mass(195), fourWire: true });
    expect(foreign.status).toBe(400);
    expect(foreign.body.message).toContain('fourWire is not used by the mass method');
  });

  it('questions a mass typed ten times too high, saves nothing, and records it once confirmed', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const lotId = await createLot(t, p);
    const s = await sampleOf(lotId, p.conductorIds[0]);
    const slip = await post(s, mass(1950));
    expect(slip.status).toBe(422);
    expect(slip.body.message).toMatch(
      /^massG is about ten times the nominal mass: a decimal point\?/,
    );
    // The one error shape, each problem on its field, and the questions list for the form.
    expect(slip.body.errors).toEqual([
      {
        field: 'massG',
        message: expect.stringMatching(/^massG is about ten times.*confirmUnusual/),
      },
    ]);
    expect(slip.body.questions).toEqual([
      { field: 'massG', message: expect.stringMatching(/^massG is about ten times/) },
    ]);
    expect((await detail(lotId)).samples[0].readings).toEqual([]);
    const confirmed = await post(s, { ...mass(1950), confirmUnusual: true });
    expect(confirmed.status).toBe(201);
    expect(confirmed.body.unusual[0].field).toBe('massG');
  });

  it('never questions an undersized reading: 40 % is the fraud, told as the size to treat it as', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const s = await sampleOf(await createLot(t, p), p.conductorIds[0]);
    const r = await post(s, mass(76.1)); // 8.39 mm² (issue 3 check value)
    expect(r.status).toBe(201);
    expect(r.body).toMatchObject({ verdict: 'nonconforming', measuresAs: '8 AWG' });
    expect(r.body.consequence.treatAs).toBe('8 AWG');
    expect(r.body.consequence.text).toMatch(/^Treat as 8 AWG for fusing and voltage drop/);
    expect(r.body.consequence.cautions.join(' ')).toMatch(/local codes/);
    expect(r.body.lengthAdvice).toBeNull();
  });

  it('flags two readings of one sample that disagree by more than their combined U', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG', claimedStrands: 420 }]);
    const lotId = await createLot(t, p);
    const s = await sampleOf(lotId, p.conductorIds[0]);
    await post(s, mass(195)); // ≈ 21.5 mm²
    const strands = await post(s, {
      method: 'strands',
      count: 420,
      strandDiametersMm: [0.24, 0.24, 0.24], // ≈ 19.0 mm²
      instrumentIds: [bench.micrometer.id],
    });
    expect(strands.status, JSON.stringify(strands.body)).toBe(201);
    const flag = (await detail(lotId)).samples[0].disagreement;
    expect(flag.readingIds).toHaveLength(2);
    expect(flag.message).toMatch(/The mass and strands readings disagree/);
  });
});

describe('curtailed rejection and sampling plans', () => {
  it('moves a lot to its decision once Re is reached and lets it be rejected; acceptance waits', async () => {
    // S-3, AQL 10, 50 units → code letter B, n = 5, Ac 1, Re 2 (MIL-STD-105E Table II-A)
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }], { aql: '10' });
    const lotId = await createLot(t, p);
    for (const seq of [1, 2]) {
      const r = await post(await sampleOf(lotId, p.conductorIds[0], seq), mass(76.1));
      expect(r.body.verdict).toBe('nonconforming');
    }
    expect((await detail(lotId)).evaluation).toMatchObject({
      samplesPlanned: 5,
      samplesTested: 2,
      recommendation: 'reject',
    });
    const lot = await lotRow(t, lotId);
    expect(lot.status).toBe('awaiting_decision');
    const decide = (body: object) =>
      as(t, DEMO.qa, 'post', `/api/lots/${lotId}/decisions`, { version: lot.version, ...body });
    const accept = await decide({ outcome: 'accept', reason: 'The supplier says these are fine' });
    expect(accept.status).toBe(422);
    expect(accept.body.message).toMatch(/Acceptance needs every planned unit: 2 of 5 tested/);
    const reject = await decide({ outcome: 'reject', reason: '' });
    expect(reject.status, JSON.stringify(reject.body)).toBe(201);
    expect((await lotRow(t, lotId)).status).toBe('rejected');
  });

  it('refuses AQLs above 10 for a plan that counts nonconforming units, with the reason', async () => {
    const supplier = await makeSupplier(t, 'VRD-AQL');
    for (const aql of ['65', '1000']) {
      const res = await call(
        t,
        DEMO.qa,
        'post',
        '/api/products',
        spoolBody(supplier.id, `VRD-AQL-${aql}`, { aql }),
      );
      expect(res.status).toBe(400);
      expect(res.body.message).toContain(
        'aql must be 10 or below: our plans count nonconforming units, and ANSI/ASQ Z1.4 and ISO 2859-1 give AQLs above 10 for nonconformities per 100 units only',
      );
    }
    const ten = await call(
      t,
      DEMO.qa,
      'post',
      '/api/products',
      spoolBody(supplier.id, 'VRD-10', { aql: '10' }),
    );
    expect(ten.status).toBe(201);
  });
});

describe('CSV import names the resistance unit', () => {
  const send = async (lotId: number, csv: string) =>
    t.http
      .post(`/api/lots/${lotId}/readings/import`)
      .set('Authorization', `Bearer ${await t.token(DEMO.clerk)}`)
      .attach('file', Buffer.from(csv), { filename: 'bench.csv', contentType: 'text/csv' });

  it('reads resistance_mohm and resistance_ohm, and refuses both filled on one row', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const lotId = await createLot(t, p);
    const ins = `${bench.meter.serial};${bench.thermometer.serial}`;
    const header =
      'unit,conductor,method,lengthMm,temperatureC,resistance_mohm,resistance_ohm,instruments';
    const ok = await send(
      lotId,
      [
        header,
        `1,power,resistance,1000,20,0.805,,${ins}`,
        `2,power,resistance,1000,20,,0.000805,${ins}`,
      ].join('\n'),
    );
    expect(ok.status, JSON.stringify(ok.body)).toBe(201);
    // 0.805 mΩ over 1 m: 0.017241 × 1.02 / 0.000805 = 21.85 mm² (REFERENCE §2), both rows alike
    for (const r of ok.body.readings) {
      expect(r.inputs.resistanceOhm).toBeCloseTo(0.000805, 12);
      expect(r.verdict).toBe('conforms');
    }
    const both = await send(
      lotId,
      [header, `3,power,resistance,1000,20,0.805,0.000805,${ins}`].join('\n'),
    );
    expect(both.status).toBe(422);
    expect(both.body.errors[0], JSON.stringify(both.body)).toMatchObject({
      row: 2,
      column: 'resistance_mohm',
    });
    expect(both.body.errors).toHaveLength(1);
    expect(both.body.errors[0].message).toMatch(/one column only/);
  });

  it('puts a questioned reading on its row and the column it was read from; nothing saved', async () => {
    const p = await createProduct(t, [{ purpose: 'power', gauge: '4 AWG' }]);
    const lotId = await createLot(t, p);
    const ins = `${bench.meter.serial};${bench.thermometer.serial}`;
    const header = 'unit,conductor,method,massG,lengthMm,temperatureC,resistance_mohm,instruments';
    const csv = [
      header,
      `1,power,mass,195,1000,,,${bench.balance.serial};${bench.rule.serial}`,
      // 0.0805 mΩ over 1 m: ten times 4 AWG's area (a decimal slip), questioned
      `2,power,resistance,,1000,20,0.0805,${ins}`,
      // 1950 g over 1 m: ten times 4 AWG's copper mass (195 g, REFERENCE §2)
      `3,power,mass,1950,1000,,,${bench.balance.serial};${bench.rule.serial}`,
    ].join('\n');
    const res = await send(lotId, csv);
    expect(res.status, JSON.stringify(res.body)).toBe(422);
    expect(res.body.errors).toEqual([
      {
        row: 3,
        column: 'resistance_mohm',
        message: expect.stringMatching(/^resistanceOhm .*ten times/),
      },
      { row: 4, column: 'massG', message: expect.stringMatching(/^massG is about ten times/) },
    ]);
    const detail = await call(t, DEMO.qa, 'get', `/api/lots/${lotId}`);
    expect(detail.body.samples).toEqual([]);
  });
});

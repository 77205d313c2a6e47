// Readings of one sample, numbers from the cable's true copper and computed by the server's
// own computation (dist/inspection/reading-compute.js over @gaugeproof/standards).
import { createRequire } from 'node:module';
import { MATERIALS } from '@gaugeproof/standards';

const require = createRequire(import.meta.url);
const { computeReading } = require('../../apps/backend/dist/inspection/reading-compute.js');

const K = 0.02; // ASTM B496 standard stranding increment, as the clerk would enter it
/** To the instrument's step, as the display shows it (no 22.200000000000003 °C). */
const round = (v, step) => {
  const decimals = Math.max(0, -Math.floor(Math.log10(step)));
  return Number((Math.round(v / step) * step).toFixed(decimals));
};

/** Mass of the stripped specimen, g: ρ · A · L · (1 + k) (ASTM B263). */
function massG(material, areaMm2, lengthMm) {
  return round((MATERIALS[material].densityGPerCm3 / 1000) * areaMm2 * lengthMm * (1 + K), 0.01);
}

/** Resistance at t °C, Ω: ρ₂₀ · L · (1 + k) / A · (1 + α (t − 20)) (REFERENCE §2). */
function resistanceOhm(material, areaMm2, lengthMm, temperatureC) {
  const m = MATERIALS[material];
  const r20 = (m.resistivityOhmMm2PerM * (lengthMm / 1000) * (1 + K)) / areaMm2;
  return round(r20 * (1 + m.alpha20PerC * (temperatureC - 20)), 0.000001);
}

/**
 * The readings a clerk takes on one sample: always mass, plus four-wire resistance on power
 * and ground conductors (which also identifies the metal). `areaMm2` is the true area.
 */
export function sampleReadings(r, spec, areaMm2, instruments, minAreaRatio) {
  const lengthMm = spec.purpose === 'remote' ? 500 : r.pick([500, 1000, 1000]);
  const planned = [
    {
      method: 'mass',
      inputs: {
        massG: massG(spec.truth.material, areaMm2, lengthMm),
        lengthMm,
        strandingIncrement: K,
      },
      used: [instruments.balance[0], instruments.length_rule[0]],
      resolutions: { massResolutionG: 0.01, lengthResolutionMm: 1 },
    },
  ];
  if (spec.purpose !== 'remote') {
    const temperatureC = round(r.normal(21.5, 1.5), 0.1);
    planned.push({
      method: 'resistance',
      inputs: {
        resistanceOhm: resistanceOhm(spec.truth.material, areaMm2, lengthMm, temperatureC),
        lengthMm,
        temperatureC,
        strandingIncrement: K,
      },
      used: [instruments.milliohm_meter[0], instruments.length_rule[0], instruments.thermometer[0]],
      resolutions: {
        resistanceResolutionOhm: 0.000001,
        lengthResolutionMm: 1,
        temperatureResolutionC: 0.1,
      },
    });
  }
  const done = [];
  for (const p of planned) {
    const computed = computeReading({
      method: p.method,
      inputs: p.inputs,
      resolutions: p.resolutions,
      gaugeLabel: spec.gaugeLabel,
      claimedMaterial: spec.claimed,
      minAreaRatio,
      siblings: done.map((d) => ({
        method: d.method,
        inputs: d.inputs,
        areaMm2: d.computed.areaMm2,
      })),
    });
    done.unshift({ method: p.method, inputs: p.inputs, instruments: p.used, computed });
  }
  return done.reverse();
}

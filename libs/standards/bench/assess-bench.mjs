// Throughput of the computation a clerk's screen and the server run per reading:
// mass method → material identification → sample verdict. Runs on the built package.
//   npm run bench -w libs/standards
import {
  areaFromMass,
  assessSample,
  identifyMaterial,
  nextInspectionState,
  initialInspectionState,
  lotOutcome,
  parseGauge,
  samplingPlan,
} from '../dist/index.js';

function perSecond(label, fn, ms = 1000) {
  for (let i = 0; i < 2000; i += 1) fn(i); // warm up
  let count = 0;
  const start = performance.now();
  let now = start;
  while (now - start < ms) {
    for (let i = 0; i < 1000; i += 1) fn(count + i);
    count += 1000;
    now = performance.now();
  }
  const rate = Math.round((count / (now - start)) * 1000);
  console.log(`${label}: ${rate} per second`);
  return rate;
}

const gauge = parseGauge('4 AWG');
let sink = 0;

perSecond('sample assessments', (i) => {
  const massG = 70 + (i % 100) / 10; // 70.0 … 79.9 g over 1 m
  const area = areaFromMass({ massG, lengthMm: 1000 });
  const material = identifyMaterial({ massG, lengthMm: 1000, resistanceOhm: 0.0021 });
  const verdict = assessSample({
    gauge,
    claimedMaterial: 'copper',
    areaMm2: area.areaMm2,
    UMm2: area.UMm2,
    identifiedMaterial: material.material,
  });
  sink += verdict.areaRatio;
});

perSecond('sampling plans with lot outcome', (i) => {
  const plan = samplingPlan({ lotSize: 2 + (i % 5000), aql: '1.0' });
  sink += lotOutcome(plan, i % 2) === 'accept' ? 1 : 0;
});

let state = initialInspectionState();
perSecond('switching-state updates', (i) => {
  state = nextInspectionState(state, { accepted: i % 7 !== 0 });
});

if (!Number.isFinite(sink)) throw new Error('benchmark result lost');

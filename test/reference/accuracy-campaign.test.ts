// The accuracy rule (docs/methods-and-verification.md) against the independent exact reference
// (exact-response.ts: mathjs's expm of the augmented system, sampled densely inside every record
// step, confirmed against ODEX in exact-response.test.ts), on invented narrow-band records (sines
// up to the Nyquist frequency, steady and ramped) and broadband stochastic ones, for every method
// on both kernels, for the spectrum (SD, SV, SA) and RotD (RotD50, RotD100). The default run takes a
// representative sample; QUAKESWEEP_CAMPAIGN=1 runs the whole campaign (minutes) and prints the
// worst error of every family and method.
import { describe, expect, it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { sweepOscillators } from '../../src/oscillator/sweep.js';
import { createRecord } from '../../src/record/record.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { exactDisplacement, exactPeaks } from './exact-response.js';
import { broadbandFamily, type FamilyRecord, narrowBandFamily, STEPS_S, sineRecord } from './families.js';

const CAMPAIGN = process.env.QUAKESWEEP_CAMPAIGN === '1';
const METHODS = ['newmark-average', 'newmark-linear', 'piecewise-exact'] as const;
const KERNELS = ['wasm', 'js'] as const;
/** The stated range ζ = 0–0.5 and the documented high-damping range up to ζ = 10. */
const DAMPINGS = CAMPAIGN ? [0, 0.02, 0.05, 0.1, 0.2, 0.5, 1, 2, 5, 10] : [0, 0.05, 0.5, 1, 10];
const PERIODS = Array.from(logSpaced(0.01, 20, CAMPAIGN ? 25 : 7));
const LIMIT = 0.005;

function spectrumRecords(): FamilyRecord[] {
  if (CAMPAIGN)
    return STEPS_S.flatMap((dtS) => [...narrowBandFamily(dtS), ...broadbandFamily(dtS, [31, 32])]);
  return [
    // The case: a ramped 3.5 Hz sine at 0.02 s; a sine struck near the Nyquist frequency.
    sineRecord(3.5, 0.02, { rampS: 2, durationS: 4 }),
    sineRecord(24.5, 0.02, { phase: Math.PI / 2, durationS: 3 }),
    sineRecord(70, 0.005, { durationS: 1.5 }),
    ...broadbandFamily(0.02, [31]).slice(0, 1),
  ];
}

/** The worst relative error of each family and method, printed at the end of a campaign. */
const worst = new Map<string, { error: number; where: string }>();
function note(key: string, error: number, where: string) {
  const w = worst.get(key);
  if (w === undefined || Math.abs(error) > Math.abs(w.error)) worst.set(key, { error, where });
}

describe.each(spectrumRecords())('spectrum on the $label', (record) => {
  const exact = DAMPINGS.flatMap((zeta) =>
    PERIODS.map((t) => exactPeaks(record.accelMS2, record.dtS, t, zeta)),
  );
  it.each(METHODS)('%s keeps SD, SV and SA within 0.5% on both kernels', (method) => {
    for (const kernel of KERNELS) {
      const peaks = sweepOscillators(record.accelMS2, record.dtS, {
        periodsS: PERIODS,
        dampings: DAMPINGS,
        method,
        kernel,
      });
      for (const [key, ours] of [
        ['sdM', peaks.sdM],
        ['svMS', peaks.svMS],
        ['saMS2', peaks.saMS2],
      ] as const) {
        exact.forEach((e, i) => {
          const error = ours[i] / e[key] - 1;
          const where = `${key} T = ${PERIODS[i % PERIODS.length].toPrecision(3)} s, ζ = ${DAMPINGS[Math.floor(i / PERIODS.length)]}, ${record.label}, ${kernel}`;
          note(`${record.family} · ${method}`, error, where);
          expect(Math.abs(error), where).toBeLessThan(LIMIT);
        });
      }
    }
  });
});

/** RotD50 and RotD100 of PSA from the exact displacements of both components at 64 points a period. */
function exactRotD(
  a1: Float64Array,
  a2: Float64Array,
  dtS: number,
  periodS: number,
  zeta: number,
  angles: number,
) {
  const omega = (2 * Math.PI) / periodS;
  const points = Math.max(32, Math.ceil((64 * 2 * Math.max(0.5, zeta) * dtS) / periodS));
  const u1 = exactDisplacement(a1, dtS, periodS, zeta, points);
  const u2 = exactDisplacement(a2, dtS, periodS, zeta, points);
  const psa = new Float64Array(angles);
  for (let k = 0; k < angles; k++) {
    const c = Math.cos((k * Math.PI) / angles);
    const s = Math.sin((k * Math.PI) / angles);
    let best = 0;
    let at = 0;
    for (let j = 0; j < u1.length; j++) {
      const q = Math.abs(c * u1[j] + s * u2[j]);
      if (q > best) [best, at] = [q, j];
    }
    if (at > 0 && at < u1.length - 1) {
      const [a, b, d] = [at - 1, at, at + 1].map((j) => Math.abs(c * u1[j] + s * u2[j]));
      const curvature = a - 2 * b + d;
      if (curvature < 0) best = Math.max(best, b - ((a - d) * (a - d)) / (8 * curvature));
    }
    psa[k] = omega * omega * best;
  }
  const sorted = Float64Array.from(psa).sort();
  return { rotd50: 0.5 * (sorted[angles / 2 - 1] + sorted[angles / 2]), rotd100: sorted[angles - 1] };
}

function rotdPairs(): [FamilyRecord, FamilyRecord][] {
  const dts = CAMPAIGN ? STEPS_S : [0.02];
  return dts.flatMap((dtS) => {
    const nyquist = 0.5 / dtS;
    const fractions = CAMPAIGN ? [0.14, 0.5, 0.98] : [0.14];
    const narrow = fractions.map((fraction): [FamilyRecord, FamilyRecord] => [
      sineRecord(fraction * nyquist, dtS, { rampS: 2, durationS: 4 }),
      sineRecord(fraction * nyquist * 0.9, dtS, { phase: 1, durationS: 4 }),
    ]);
    const [first, second] = broadbandFamily(dtS, [41, 42], [2.5]);
    return [...narrow, [first, second]];
  });
}

describe.each(rotdPairs())('RotD of $label with its pair', (first, second) => {
  const periods = CAMPAIGN ? Array.from(logSpaced(0.01, 20, 9)) : [0.03, 0.3, 3];
  const dampings = CAMPAIGN ? [0, 0.05, 0.5, 2] : [0.05, 0.5];
  const angles = 180;
  const exact = dampings.flatMap((zeta) =>
    periods.map((t) => exactRotD(first.accelMS2, second.accelMS2, first.dtS, t, zeta, angles)),
  );
  const records = [first, second].map((r, i) =>
    createRecord({ name: `component ${i + 1}`, dtS: r.dtS, accelMS2: r.accelMS2 }),
  );
  it.each(METHODS)('%s keeps RotD50 and RotD100 within 0.5%', (method) => {
    for (const kernel of KERNELS) {
      const rotd = rotDSpectra(records[0], records[1], {
        periodsS: periods,
        dampings,
        method,
        kernel,
        angleStepDeg: 1,
      });
      rotd.curves.forEach((curve, d) => {
        periods.forEach((t, p) => {
          const e = exact[d * periods.length + p];
          for (const [name, ours, reference] of [
            ['RotD50', curve.rotd50MS2[p], e.rotd50],
            ['RotD100', curve.rotd100MS2[p], e.rotd100],
          ] as const) {
            const error = ours / reference - 1;
            const where = `${name} T = ${t.toPrecision(3)} s, ζ = ${dampings[d]}, ${first.label}, ${kernel}`;
            note(`RotD ${first.family} · ${method}`, error, where);
            expect(Math.abs(error), where).toBeLessThan(LIMIT);
          }
        });
      });
    }
  });
});

describe('campaign summary', () => {
  it.runIf(CAMPAIGN)('prints the worst error of every family and method', () => {
    const lines = [...worst].map(
      ([key, w]) => `${key.padEnd(40)} ${(w.error * 100).toFixed(3).padStart(7)}%  ${w.where}`,
    );
    process.stdout.write(`accuracy campaign, worst errors:\n${lines.sort().join('\n')}\n`);
    expect(worst.size).toBeGreaterThan(0);
  });
});

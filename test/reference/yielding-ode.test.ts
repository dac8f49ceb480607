// Independent reference: the general ODE solver ODEX (Hairer and Wanner's Gragg–Bulirsch–Stoer
// extrapolation code, the `odex` package from the registry) integrates the yielding oscillator
// u'' + 2ζωu' + ω²·s(u) = −a_g(t) branch by branch with yield and unloading located as events on
// its dense output, to tolerance 1e-10 (test/helpers/yielding-ode.ts; it shares no code with
// src/inelastic). yieldingPeak at its default sub-step rule must give the same peak displacement
// and peak ductility within 0.5%. The strengths are those of the usual constant-strength-reduction
// cases, u_y = u_o/R with R = 2, 4, 8 and u_o the elastic peak (also from ODEX).
//
// The quick run takes a spread subset of the case matrix (12 oscillators: every record, period,
// damping, model and R appears); QUAKESWEEP_REFERENCE_FULL=1 runs all of it (3 records × 4
// periods × 2 dampings × 2 models × 3 R = 144 oscillators, 5 to 8 s of ODEX on this machine).
import { describe, expect, it } from 'vitest';
import type { Hysteresis } from '../../src/inelastic/hysteresis.js';
import { yieldingPeak } from '../../src/inelastic/yielding.js';
import { FULL_REFERENCE, reportReference } from '../helpers/reference-budget.js';
import { odeYieldingPeak } from '../helpers/yielding-ode.js';
import { demoStart, filteredNoise, type ShortRecord, sinePulseTrain } from '../helpers/yielding-records.js';

const records = [sinePulseTrain(), filteredNoise(), demoStart()];
const periods = [0.1, 0.3, 1, 3];
const dampings = [0.02, 0.05];
const models: Hysteresis[] = [{ kind: 'elastoplastic' }, { kind: 'bilinear', alpha: 0.05 }];
const ratios = [2, 4, 8];

/** The claim: peaks within 0.5% of the reference at the default sub-step rule. */
const TOLERANCE = 0.005;

interface Case {
  record: ShortRecord;
  periodS: number;
  damping: number;
  model: Hysteresis;
  ratio: number;
}

/**
 * The cases with the largest errors in the full run (measured 2026-12-03 on the rule with
 * N(ζ) = 120·√(0.025/ζ) steps per period: 0.35%, 0.25%, 0.18%, 0.15% and 0.13%), run in the quick
 * run too (`record` indexes `records`, `model` indexes `models`). With a flat N = 120 the first was
 * 0.54%, and the quick subset alone did not catch N = 80.
 */
const hardest: { record: number; periodS: number; damping: number; model: number; ratio: number }[] = [
  { record: 2, periodS: 0.3, damping: 0.02, model: 0, ratio: 2 },
  { record: 2, periodS: 0.1, damping: 0.02, model: 0, ratio: 2 },
  { record: 2, periodS: 0.1, damping: 0.02, model: 1, ratio: 2 },
  { record: 0, periodS: 0.3, damping: 0.02, model: 0, ratio: 2 },
  { record: 1, periodS: 3, damping: 0.02, model: 1, ratio: 8 },
];

function isHardest(r: number, periodS: number, damping: number, m: number, ratio: number): boolean {
  return hardest.some(
    (k) =>
      k.record === r && k.periodS === periodS && k.damping === damping && k.model === m && k.ratio === ratio,
  );
}

/**
 * The quick run: for each record and period one damping, one model and one R, chosen so that each
 * record meets both dampings with both models and all three R.
 */
function groups(): { r: number; p: number; d: number; picks: [number, number][] }[] {
  const out: { r: number; p: number; d: number; picks: [number, number][] }[] = [];
  records.forEach((_, r) => {
    periods.forEach((_, p) => {
      dampings.forEach((_, d) => {
        if (!FULL_REFERENCE && d !== p % dampings.length) return;
        const picks: [number, number][] = [];
        models.forEach((_, m) => {
          ratios.forEach((_, q) => {
            const quick = m === (r + Math.floor(p / 2)) % models.length && q === (r + p) % ratios.length;
            if (FULL_REFERENCE || quick) picks.push([m, q]);
          });
        });
        out.push({ r, p, d, picks });
      });
    });
  });
  return out;
}

/** The relative errors of yieldingPeak's peak displacement and ductility against ODEX. */
function compare(c: Case, uyM: number) {
  const alpha = c.model.kind === 'bilinear' ? c.model.alpha : 0;
  const base = { periodS: c.periodS, damping: c.damping };
  const reference = odeYieldingPeak(c.record.accelMS2, c.record.dtS, {
    ...base,
    alpha,
    yieldDisplacementM: uyM,
  });
  const peak = yieldingPeak(c.record.accelMS2, c.record.dtS, {
    ...base,
    model: c.model,
    yieldDisplacementM: uyM,
  });
  const figures = {
    record: c.record.name,
    periodS: c.periodS,
    damping: c.damping,
    model: alpha === 0 ? 'elastoplastic' : `bilinear:${alpha}`,
    ratio: c.ratio,
    referenceDuctility: reference.ductility,
    ductility: peak.ductility,
    displacementError: peak.peakDisplacementM / reference.peakDisplacementM - 1,
    ductilityError: peak.ductility / reference.ductility - 1,
    substeps: peak.substeps,
  };
  reportReference('yielding-ode', figures);
  return figures;
}

const elasticPeaks = new Map<string, number>();

/** u_o, the elastic peak, from ODEX (kept: several cases share it). */
function elasticPeak(record: ShortRecord, periodS: number, damping: number): number {
  const key = `${record.name} ${periodS} ${damping}`;
  let peak = elasticPeaks.get(key);
  if (peak === undefined) {
    peak = odeYieldingPeak(record.accelMS2, record.dtS, {
      periodS,
      damping,
      alpha: 0,
      yieldDisplacementM: Number.POSITIVE_INFINITY,
    }).peakDisplacementM;
    elasticPeaks.set(key, peak);
  }
  return peak;
}

describe('yieldingPeak against ODEX with event location (peaks within 0.5%)', () => {
  for (const { r, p, d, picks } of groups()) {
    const record = records[r];
    const periodS = periods[p];
    const damping = dampings[d];
    const cases = picks.filter(([m, q]) => !isHardest(r, periodS, damping, m, ratios[q]));
    if (cases.length === 0) continue;
    const label = cases.map(([m, q]) => `${m === 0 ? 'EP' : 'BL'} R=${ratios[q]}`).join(', ');
    it(`${record.name}, T = ${periodS} s, ζ = ${damping}: ${label}`, () => {
      const uoM = elasticPeak(record, periodS, damping);
      for (const [m, q] of cases) {
        const ratio = ratios[q];
        const figures = compare({ record, periodS, damping, model: models[m], ratio }, uoM / ratio);
        // A check that can fail: these strengths do yield.
        expect(figures.referenceDuctility).toBeGreaterThan(1.2);
        expect(Math.abs(figures.displacementError)).toBeLessThan(TOLERANCE);
        expect(Math.abs(figures.ductilityError)).toBeLessThan(TOLERANCE);
      }
    });
  }

  for (const k of hardest) {
    const record = records[k.record];
    const model = models[k.model];
    const name = `${record.name}, T = ${k.periodS} s, ζ = ${k.damping}, ${model.kind}, R = ${k.ratio}`;
    it(`one of the hardest: ${name}: within 0.5%`, () => {
      const uoM = elasticPeak(record, k.periodS, k.damping);
      const c = { record, periodS: k.periodS, damping: k.damping, model, ratio: k.ratio };
      const figures = compare(c, uoM / k.ratio);
      expect(figures.referenceDuctility).toBeGreaterThan(1.2);
      expect(Math.abs(figures.displacementError)).toBeLessThan(TOLERANCE);
      expect(Math.abs(figures.ductilityError)).toBeLessThan(TOLERANCE);
    });
  }

  it('the reference itself: the step-load closed form to 1e-9 (Chopra §7.x)', () => {
    // Undamped, constant a_g = −a0 from rest, f_y = R·m·a0, kinematic bilinear (α = 0:
    // elastoplastic): at the first peak the work of the load equals the energy in the spring,
    // ½α(μ − 1)² + (1 − 1/R)μ − ½ = 0, so μ = R/(2(R − 1)) when α = 0 (closed form; derived in
    // test/reference/step-load.test.ts).
    const accel = new Float64Array(201).fill(-2);
    const staticM = 2 / (2 * Math.PI) ** 2;
    for (const [ratio, alpha] of [
      [1.25, 0],
      [1.6, 0],
      [1.25, 0.1],
      [1.1, 0.3],
    ]) {
      const b = 1 - 1 / ratio;
      const mu = alpha === 0 ? 1 / (2 * b) : 1 + (-b + Math.sqrt(b * b - 2 * alpha * (b - 0.5))) / alpha;
      const peak = odeYieldingPeak(accel, 0.01, {
        periodS: 1,
        damping: 0,
        alpha,
        yieldDisplacementM: ratio * staticM,
      });
      expect(Math.abs(peak.ductility / mu - 1)).toBeLessThan(1e-9);
      expect(peak.yieldEvents).toBe(1);
    }
  });
});

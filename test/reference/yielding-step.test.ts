// yieldingPeak against the ODE reference (ODEX with yield and unloading events,
// test/helpers/yielding-ode.ts) as the record step shrinks. Each record is taken at Δt = 0.02 s
// and linearly interpolated onto 0.01 and 0.005 s: the same ground motion (the engine and the
// reference both take the record as linear between samples), so one reference serves all three.
// Asserted: the 0.5% claim at the default sub-step rule, at every step. Measured and reported
// (QUAKESWEEP_REFERENCE_REPORT), not asserted: the error with one Newmark step per record step,
// and with 1, 2, 4, … 32 sub-steps at 0.02 s, which shows the method's order (2: the error falls
// about four times per halving once the step is below about T/20).
import { describe, expect, it } from 'vitest';
import type { Hysteresis } from '../../src/inelastic/hysteresis.js';
import { yieldingPeak } from '../../src/inelastic/yielding.js';
import { reportReference } from '../helpers/reference-budget.js';
import { odeYieldingPeak } from '../helpers/yielding-ode.js';
import { filteredNoise, refine, type ShortRecord, sinePulseTrain } from '../helpers/yielding-records.js';

const TOLERANCE = 0.005;
const noise = filteredNoise();
const pulses = sinePulseTrain(0.02);
const elastoplastic: Hysteresis = { kind: 'elastoplastic' };
const bilinear: Hysteresis = { kind: 'bilinear', alpha: 0.05 };

// [record, T (s), ζ, model, R = u_o/u_y]
const cases = (
  [
    [noise, 0.1, 0.02, elastoplastic, 2],
    [noise, 0.3, 0.05, elastoplastic, 2],
    [noise, 3, 0.05, bilinear, 8],
    [pulses, 0.3, 0.02, elastoplastic, 2],
    [pulses, 1, 0.05, bilinear, 4],
  ] as const
).map(([record, periodS, damping, model, ratio]) => ({
  label: `${record.name}, T = ${periodS} s, ζ = ${damping}, ${model.kind === 'bilinear' ? `bilinear:${model.alpha}` : model.kind}, R = ${ratio}`,
  record,
  periodS,
  damping,
  model,
  ratio,
}));

describe('yieldingPeak converges to the ODE reference as the step shrinks', () => {
  it.each(cases)(
    '$label: within 0.5% at the default rule, Δt = 0.02, 0.01, 0.005 s',
    ({ record, periodS, damping, model, ratio }) => {
      const alpha = model.kind === 'bilinear' ? model.alpha : 0;
      const base = { periodS, damping };
      const elastic = odeYieldingPeak(record.accelMS2, record.dtS, {
        ...base,
        alpha: 0,
        yieldDisplacementM: Number.POSITIVE_INFINITY,
      });
      const uyM = elastic.peakDisplacementM / ratio;
      const reference = odeYieldingPeak(record.accelMS2, record.dtS, {
        ...base,
        alpha,
        yieldDisplacementM: uyM,
      });
      expect(reference.ductility).toBeGreaterThan(1.2);
      const errorOf = (r: ShortRecord, substeps?: number) => {
        const peak = yieldingPeak(r.accelMS2, r.dtS, { ...base, model, yieldDisplacementM: uyM, substeps });
        return { error: peak.peakDisplacementM / reference.peakDisplacementM - 1, substeps: peak.substeps };
      };
      const records = [record, refine(record, 2), refine(record, 4)];
      const atRule = records.map((r) => errorOf(r));
      for (const { error } of atRule) expect(Math.abs(error)).toBeLessThan(TOLERANCE);
      reportReference('yielding-step', {
        record: record.name,
        periodS,
        damping,
        alpha,
        ratio,
        ductility: reference.ductility,
        ruleErrors: atRule.map((e) => e.error),
        ruleSubsteps: atRule.map((e) => e.substeps),
        oneStepErrors: records.map((r) => errorOf(r, 1).error),
        substepErrors: [1, 2, 4, 8, 16, 32].map((n) => errorOf(record, n).error),
      });
    },
  );
});

describe('second order, which only holds with the steps split at yield and unloading', () => {
  // Newmark average acceleration is second order (Newmark 1959): once the step is well below the
  // period, halving it divides the error by about 4. A step that yields or turns inside without
  // being split at the event loses that (measured with the splitting switched off: on these three
  // cases the ratios wander from 0.8 to 6.6; with it they are 3.97–4.02), so the observed order
  // guards the event location. Reference: ODEX with events.
  it.each([cases[1], cases[2], cases[4]])(
    '$label: the error falls 3.5–4.5 times a halving from 4 to 64 sub-steps',
    ({ record, periodS, damping, model, ratio }) => {
      const alpha = model.kind === 'bilinear' ? model.alpha : 0;
      const base = { periodS, damping };
      const elastic = odeYieldingPeak(record.accelMS2, record.dtS, {
        ...base,
        alpha: 0,
        yieldDisplacementM: Number.POSITIVE_INFINITY,
      });
      const uyM = elastic.peakDisplacementM / ratio;
      const reference = odeYieldingPeak(record.accelMS2, record.dtS, {
        ...base,
        alpha,
        yieldDisplacementM: uyM,
      });
      const errors = [4, 8, 16, 32, 64].map(
        (substeps) =>
          yieldingPeak(record.accelMS2, record.dtS, { ...base, model, yieldDisplacementM: uyM, substeps })
            .peakDisplacementM /
            reference.peakDisplacementM -
          1,
      );
      for (let k = 1; k < errors.length; k++) {
        const ratioOfErrors = errors[k - 1] / errors[k];
        expect(ratioOfErrors).toBeGreaterThan(3.5);
        expect(ratioOfErrors).toBeLessThan(4.5);
      }
    },
  );
});

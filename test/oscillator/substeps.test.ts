import { describe, expect, it } from 'vitest';
import {
  dampingScale,
  executionPlan,
  fastestPoleRatio,
  inputFrequency,
  MAX_SUBSTEPS,
  MIN_STEPS_PER_PERIOD,
  recordSubsteps,
  SUBSTEP_RULE,
  stepsPerPeriod,
  substepCount,
} from '../../src/oscillator/substeps.js';

// The rule as its documentation states it (src/oscillator/substeps.ts); how well it holds peaks
// is checked against the exact method in test/reference/accuracy.test.ts.
const context = { damping: 0.05, durationS: 20 };

describe('steps per period', () => {
  it('pre-warped: the fixed count of each method, raised (never lowered) by the user', () => {
    expect(stepsPerPeriod('newmark-average', 1, context)).toBe(SUBSTEP_RULE['newmark-average'].prewarped);
    expect(stepsPerPeriod('piecewise-exact', 1, context)).toBe(MIN_STEPS_PER_PERIOD);
    expect(stepsPerPeriod('newmark-linear', 1, { ...context, stepsPerPeriod: 200 })).toBe(200);
    expect(stepsPerPeriod('newmark-linear', 1, { ...context, stepsPerPeriod: 3 })).toBe(38);
  });

  it('textbook: N = √(K·C + N₀²), C the cycles remembered, min(duration/T, 1/(2πζ))', () => {
    const { k, baseSteps } = SUBSTEP_RULE['newmark-average'];
    const damped = stepsPerPeriod('newmark-average', 1, { ...context, prewarp: false });
    expect(damped).toBeCloseTo(Math.sqrt((k * 1) / (2 * Math.PI * 0.05) + baseSteps ** 2), 12);
    // Undamped, an oscillator remembers the whole record: 20 cycles of a 1 s period.
    const undamped = stepsPerPeriod('newmark-average', 1, { damping: 0, durationS: 20, prewarp: false });
    expect(undamped).toBeCloseTo(Math.sqrt(k * 20 + baseSteps ** 2), 12);
    expect(stepsPerPeriod('piecewise-exact', 1, { ...context, prewarp: false })).toBe(MIN_STEPS_PER_PERIOD);
  });
});

describe('sub-steps per record step', () => {
  it('⌈dt·N/T⌉, one for a rigid oscillator', () => {
    expect(substepCount('newmark-average', 0, 0.01, context)).toBe(1);
    expect(substepCount('newmark-average', 1, 0.01, context)).toBe(1); // 0.66 → 1
    expect(substepCount('newmark-average', 0.1, 0.01, context)).toBe(7); // 6.6 → 7
    expect(substepCount('newmark-linear', 0.038, 0.01, context)).toBe(10); // 10 exactly, not 11
  });

  it('for rough records: ⌈9.13·ρ⌉ for Newmark, ⌈ρ/1.25⌉ for piecewise-exact, ρ = R√(1 + R²/2)', () => {
    // The derivation in recordSubsteps: (Ωh)²/12 ≤ 0.1% asks h ≤ dt/(ρ/√0.012).
    expect(SUBSTEP_RULE['newmark-average'].recordFactor).toBeCloseTo(1 / Math.sqrt(0.012), 12);
    expect(inputFrequency(2)).toBeCloseTo(Math.sqrt(12), 12); // the zigzag at the Nyquist frequency
    expect(inputFrequency(0.1)).toBeCloseTo(0.1 * Math.sqrt(1.005), 12);
    // A sine at Ω: R = 2 sin(Ωdt/2), and ρ is never below Ωdt = 2 arcsin(R/2).
    for (let r = 0.05; r <= 2; r += 0.05)
      expect(inputFrequency(r)).toBeGreaterThanOrEqual(2 * Math.asin(r / 2));
    expect(recordSubsteps('newmark-average', 0.62)).toBe(7); // 9.13 × 0.677 = 6.18
    expect(recordSubsteps('newmark-average', 2)).toBe(32); // 9.13 × 3.46 = 31.6
    expect(recordSubsteps('newmark-linear', 2)).toBe(32);
    expect(recordSubsteps('newmark-linear', 2, 2)).toBe(64); // × √(2ζ) = 2
    expect(recordSubsteps('newmark-average', 2, 2)).toBe(32);
    expect(recordSubsteps('piecewise-exact', 2)).toBe(3); // 3.46 / 1.25 = 2.77
    expect(recordSubsteps('newmark-average', 0)).toBe(1);
    expect(substepCount('newmark-average', 10, 0.02, { ...context, roughness: 2 })).toBe(32);
    // The issue's ramped 3.5 Hz sine at 0.02 s (R = 0.436): 5 sub-steps, where ⌈5R²⌉ gave 1.
    expect(recordSubsteps('newmark-average', 2 * Math.sin(Math.PI * 3.5 * 0.02))).toBe(5);
  });
});

describe('high damping', () => {
  it('multiplies every steps-per-period count by 2ζ above ζ = 1/2 (the fastest pole), linear acceleration by √(2ζ) more', () => {
    expect(fastestPoleRatio(0.5)).toBe(1);
    expect(fastestPoleRatio(2)).toBe(4);
    for (const z of [1.01, 2, 5, 10])
      expect(fastestPoleRatio(z)).toBeGreaterThanOrEqual(z + Math.sqrt(z * z - 1));
    expect(stepsPerPeriod('newmark-average', 1, { damping: 2, durationS: 20 })).toBe(66 * 4);
    expect(stepsPerPeriod('newmark-linear', 1, { damping: 2, durationS: 20 })).toBe(38 * 4 * 2);
    expect(stepsPerPeriod('piecewise-exact', 1, { damping: 0.3, durationS: 20 })).toBe(10);
    expect(dampingScale('newmark-average', 5)).toBe(1);
    // The Hermite search too: 10 × 4 steps a period of 0.01 s at 0.01 s.
    expect(executionPlan(400, 0.01, 0.01, 0.3, 0, 2)).toEqual({ steps: 40, composed: 10 });
  });
});

describe('executionPlan', () => {
  it('executes what the Hermite search needs and composes the rest, covering every sub-step', () => {
    for (const [substeps, periodS, dtS, roughness] of [
      [7, 0.1, 0.01, 0.3],
      [66, 0.01, 0.01, 0.3],
      [20, 10, 0.02, 2],
      [1, 1, 0.01, 0.1],
    ]) {
      const { steps, composed } = executionPlan(substeps, periodS, dtS, roughness);
      expect(steps).toBeLessThanOrEqual(substeps);
      expect(steps * composed).toBeGreaterThanOrEqual(substeps);
      expect(steps * (composed - 1)).toBeLessThan(substeps);
    }
    // T = 0.01 s at dt = 0.01 s: the search needs 10 steps a period, so 66 sub-steps run as 10 × 7.
    expect(executionPlan(66, 0.01, 0.01, 0.3)).toEqual({ steps: 10, composed: 7 });
    // A long period needs one executed step; roughness 2 asks ⌈R²⌉ = 4 for content near Nyquist.
    expect(executionPlan(20, 10, 0.02, 2)).toEqual({ steps: 4, composed: 5 });
    // Steps a period asked for by the user are executed, not composed.
    expect(executionPlan(66, 0.01, 0.01, 0.3, 66)).toEqual({ steps: 66, composed: 1 });
  });
});

describe('a ceiling on sub-steps', () => {
  it('refuses a record step a million sub-steps long for the period, in one line (the issue’s 1e300 s step)', () => {
    expect(() => substepCount('newmark-average', 0.05, 1e300, context)).toThrow(
      /^the record's time step Δt = 1e\+300 s would need .* sub-steps for T = 0\.05 s, more than a million: is the time step right\?/,
    );
    // A long but real step (1 s) at the shortest period (0.01 s) is far below the ceiling.
    expect(substepCount('newmark-average', 0.01, 1, context)).toBeLessThan(MAX_SUBSTEPS / 100);
  });
});

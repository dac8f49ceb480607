import { describe, expect, it } from 'vitest';
import { defaultPeriodsS } from '../../src/oscillator/grid.js';
import { ec8Spectrum } from '../../src/spectrum/design.js';
import { drawnTargetCurve } from '../../src/spectrum/target-curve.js';

describe('drawnTargetCurve', () => {
  // EN 1998-1:2004 §3.2.2.2, Type 1, ground C: S = 1.15, T_B = 0.2 s, T_C = 0.6 s, T_D = 2 s,
  // defined to 4 s here; the default grid steps from 3.98 s to 4.22 s.
  const ec8 = ec8Spectrum({ type: 1, ground: 'C', agG: 0.25 });
  const drawn = drawnTargetCurve(ec8, defaultPeriodsS());

  it('reaches the target’s own end (4 s), not the last grid period before it (3.98 s)', () => {
    expect(drawn.periodsS.at(-1)).toBe(4);
    expect(drawn.periodsS.every((t, i) => i === 0 || t > drawn.periodsS[i - 1])).toBe(true);
    expect(drawn.psaG).toEqual(drawn.periodsS.map((t) => ec8.psaG(t)));
  });

  it('keeps every grid period it covers and draws the corners to within 1.2% in period', () => {
    for (const t of defaultPeriodsS().filter((p) => p <= 4)) expect(drawn.periodsS).toContain(t);
    for (const corner of [0.2, 0.6, 2]) {
      const nearest = Math.min(...drawn.periodsS.map((t) => Math.abs(Math.log(t / corner))));
      expect(nearest).toBeLessThan(Math.log(1.012));
    }
    // The plateau 2.5·a_g·S·η = 2.5 × 0.25 × 1.15 = 0.71875 g (η = 1 at 5%) is drawn.
    expect(Math.max(...drawn.psaG)).toBeCloseTo(0.71875, 12);
  });

  it('draws nothing beyond the grid: a grid ending at 1 s ends the curve at 1 s', () => {
    expect(drawnTargetCurve(ec8, [0, 0.1, 1]).periodsS.at(-1)).toBe(1);
  });
});

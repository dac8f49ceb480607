import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import type { Hysteresis } from '../../src/inelastic/hysteresis.js';
import { referenceReductions } from '../../src/inelastic/r-mu-t.js';

// A spectrum flat at PSA = 1 g below its corner and at PSV = 1 m/s above: T_c = 2π·1/g = 0.6407 s.
const periodsS = [0, 0.05, 0.1, 0.2, 0.4, 0.6, 0.8, 1, 2, 4];
const sdM = periodsS.map((t) => {
  const omega = (2 * Math.PI) / t;
  return t === 0 ? 0 : Math.min(STANDARD_GRAVITY_MS2 / omega ** 2, 1 / omega);
});
const TC_S = (2 * Math.PI) / STANDARD_GRAVITY_MS2;

function spectra(model: Hysteresis = { kind: 'elastoplastic' }, scale = 1) {
  return {
    periodsS: Float64Array.from(periodsS),
    model,
    elastic: [{ damping: 0.05, sdM: Float64Array.from(sdM, (v) => v * scale), psaG: new Float64Array(10) }],
    curves: [1, 2, 4].map((ductility) => ({ damping: 0.05, ductility })),
  } as unknown as Parameters<typeof referenceReductions>[0];
}

describe('referenceReductions', () => {
  it('gives both relations for every μ > 1 over the periods above 0, Newmark–Hall with its corners on the grid', () => {
    const refs = referenceReductions(spectra());
    expect(refs.curves.map((c) => `${c.relation} ${c.ductility}`)).toEqual([
      'newmark-hall 2',
      'nassar-krawinkler 2',
      'newmark-hall 4',
      'nassar-krawinkler 4',
    ]);
    const nh4 = refs.curves[2];
    expect(nh4.periodsS[0]).toBe(0.05);
    expect(nh4.periodsS.at(-1)).toBe(4);
    expect(refs.cornerPeriodsS[0].tcS).toBeCloseTo(TC_S, 12);
    for (const corner of [0.125, TC_S, (TC_S * Math.sqrt(7)) / 4]) expect(nh4.periodsS).toContain(corner);
    expect(nh4.ry[nh4.periodsS.indexOf(TC_S)]).toBeCloseTo(4, 12);
    expect(refs.notes.join(' ')).toMatch(/Newmark and Hall \(1982\).*Nassar and Krawinkler \(1991\)/);
  });

  it('takes T_c when it is given, and leaves Newmark–Hall out where T_c is not above T_b', () => {
    expect(referenceReductions(spectra(), { tcS: 1.5 }).cornerPeriodsS[0].tcS).toBe(1.5);
    const short = referenceReductions(spectra(), { tcS: 0.1 });
    expect(short.curves.map((c) => c.relation)).toEqual(['nassar-krawinkler', 'nassar-krawinkler']);
    expect(short.notes[0]).toContain('not above T_b, not drawn');
  });

  it('says which Nassar–Krawinkler coefficients it used: interpolated, or clamped above α = 0.10', () => {
    const mid = referenceReductions(spectra({ kind: 'bilinear', alpha: 0.05 }));
    expect(mid.nassarKrawinkler.a).toBeCloseTo(0.925, 12);
    expect(mid.notes[1]).toContain('linear in α');
    const high = referenceReductions(spectra({ kind: 'bilinear', alpha: 0.3 }));
    expect(high.nassarKrawinkler).toMatchObject({ a: 0.8, b: 0.29, clamped: true });
    expect(high.notes[1]).toContain('the coefficients of α = 0.10 are used');
  });
});

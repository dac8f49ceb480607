import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import type { Spectrum } from '../../src/spectrum/spectrum.js';
import { codeSpectrum, fitTarget, parseTargetSpec } from '../../src/spectrum/target.js';

describe('parseTargetSpec', () => {
  it('reads an ASCE 7-16 target', () => {
    const spec = parseTargetSpec('asce7-16:sds=1.0,sd1=0.6,tl=8');
    if (spec.kind !== 'code') throw new Error('expected a code target');
    expect(spec.spectrum.code).toBe('asce7-16');
    expect(spec.spectrum.psaG(1)).toBeCloseTo(0.6, 12); // §11.4.6: S_D1/T
  });

  it('reads a Eurocode 8 target with and without damping', () => {
    const spec = parseTargetSpec('ec8:type=1,ground=C,ag=0.25');
    if (spec.kind !== 'code') throw new Error('expected a code target');
    expect(spec.spectrum.psaG(0.4)).toBeCloseTo(2.5 * 0.25 * 1.15, 12); // EN 1998-1 Eq. 3.3, Table 3.2 C
    const damped = parseTargetSpec('ec8:type=2,ground=a,ag=0.1,damping=10%');
    if (damped.kind !== 'code') throw new Error('expected a code target');
    expect(damped.spectrum.damping).toBe(0.1);
    expect(damped.spectrum.psaG(0.1)).toBeCloseTo(2.5 * 0.1 * Math.sqrt(10 / 15), 12); // Eq. 3.3, 3.6
  });

  it('reads an ASCE 7-22 two-period target (§11.4.5.2)', () => {
    const spec = parseTargetSpec('asce7-22:sds=1.0,sd1=0.6,tl=8');
    if (spec.kind !== 'code') throw new Error('expected a code target');
    expect(spec.spectrum.code).toBe('asce7-22');
    expect(spec.spectrum.parameters.form).toBe('two-period');
    expect(spec.spectrum.psaG(1)).toBeCloseTo(0.6, 12); // S_D1/T at 1 s
    expect(spec.spectrum.psaG(10)).toBeCloseTo((0.6 * 8) / 100, 12); // S_D1 T_L/T² beyond T_L
  });

  it('leaves an ASCE 7-22 multi-period target (§11.4.5.1) as the file to read', () => {
    expect(parseTargetSpec('ASCE7-22: multi-period = site/mp.csv')).toEqual({
      kind: 'multi-period',
      path: 'site/mp.csv',
    });
  });

  it('refuses an ASCE 7-22 target mixing or missing its forms', () => {
    expect(() => parseTargetSpec('asce7-22:multi-period=mp.csv,sds=1')).toThrow(
      "target 'asce7-22:multi-period=mp.csv,sds=1': sds= does not go with a multi-period table",
    );
    expect(() => parseTargetSpec('asce7-22:multi-period=')).toThrow(/multi-period= needs a file/);
    expect(() => parseTargetSpec('asce7-22:sds=1.0,sd1=0.6')).toThrow(/tl= is required/);
    expect(() => parseTargetSpec('asce7-22:damping=5%')).toThrow(
      "unknown key 'damping'; accepted: sds, sd1, tl, multi-period",
    );
    expect(() => parseTargetSpec('asce7-16:multi-period=mp.csv')).toThrow(/unknown key 'multi-period'/);
    expect(() => codeSpectrum('asce7-22', { 'multi-period': 'mp.csv' }, (key) => key)).toThrow(
      /use codeTarget/,
    );
  });

  it('takes anything else as a table path', () => {
    expect(parseTargetSpec('spectra/site.csv')).toEqual({ kind: 'table', path: 'spectra/site.csv' });
  });

  it('refuses bad keys and values', () => {
    expect(() => parseTargetSpec('asce7-16:sds=1.0,sd1=0.6')).toThrow(/tl= is required/);
    expect(() => parseTargetSpec('asce7-16:sds=1.0,sd1=0.6,tl=8,x=1')).toThrow(/unknown key 'x'/);
    expect(() => parseTargetSpec('asce7-16:sds=a,sd1=0.6,tl=8')).toThrow(/not a number/);
    expect(() => parseTargetSpec('ec8:type=3,ground=C,ag=0.25')).toThrow(/1 or 2/);
    expect(() => parseTargetSpec('ec8:type=1,ground=S1,ag=0.25')).toThrow(/special studies/);
    expect(() => parseTargetSpec('ec8:type=1,ground=C,ag=0.25,damping=5')).toThrow(/percentage/);
  });
});

describe('fitTarget', () => {
  // A spectrum at exactly twice the ASCE 7-16 target (S_DS 1.0 g, S_D1 0.6 g, T_L 8 s, §11.4.6)
  // at 5%: the least-squares factor in ln PSA is 1/2 by construction, and every ratio is 1 after it.
  const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
  const periodsS = Float64Array.from([0, 0.2, 0.5, 1, 2, 20]);
  const psaMS2 = periodsS.map((t) => (t > 10 ? 1 : 2 * target.psaG(t) * STANDARD_GRAVITY_MS2));
  const zeros = () => new Float64Array(periodsS.length);
  const spectrum: Spectrum = {
    record: { name: 'r', source: 'r', npts: 10, dtS: 0.01, pgaMS2: psaMS2[0], processing: [] },
    method: 'newmark-average',
    periodsS,
    curves: [{ damping: 0.05, sdM: zeros(), psvMS: zeros(), psaMS2, svMS: zeros(), saMS2: zeros() }],
    oscillatorSteps: 0,
  };

  it('returns the fit as data, the target PSA null where it does not reach', () => {
    const { fit, spectrum: same } = fitTarget(spectrum, target, { rangeS: [0.2, 2] });
    expect(fit.factor).toBeCloseTo(0.5, 12);
    expect(fit.meanRatio).toBeCloseTo(1, 12);
    expect(fit.applied).toBe(false);
    expect(same).toBe(spectrum);
    expect(fit.psaG[3]).toBeCloseTo(0.6, 12); // S_D1/T at 1 s
    expect(fit.psaG[5]).toBeCloseTo((0.6 * 8) / 400, 12); // S_D1 T_L/T² at 20 s (Eq. 11.4-8)
  });

  it('scales the spectrum by the factor with apply', () => {
    const { fit, spectrum: scaled } = fitTarget(spectrum, target, { rangeS: [0.2, 2], apply: true });
    expect(fit.applied).toBe(true);
    expect(scaled.curves[0].psaMS2[3]).toBeCloseTo(psaMS2[3] / 2, 9);
  });
});

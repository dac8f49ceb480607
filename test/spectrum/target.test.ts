import { describe, expect, it } from 'vitest';
import { parseTargetSpec } from '../../src/spectrum/target.js';

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

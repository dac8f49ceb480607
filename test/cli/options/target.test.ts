import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { type TargetCliOptions, targetFromOptions } from '../../../src/cli/options/target.js';
import { createRecord } from '../../../src/record/record.js';
import { responseSpectrum } from '../../../src/spectrum/spectrum.js';
import { fitTarget } from '../../../src/spectrum/target.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-target-options-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

// An invented record: a decaying 2 Hz sine at 0.01 s.
const record = createRecord({
  name: 'invented',
  dtS: 0.01,
  accelMS2: Float64Array.from({ length: 500 }, (_, i) => Math.exp(-i / 200) * Math.sin(0.04 * Math.PI * i)),
});
const spectrum = responseSpectrum(record, { periodsS: [0, 0.2, 0.5, 1], dampings: [0.05] });

describe('targetFromOptions', () => {
  it('is undefined without --target, and refuses the scaling options without it', () => {
    expect(targetFromOptions({})).toBeUndefined();
    expect(() => targetFromOptions({ scaleRange: '0.2:1' })).toThrow('--scale-range needs --target');
    expect(() => targetFromOptions({ applyScale: true })).toThrow('--apply-scale needs --target');
  });

  it('reads a code target and a table file', () => {
    const code = targetFromOptions({ target: 'asce7-16:sds=1.0,sd1=0.6,tl=8' })!;
    expect(code.apply).toBe(false);
    expect(code.spectrum.psaG(1)).toBeCloseTo(0.6, 12); // S_D1/T at 1 s (ASCE 7-16 §11.4.6)
    const file = join(folder, 'site.csv');
    writeFileSync(file, 'period_s,psa_g\n0.1,0.5\n3,0.2\n');
    expect(targetFromOptions({ target: file })!.spectrum.psaG(3)).toBe(0.2);
  });
});

describe('the target choice', () => {
  const fitWith = (options: TargetCliOptions) => {
    const choice = targetFromOptions(options)!;
    return fitTarget(spectrum, choice.spectrum, choice);
  };

  it('fits over --scale-range, and scales the spectrum only with --apply-scale', () => {
    const asce = { target: 'asce7-16:sds=1.0,sd1=0.6,tl=8', scaleRange: '0.2:1' };
    const fitted = fitWith(asce);
    expect(fitted.fit?.rangeS).toEqual([0.2, 1]);
    expect(fitted.fit?.applied).toBe(false);
    expect(fitted.spectrum).toBe(spectrum);
    const scaled = fitWith({ ...asce, applyScale: true });
    const factor = scaled.fit!.factor;
    expect(scaled.fit?.applied).toBe(true);
    expect(scaled.spectrum.curves[0].psaMS2[2]).toBeCloseTo(spectrum.curves[0].psaMS2[2] * factor, 9);
    expect(() => targetFromOptions({ ...asce, scaleRange: '1:0.2' })).toThrow(/use a:b in seconds/);
  });
});

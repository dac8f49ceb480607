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

describe('targetFromOptions with ASCE 7-22', () => {
  it('reads the two-period target and names no file', () => {
    const choice = targetFromOptions({ target: 'asce7-22:sds=1.0,sd1=0.6,tl=8' })!;
    expect(choice.spectrum.code).toBe('asce7-22');
    expect(choice.spectrum.psaG(2)).toBeCloseTo(0.3, 12); // §11.4.5.2: S_D1/T = 0.6/2
    expect(choice.files).toEqual([]);
  });

  it('reads the multi-period table the target names, and names it as an input', () => {
    const file = join(folder, 'mp.csv');
    writeFileSync(file, '# invented\nperiod_s,sa_g\n0,0.4\n0.2,1.0\n1,0.8\n4,0.2\n');
    const choice = targetFromOptions({ target: `asce7-22:multi-period=${file}` })!;
    expect(choice.spectrum.parameters.form).toBe('multi-period');
    expect(choice.spectrum.psaG(1)).toBe(0.8); // a row of the table
    expect(choice.files).toEqual([file]);
    expect(targetFromOptions({ target: file })!.files).toEqual([file]); // a plain table too
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

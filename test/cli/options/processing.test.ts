import { describe, expect, it } from 'vitest';
import {
  parseBaseline,
  parseFilter,
  parseTaper,
  processingPlanFromOptions,
} from '../../../src/cli/options/processing.js';

describe('processing options', () => {
  it('--baseline by name or order', () => {
    expect(parseBaseline('mean')).toBe(0);
    expect(parseBaseline('Cubic')).toBe(3);
    expect(parseBaseline('2')).toBe(2);
    expect(() => parseBaseline('4')).toThrow(/mean, linear, quadratic or cubic/);
  });

  it('--taper as a percentage at each end', () => {
    expect(parseTaper('5%')).toBeCloseTo(0.05, 15);
    expect(parseTaper('2.5 %')).toBeCloseTo(0.025, 15);
    expect(() => parseTaper('5')).toThrow(/percentage/);
    expect(() => parseTaper('60%')).toThrow(/50%/);
  });

  it('--filter kinds, corners and orders', () => {
    expect(parseFilter('highpass:0.1:4')).toEqual({ kind: 'highpass', order: 4, lowCornerHz: 0.1 });
    expect(parseFilter('lowpass:25')).toEqual({ kind: 'lowpass', order: 4, highCornerHz: 25 });
    expect(parseFilter('bandpass:0.1-25:2')).toEqual({
      kind: 'bandpass',
      order: 2,
      lowCornerHz: 0.1,
      highCornerHz: 25,
    });
    expect(() => parseFilter('bandpass:25-0.1')).toThrow(/low corner must be below/);
    expect(() => parseFilter('highpass:0.1:0')).toThrow(/order/);
    expect(() => parseFilter('highpass:0.1:-2')).toThrow(/order/);
    expect(() => parseFilter('highpass:0')).toThrow(/positive frequency/);
    expect(() => parseFilter('notch:5')).toThrow(/unknown filter/);
  });

  it('--resample refuses a step ≤ 0', () => {
    expect(processingPlanFromOptions({ resample: '0.005' })).toEqual({ resampleDtS: 0.005 });
    expect(() => processingPlanFromOptions({ resample: '0' })).toThrow(
      "--resample must be a positive number, got '0'",
    );
    expect(() => processingPlanFromOptions({ resample: '-1' })).toThrow(/--resample must be a positive/);
  });

  it('an empty set of options is an empty plan', () => {
    expect(processingPlanFromOptions({})).toEqual({});
  });
});

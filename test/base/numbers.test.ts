import { describe, expect, it } from 'vitest';
import { formatNumber, formatRange, formatSignificant } from '../../src/base/numbers.js';

// The rule is ours (src/base/numbers.ts); the expected texts are worked by hand.
describe('formatNumber', () => {
  it('keeps four significant figures and drops trailing zeros', () => {
    expect(formatNumber(0.2046088289466012)).toBe('0.2046');
    expect(formatNumber(3.950378013566643)).toBe('3.95');
    expect(formatNumber(0.41999999999999993)).toBe('0.42');
    expect(formatNumber(2)).toBe('2');
    expect(formatNumber(-1.4725404276241238)).toBe('-1.473');
    expect(formatNumber(123456.7)).toBe('123500');
  });

  it('takes another count of figures when asked', () => {
    expect(formatNumber(1.4725404276241238, 3)).toBe('1.47');
    expect(formatNumber(1 / 256, 6)).toBe('0.00390625');
  });

  it('writes plain decimals from 1e-4 to below 1e6 and an exponent outside', () => {
    expect(formatNumber(1e-4)).toBe('0.0001');
    expect(formatNumber(0.000012346)).toBe('1.235e-5');
    expect(formatNumber(999_940)).toBe('999900');
    expect(formatNumber(2_500_000)).toBe('2.5e+6');
  });

  it('writes 0, -0 and non-finite values plainly', () => {
    expect(formatNumber(0)).toBe('0');
    expect(formatNumber(-0)).toBe('0');
    expect(formatNumber(Number.POSITIVE_INFINITY)).toBe('Infinity');
    expect(formatNumber(Number.NaN)).toBe('NaN');
  });
});

describe('formatSignificant', () => {
  it('keeps the trailing zeros of four figures', () => {
    expect(formatSignificant(0.42)).toBe('0.4200');
    expect(formatSignificant(1.47)).toBe('1.470');
    expect(formatSignificant(12345)).toBe('12350');
    expect(formatSignificant(0.00001234)).toBe('1.234e-5');
    expect(formatSignificant(0)).toBe('0');
  });
});

describe('formatRange', () => {
  it('writes both ends by the rule, with the unit once', () => {
    expect(formatRange(0.2046088289466012, 1.4725404276241238, 's', 3)).toBe('0.205–1.47 s');
    expect(formatRange(0.01, 3.950378013566643, 's', 3)).toBe('0.01–3.95 s');
    expect(formatRange(1, 2, '')).toBe('1–2');
  });
});

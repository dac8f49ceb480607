import { describe, expect, it } from 'vitest';
import { broadeningFromOptions, buildingFromOptions } from '../../../src/cli/options/building.js';

describe('buildingFromOptions', () => {
  it('reads the period, the modal factor and the damping (5% unless given)', () => {
    expect(buildingFromOptions({ buildingPeriod: '0.5', modalFactor: '1.3' })).toEqual({
      periodS: 0.5,
      damping: 0.05,
      modalFactor: 1.3,
    });
    expect(
      buildingFromOptions({ buildingPeriod: '1', modalFactor: '1', buildingDamping: '2%' }).damping,
    ).toBe(0.02);
  });

  it.each([
    [{ modalFactor: '1.3' }, '--building-period <seconds> is required'],
    [{ buildingPeriod: '0.5' }, /^--modal-factor <Γφ> is required \(1 is the base of a rigid building/],
    [
      { buildingPeriod: '0', modalFactor: '1' },
      "--building-period must be a number of seconds ≥ 0.0001, got '0'",
    ],
    [{ buildingPeriod: 'Infinity', modalFactor: '1' }, /got 'Infinity'/],
    [{ buildingPeriod: '0.5', modalFactor: ' ' }, "--modal-factor must be a number, got ' '"],
    [
      { buildingPeriod: '0.5', modalFactor: '1', buildingDamping: '2%,5%' },
      '--building-damping takes one ratio below 1',
    ],
    [
      { buildingPeriod: '0.5', modalFactor: '1', buildingDamping: '100%' },
      '--building-damping takes one ratio below 1',
    ],
  ])('refuses %o', (options, message) => {
    expect(() => buildingFromOptions(options)).toThrow(message);
  });
});

describe('broadeningFromOptions', () => {
  it('is null when absent, ±15% when bare, else the fraction given', () => {
    expect(broadeningFromOptions(undefined)).toBeNull();
    expect(broadeningFromOptions(false)).toBeNull();
    expect(broadeningFromOptions(true)).toBe(0.15);
    expect(broadeningFromOptions('0.1')).toBe(0.1);
    expect(broadeningFromOptions('0')).toBe(0);
  });

  it('refuses a value outside 0 ≤ b < 1', () => {
    for (const value of ['1', '-0.1', '', 'wide']) {
      expect(() => broadeningFromOptions(value)).toThrow(
        `--broaden must be a fraction 0 ≤ b < 1, got '${value}'`,
      );
    }
  });
});

import { describe, expect, it } from 'vitest';
import {
  ACCELERATION_UNITS,
  gFromMS2,
  LENGTH_UNITS,
  parseAccelerationUnit,
  parseLengthUnit,
  STANDARD_GRAVITY_MS2,
} from '../../src/base/units.js';
import { UNIT_FACTOR } from '../helpers/fuzz-records.js';

// Factors from their definitions (NIST SP 811, Appendix B; the acceleration table is written out
// once, in test/helpers/fuzz-records.ts): 1 in = 0.0254 m and 1 ft = 0.3048 m
// exactly (international inch and foot, 1959); 1 Gal = 1 cm/s²; standard gravity 9.80665 m/s²
// exactly (3rd CGPM, 1901).
describe('unit factors', () => {
  it('standard gravity is 9.80665 m/s² exactly', () => {
    expect(STANDARD_GRAVITY_MS2).toBe(9.80665);
    expect(ACCELERATION_UNITS.g).toBe(9.80665);
  });

  it('acceleration factors to m/s² follow the definitions of the units', () => {
    expect(ACCELERATION_UNITS).toEqual(UNIT_FACTOR);
  });

  it('length factors to metres follow the definitions of the units', () => {
    expect(LENGTH_UNITS).toEqual({ m: 1, cm: 0.01, mm: 0.001, in: 0.0254, ft: 0.3048 });
    expect(LENGTH_UNITS.ft / LENGTH_UNITS.in).toBeCloseTo(12, 12); // 12 in to the foot
  });
});

describe('parseAccelerationUnit', () => {
  it('accepts the names, the ^2 and ² spellings, any case and surrounding blanks', () => {
    expect(parseAccelerationUnit('g')).toBe('g');
    expect(parseAccelerationUnit(' CM/S^2 ')).toBe('cm/s2');
    expect(parseAccelerationUnit('m/s²')).toBe('m/s2');
    expect(parseAccelerationUnit('Gal')).toBe('gal');
    expect(parseAccelerationUnit('in/s^2')).toBe('in/s2');
    // Every unit per second squared in its three spellings (common practice in record headers).
    for (const unit of Object.keys(ACCELERATION_UNITS).filter((name) => name.endsWith('/s2'))) {
      for (const spelling of ['s2', 's^2', 's²']) {
        expect(parseAccelerationUnit(unit.replace(/s2$/, spelling).toUpperCase())).toBe(unit);
      }
    }
  });

  it('never guesses: a missing unit is refused, naming --units and the accepted names', () => {
    for (const missing of [undefined, '', '   ']) {
      expect(() => parseAccelerationUnit(missing)).toThrow(
        "the record's units are required (--units); accepted: g, m/s2, cm/s2, gal, mm/s2, in/s2, ft/s2",
      );
    }
  });

  it('refuses an unknown unit, quoting it, and the names of the object prototype', () => {
    expect(() => parseAccelerationUnit('furlong/s2')).toThrow(
      /^unknown acceleration unit 'furlong\/s2'; accepted: g,/,
    );
    // Keys every object has are no units (a plain `in` test would take them).
    for (const name of ['toString', 'constructor', '__proto__', 'hasOwnProperty', 's^2']) {
      expect(() => parseAccelerationUnit(name)).toThrow(/unknown acceleration unit/);
    }
  });
});

describe('parseLengthUnit', () => {
  it('accepts the names in any case and refuses others, listing the accepted', () => {
    expect(parseLengthUnit(' MM ')).toBe('mm');
    expect(parseLengthUnit('ft')).toBe('ft');
    expect(() => parseLengthUnit('yd')).toThrow("unknown length unit 'yd'; accepted: m, cm, mm, in, ft");
    for (const name of ['constructor', '__proto__'])
      expect(() => parseLengthUnit(name)).toThrow(/unknown length unit/);
  });
});

describe('gFromMS2', () => {
  it('gives back the value a record in g was read with, where a/g does not', () => {
    // 0.42·9.80665/9.80665 is not 0.42 in binary floating point (IEEE 754 rounding).
    const readMS2 = 0.42 * STANDARD_GRAVITY_MS2;
    expect(readMS2 / STANDARD_GRAVITY_MS2).not.toBe(0.42);
    expect(gFromMS2(readMS2)).toBe(0.42);
  });

  it('converts back to the same m/s² and stays within an ulp of a/g', () => {
    for (const given of [0.3, 1.234567, 1, 3.14159e-4, 4.2000001]) {
      const a = given * STANDARD_GRAVITY_MS2;
      const g = gFromMS2(a);
      expect(g * STANDARD_GRAVITY_MS2).toBe(a);
      expect(Math.abs(g - a / STANDARD_GRAVITY_MS2)).toBeLessThanOrEqual(
        Number.EPSILON * (a / STANDARD_GRAVITY_MS2),
      );
    }
    expect(gFromMS2(0)).toBe(0);
    // A value no g value converts to exactly keeps a/g.
    expect(gFromMS2(42.000001)).toBe(42.000001 / STANDARD_GRAVITY_MS2);
  });
});

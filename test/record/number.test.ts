/**
 * parseNumber reads short decimals in one multiplication or division by an exact power of ten
 * and everything else through a regular expression and Number(). Both ways must give Number()'s
 * own output, to the bit (-0 included), for every text the regular expression allows, and NaN
 * for every other text.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { NUMBER, parseNumber } from '../../src/record/number.js';
import { FUZZ_SEED, runs } from '../helpers/fuzz-budget.js';

/** A decimal as people print it: sign, digits, a point somewhere or none, an exponent or none. */
const decimal = fc
  .record({
    sign: fc.constantFrom('', '-', '+'),
    zeros: fc.integer({ min: 0, max: 4 }),
    digits: fc.stringMatching(/^[0-9]{1,18}$/),
    point: fc.option(fc.nat(), { nil: undefined }),
    exponent: fc.option(
      fc.record({
        letter: fc.constantFrom('e', 'E'),
        sign: fc.constantFrom('', '-', '+'),
        value: fc.integer({ min: 0, max: 40 }),
        pad: fc.boolean(),
      }),
      { nil: undefined },
    ),
  })
  .map(({ sign, zeros, digits, point, exponent }) => {
    let body = '0'.repeat(zeros) + digits;
    if (point !== undefined) {
      const at = point % (body.length + 1);
      body = `${body.slice(0, at)}.${body.slice(at)}`;
    }
    const e = exponent
      ? `${exponent.letter}${exponent.sign}${exponent.pad ? String(exponent.value).padStart(2, '0') : exponent.value}`
      : '';
    return sign + body + e;
  });

describe('parseNumber', () => {
  it("gives Number()'s own value, to the bit, for generated decimals", () => {
    fc.assert(
      fc.property(decimal, (text) => {
        expect(Object.is(parseNumber(text), Number(text))).toBe(true);
      }),
      { seed: FUZZ_SEED + 20, numRuns: runs(20000, 10) },
    );
  });

  it("gives Number()'s own value for decimals of 15 to 18 digits, where one step would round twice", () => {
    const long = fc
      .record({ digits: fc.stringMatching(/^[1-9][0-9]{14,17}$/), point: fc.nat() })
      .map(({ digits, point }) => {
        const at = 1 + (point % (digits.length - 1));
        return `${digits.slice(0, at)}.${digits.slice(at)}`;
      });
    fc.assert(
      fc.property(long, (text) => {
        expect(Object.is(parseNumber(text), Number(text))).toBe(true);
      }),
      { seed: FUZZ_SEED + 21, numRuns: runs(20000, 10) },
    );
  });

  it("gives Number()'s own value at the edges of the one-step reading", () => {
    for (const text of [
      '0',
      '-0',
      '-0.000',
      '+0e5',
      '-0e-30',
      '.5',
      '5.',
      '+.5e+3',
      '00000000000000000001.5',
      '999999999999999', // 15 digits: one step
      '9999999999999999', // 16 digits: the long way
      '9007199254740993', // 2⁵³ + 1, which no double holds
      // 17 digits whose integer rounds before the division (found by a search against Number()):
      '97.333344424269177',
      '921742781.82947087',
      '999999999999999e22',
      '999999999999999e23',
      '123456789012345e-22',
      '123456789012345e-23',
      '1e22',
      '1e23',
      '1e-22',
      '1e-23',
      '0.1',
      '0.3',
      '12.3450',
      '1.23456789e-02',
      '4.35e-1',
      '2.2250738585072014e-308',
      '1e0005',
    ])
      expect([text, Object.is(parseNumber(text), Number(text))]).toEqual([text, true]);
  });

  it('reads D exponents as e exponents (Fortran, common practice)', () => {
    for (const [text, same] of [
      ['1.5D-03', '1.5e-03'],
      ['-2d+2', '-2e+2'],
      ['.5D1', '.5e1'],
    ])
      expect(parseNumber(text)).toBe(Number(same));
  });

  it('gives NaN for texts that are not numbers, and for overflow (the reader refuses them)', () => {
    for (const text of ['', '+', '-', '.', 'e5', '1e', '1e+', '1e-', '--1', '+-1', '1.2.3', '1..2', '1e5.5'])
      expect(parseNumber(text)).toBeNaN();
    for (const text of ['1e999', '-1e400', 'Infinity', 'NaN', '0x10', ' 1', '1 ', '1_000', '١'])
      expect(parseNumber(text)).toBeNaN();
  });
});

describe('NUMBER in linear time', () => {
  // The pattern before it was rewritten: `\d+\.?\d*` lets two runs of digits meet anywhere, so a
  // long run of digits that is no number was tried in quadratic time (a 1 MB field took minutes).
  const QUADRATIC = /^[+-]?(?:\d+\.?\d*|\.\d+)(?:[eEdD][+-]?\d+)?$/;

  it('accepts exactly the texts the earlier pattern accepted (property test)', () => {
    const text = fc.stringMatching(/^[0-9.eEdD+\-x ]{0,12}$/);
    fc.assert(
      fc.property(text, (t) => NUMBER.test(t) === QUADRATIC.test(t)),
      { seed: FUZZ_SEED, numRuns: runs(2000) },
    );
  });

  it('refuses a field of 200,000 digits and a letter at once', () => {
    // The bound is generous on purpose (speed is measured in bench/, not here): the quadratic
    // pattern took about 40 s on this field (10 s on 100,000 digits); the linear one takes milliseconds.
    for (const field of [`${'1'.repeat(200_000)}x`, `${'1'.repeat(200_000)}e`, `1.${'1'.repeat(200_000)}.`]) {
      const start = performance.now();
      expect(NUMBER.test(field)).toBe(false);
      expect(performance.now() - start).toBeLessThan(2000);
    }
  });
});

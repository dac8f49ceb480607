import { describe, expect, it } from 'vitest';
import {
  columnNameUnit,
  type HeaderKeys,
  headerUnit,
  scanHeaderLine,
  timeNameInMs,
} from '../../src/record/header.js';

// Header lines below are invented; the spellings are the ones header.ts documents.

function keys(...lines: string[]): HeaderKeys {
  const found: HeaderKeys = {};
  for (const [i, text] of lines.entries()) scanHeaderLine(text, i + 1, found);
  return found;
}

describe('header keys', () => {
  it.each([
    ['NPTS= 4000, DT= 0.005 SEC', 0.005, 4000],
    ['dt = 0.01 s', 0.01, undefined],
    ['points 3000', undefined, 3000],
    ['UNITS CM/S2, DT 0.01 S, 4001 POINTS, 8 PER LINE', 0.01, 4001],
    ['# seed 7, dt 0.02 s, PGA 0.3 g', 0.02, undefined],
    ['time step: 5 ms; samples: 12', 0.005, 12], // 5 ms = 0.005 s
    ['sample interval 1.0D-2', 0.01, undefined],
  ])('%s', (line, dtS, points) => {
    const k = keys(line);
    expect(k.dtS?.value).toBe(dtS);
    expect(k.points?.value).toBe(points);
  });

  it('reads units only after a units key, not from a PGA stated in g', () => {
    expect(keys('units: g').units?.value).toBe('g');
    expect(keys('UNITS CM/S2').units?.value).toBe('cm/s2');
    expect(keys('Units of acceleration (in/sec2)').units?.value).toBe('in/s2');
    expect(keys('unit = gal').units?.value).toBe('gal');
    expect(keys('PGA 0.38 g, peak at 8 s').units).toBeUndefined();
    expect(keys('dt 0.01 s, accel in m/s/s').units).toBeUndefined(); // no units key
  });

  it('keeps the first statement of each key and its line', () => {
    const k = keys('title', 'dt = 0.01 s', 'dt = 0.02 s');
    expect(k.dtS).toEqual({ value: 0.01, line: 2, text: 'dt = 0.01 s' });
  });

  it('does not take words that merely contain a key', () => {
    expect(keys('width 12 mm, widths 0.5').dtS).toBeUndefined();
    expect(keys('checkpoints 12').points).toBeUndefined();
  });
});

describe('units in names', () => {
  it('maps header spellings onto ours', () => {
    expect(headerUnit('CM/SEC2')).toBe('cm/s2');
    expect(headerUnit('m/s/s')).toBe('m/s2');
    expect(headerUnit('ft/s^2')).toBe('ft/s2');
  });

  it('reads the unit a value column is named in, and a time column in ms', () => {
    expect(columnNameUnit('accel_g')).toBe('g'); // quakesweep synth writes this
    expect(columnNameUnit('acc (cm/s2)')).toBe('cm/s2');
    expect(columnNameUnit('NS')).toBeUndefined();
    expect(columnNameUnit('time_s')).toBeUndefined();
    expect(timeNameInMs('time_ms')).toBe(true);
    expect(timeNameInMs('t (ms)')).toBe(true);
    expect(timeNameInMs('time_s')).toBe(false);
  });
});

describe('long header lines', () => {
  it('still reads a separator, an "of acceleration" and a bracket between key and value', () => {
    expect(keys('units = ( g )').units?.value).toBe('g');
    expect(keys('UNITS:  of acceleration [cm/s2]').units?.value).toBe('cm/s2');
    expect(keys('units   g').units?.value).toBe('g');
    expect(keys('dt :0.01 s').dtS?.value).toBe(0.01);
  });

  it('scans runs of a million blanks or digits after a key at once', () => {
    // Generous bound on purpose (speed is measured in bench/): the earlier `\s*[=:]?\s*…\s*` took
    // 13 s on 4,000 blanks after `units` (cubic), the linear patterns take milliseconds on 999,000.
    const run = 999_000;
    for (const line of [
      `units${' '.repeat(run)}x`,
      `dt${' '.repeat(run)}x`,
      `dt=${'1'.repeat(run)}x`,
      `${'1'.repeat(run)} pointsx`,
      `acc${' '.repeat(run)}(`,
    ]) {
      const start = performance.now();
      const found = keys(line);
      expect(performance.now() - start).toBeLessThan(2000);
      expect(found.units).toBeUndefined();
    }
  });
});

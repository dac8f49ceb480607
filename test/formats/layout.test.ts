import { describe, expect, it } from 'vitest';
import { cautionLines } from '../../src/base/caution.js';
import {
  alignRight,
  assumptionLines,
  columnsByDamping,
  csvText,
  dampingLabel,
  formatPeriod,
  periodTable,
  pgaText,
  summaryRows,
  terminalText,
} from '../../src/formats/layout.js';
import { logSpaced } from '../../src/oscillator/grid.js';
import { expectAligned, expectCaution, readCsv } from '../helpers/outputs.js';

describe('labels', () => {
  it('writes a damping ratio as a percentage without float noise', () => {
    expect(dampingLabel(0.05)).toBe('5%');
    expect(dampingLabel(0.07)).toBe('7%'); // 0.07 × 100 = 7.000000000000001 in binary
    expect(dampingLabel(0.125)).toBe('12.5%');
  });

  it('writes a period and PGA in g to four significant figures, trailing zeros dropped', () => {
    expect(formatPeriod(0)).toBe('0');
    expect(formatPeriod(0.020137)).toBe('0.02014');
    expect(formatPeriod(1.4700001)).toBe('1.47');
    expect(formatPeriod(10)).toBe('10');
    expect(pgaText(0.38 * 9.80665)).toBe('PGA 0.38 g'); // standard gravity 9.80665 m/s² (CGPM 1901)
    expect(pgaText(0.123456 * 9.80665)).toBe('PGA 0.1235 g');
  });
});

describe('csvText', () => {
  const periods = Float64Array.of(0, 0.5, 1);
  const columns = [
    { name: 'a_g@5%', at: (p: number) => [0.1, 0.2, 0.3][p] },
    { name: 'b_m', at: (p: number) => (p === 1 ? null : p * 1e-7) },
  ];
  const text = csvText(['record: yard\nnorth (invented)', 'method: test'], periods, columns);

  it('reads back to the same numbers, null as an empty cell, under the header', () => {
    const csv = readCsv(text);
    expect(csv.header).toEqual(['period_s', 'frequency_hz', 'a_g@5%', 'b_m']);
    expect(csv.rows).toEqual([
      // f = 1/T: empty at T = 0, 1/0.5 = 2 Hz, 1/1 = 1 Hz (by hand).
      [0, null, 0.1, 0],
      [0.5, 2, 0.2, null],
      [1, 1, 0.3, 2e-7],
    ]);
  });

  it('opens with the caution, then each note on one line', () => {
    expectCaution(text, '# ');
    expect(readCsv(text).notes.slice(-2)).toEqual(['record: yard north (invented)', 'method: test']);
  });

  it('refuses a value that is not finite, naming its column and period', () => {
    const broken = [{ name: 'psa_g@2%', at: (p: number) => (p === 2 ? Number.POSITIVE_INFINITY : 1) }];
    expect(() => csvText([], periods, broken)).toThrow(/not a finite number \(psa_g@2% at 1 s = Infinity\)/);
  });
});

describe('terminal text', () => {
  it('puts the caution on ! lines of at most 94 characters, a blank line, then the body', () => {
    const text = terminalText(['body']);
    expectCaution(text, '! ');
    const lines = text.split('\n');
    const n = cautionLines(92).length;
    for (const line of lines.slice(0, n)) expect(line.length).toBeLessThanOrEqual(94);
    expect(lines.slice(n)).toEqual(['', 'body', '']);
  });

  it('right-aligns cells to their widths, one space apart', () => {
    expect(alignRight(['a', 'bb', 'c'], [3, 3, 1])).toBe('  a  bb c');
  });

  it('lists the assumptions under their heading, wrapped at 92 columns with a hanging indent', () => {
    const long = Array.from({ length: 40 }, (_, i) => `word${i}`).join(' ');
    const lines = assumptionLines(['short one', long]);
    expect(lines.slice(0, 3)).toEqual(['', 'method and assumptions', '  - short one']);
    expect(lines[3].startsWith('  - word0 ')).toBe(true);
    for (const line of lines.slice(4)) expect(line.startsWith('    word')).toBe(true);
    for (const line of lines) expect(line.length).toBeLessThanOrEqual(92);
    expect(lines.slice(3).join(' ').replace(/\s+/g, ' ').replace(' - ', '').trim()).toBe(long);
  });
});

describe('periodTable', () => {
  const periods = Float64Array.of(0, 0.02, 0.5, 3);
  const curves = [
    { damping: 0.02, psa: [0.38, 0.4, 1.234567, 0.0123] },
    { damping: 0.05, psa: [0.38, 0.39, 0.9, Number.NaN] },
  ];
  const columns = columnsByDamping(curves, [
    { name: 'psa_g', heading: 'PSA g', width: 10, at: (c, p) => c.psa[p] },
    { name: 'ratio', heading: 'ratio', width: 10, at: (c, p) => (Number.isNaN(c.psa[p]) ? null : 1) },
    { name: 'hidden_g', at: () => 0 },
  ]);

  it('names each column of a curve with its damping', () => {
    expect(columns.map((c) => c.name)).toEqual([
      'psa_g@2%',
      'ratio@2%',
      'hidden_g@2%',
      'psa_g@5%',
      'ratio@5%',
      'hidden_g@5%',
    ]);
  });

  it('shows the columns with a width, aligned under their headings, 4 significant digits, - for null', () => {
    const [heading, ...rows] = periodTable(periods, columns);
    expect(heading.split(/ {2,}/).filter(Boolean)).toEqual([
      'T (s)',
      'PSA g @2%',
      'ratio @2%',
      'PSA g @5%',
      'ratio @5%',
    ]);
    expectAligned(heading, rows);
    expect(rows.map((row) => row.trim().split(/ +/))).toEqual([
      ['0', '0.3800', '1.000', '0.3800', '1.000'],
      ['0.02', '0.4000', '1.000', '0.3900', '1.000'],
      ['0.5', '1.235', '1.000', '0.9000', '1.000'],
      ['3', '0.01230', '1.000', 'NaN', '-'],
    ]);
  });
});

describe('summaryRows', () => {
  it('keeps every period of a short grid', () => {
    expect(summaryRows(Float64Array.of(0.1, 0.2, 0.3))).toEqual([0, 1, 2]);
  });

  it('on a long grid picks the period nearest to each round period inside it, in order', () => {
    const grid = Float64Array.from(logSpaced(0.05, 4, 100));
    const rows = summaryRows(grid);
    const round = [0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3]; // the round periods within 0.05–4 s
    expect(rows).toHaveLength(round.length);
    rows.forEach((row, i) => {
      for (const t of grid)
        expect(Math.abs(grid[row] - round[i])).toBeLessThanOrEqual(Math.abs(t - round[i]));
    });
  });

  it('with toEnds, round periods outside the grid give its nearest end', () => {
    const grid = Float64Array.from(logSpaced(0.05, 4, 100));
    const rows = summaryRows(grid, true);
    expect(rows[0]).toBe(0); // 0 and 0.02 s fall to the shortest period
    expect(rows.at(-1)).toBe(grid.length - 1); // 5 and 10 s to the longest
  });
});

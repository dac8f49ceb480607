import { describe, expect, it } from 'vitest';
import { checkLine, recordsLine } from '../../src/plot/suite-figure.js';
import { EVERY_FIGURE, parseSvg } from './helpers.js';

describe('suiteFigure', () => {
  const doc = parseSvg(EVERY_FIGURE.suite().svg);
  const curves = [...doc.querySelectorAll('g.curves path')];
  const byKind = (kind: string) => curves.filter((p) => p.getAttribute('class') === kind);
  const width = (p: Element) => Number(p.getAttribute('stroke-width'));

  it('draws each record thin and pale, the mean and the median bold, the target and its fraction', () => {
    const records = byKind('record');
    expect(records).toHaveLength(3);
    const [mean] = byKind('mean');
    const [median] = byKind('median');
    for (const r of records) {
      expect(width(r)).toBeLessThan(width(median));
      expect(r.getAttribute('stroke')).toBe('#b3b3b3');
    }
    expect(width(mean)).toBeGreaterThan(width(median));
    // Told apart without colour: solid mean, dashed median, dash-dot target, dotted fraction.
    const dashes = ['mean', 'median', 'target', 'fraction'].map((k) =>
      byKind(k)[0].getAttribute('stroke-dasharray'),
    );
    expect(new Set(dashes).size).toBe(4);
    expect(dashes[0]).toBe('none');
  });

  it('shades the ±1σ band under the curves and the check range, and rings the least ratio', () => {
    expect(doc.querySelector('g.underlay path.band')?.getAttribute('d')).toMatch(/^M/);
    const range = doc.querySelector('g.underlay g.check-range');
    expect(Number(range?.getAttribute('data-from-s'))).toBe(0.2);
    expect(Number(range?.getAttribute('data-to-s'))).toBe(2);
    const worst = doc.querySelector('g.marks g.worst-ratio');
    expect(worst?.querySelector('circle')).not.toBeNull();
    expect(worst?.textContent).toMatch(/^least mean\/target [\d.]+ at [\d.]+ s$/);
  });

  it('names the records, the target and the check result in the header; the legend names each part once', () => {
    const header = doc.querySelector('g.header')?.textContent ?? '';
    expect(header).toContain('Records: invented-1, invented-2, yard');
    expect(header).toContain('Target: ASCE/SEI 7-16 (invented parameters)');
    expect(header).toMatch(/Check \(preliminary\): (PASS|FAIL), mean ≥ 0\.9 × target from 0\.2 to 2 s/);
    const legend = [...doc.querySelectorAll('g.legend text')].map((t) => t.textContent);
    expect(legend).toEqual([
      'each record (3), scaled',
      'median·exp(±σ_ln)',
      'median',
      'mean',
      'target',
      '0.9 × target',
      'check range',
    ]);
  });
});

describe('recordsLine and checkLine', () => {
  it('cut a long list of names with the number left out', () => {
    const names = Array.from({ length: 40 }, (_, i) => `record-${i + 1}`);
    const line = recordsLine(names, 60);
    expect(line).toMatch(/^Records: record-1, record-2, .* and \d+ more$/);
    const shown = line.split(', ').length;
    expect(line.endsWith(`and ${40 - shown} more`)).toBe(true);
    expect(recordsLine(['a', 'b'])).toBe('Records: a, b');
  });

  it('rounds the numbers people read to four figures', () => {
    const text = checkLine({
      fraction: 0.9,
      rangeS: [0.2 * 1.3, 2.6], // 0.26000000000000004
      rangeSource: 'test',
      checkedRangeS: [0.2627, 2.55],
      periodCount: 12,
      pass: false,
      worstRatio: 0.8412345678,
      worstPeriodS: 1.4725404276241238,
      ratios: [],
      inRange: [],
      criterion: '',
      warnings: [],
    });
    expect(text).toBe(
      'Check (preliminary): FAIL, mean ≥ 0.9 × target from 0.26 to 2.6 s (12 grid periods); least mean/target 0.8412 at T = 1.473 s',
    );
  });
});

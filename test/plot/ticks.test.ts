import { describe, expect, it } from 'vitest';
import { decimatedIndices } from '../../src/plot/panel.js';
import { wrapText } from '../../src/plot/text.js';
import { formatLogValue, logTicks } from '../../src/plot/ticks.js';

describe('logTicks', () => {
  const toPixel = (v: number) => 100 * Math.log10(v / 0.01);
  it('puts majors on decades and minors at 2…9 × 10ᵏ (common practice)', () => {
    const ticks = logTicks([0.01, 10], toPixel, (t) => t.length * 6);
    expect(ticks.major).toEqual([0.01, 0.1, 1, 10]);
    expect(ticks.minor).toHaveLength(24);
    expect(ticks.labels.map((l) => l.text)).toContain('0.1');
  });
  it('thins decade labels that would touch', () => {
    const tight = (v: number) => 8 * Math.log10(v / 1e-6);
    const ticks = logTicks([1e-6, 1e6], tight, (t) => t.length * 6);
    const xs = ticks.labels.map((l) => tight(l.value));
    expect(ticks.labels.length).toBeLessThan(13);
    for (let i = 1; i < xs.length; i++) expect(xs[i] - xs[i - 1]).toBeGreaterThanOrEqual(20);
  });
  it('labels 2 and 5 × 10ᵏ on a short axis', () => {
    const ticks = logTicks(
      [0.1, 2],
      (v) => 400 * Math.log10(v / 0.1),
      (t) => t.length * 6,
    );
    expect(ticks.labels.map((l) => l.value)).toEqual(expect.arrayContaining([0.2, 0.5, 1]));
  });
  it('writes powers of ten beyond 0.001 … 10 000', () => {
    expect(formatLogValue(0.001)).toBe('0.001');
    expect(formatLogValue(1e-5)).toBe('10⁻⁵');
    expect(formatLogValue(2e-5)).toBe('2×10⁻⁵');
  });
});

describe('decimatedIndices', () => {
  it('keeps the first, lowest, highest and last point of each pixel column, in order (common practice)', () => {
    // 1000 samples of a sine over 10 columns: each column holds 100 samples.
    const values = Float64Array.from({ length: 1000 }, (_, i) => Math.sin(i / 7) + (i === 537 ? 5 : 0));
    const kept = decimatedIndices(
      1000,
      (i) => i / 100,
      (i) => values[i],
      () => true,
    );
    expect(kept.length).toBeLessThanOrEqual(40);
    expect(kept).toEqual([...kept].sort((a, b) => a - b));
    expect(kept).toContain(537); // the spike survives
    for (let column = 0; column < 10; column++) {
      const slice = Array.from(values.subarray(column * 100, column * 100 + 100));
      const inColumn = kept.filter((i) => Math.floor(i / 100) === column).map((i) => values[i]);
      expect(Math.max(...inColumn)).toBe(Math.max(...slice));
      expect(Math.min(...inColumn)).toBe(Math.min(...slice));
      expect(kept).toContain(column * 100);
      expect(kept).toContain(column * 100 + 99);
    }
  });
});

describe('wrapText', () => {
  it('breaks at spaces and keeps every word', () => {
    const text = 'one two three four five six seven';
    const lines = wrapText(text, 50, 10);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe(text);
  });
});

import { describe, expect, it } from 'vitest';
import { formatLogValue, logLabelStyle, logTicks } from '../../src/plot/ticks.js';

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
  it('writes every label of one axis in one style: no 10⁻⁴ beside 0.001', () => {
    // The Fourier figure's amplitude axis, five decades below a peak of 2.6 m/s.
    const domain: [number, number] = [2e-5, 5];
    expect(logLabelStyle(domain)).toBe('power');
    expect(logLabelStyle([0.01, 10])).toBe('plain');
    const ticks = logTicks(
      domain,
      (v) => 60 * Math.log10(v / 2e-5),
      (t) => t.length * 6,
    );
    const texts = ticks.labels.map((l) => l.text);
    expect(texts).toEqual(expect.arrayContaining(['10⁻⁴', '10⁻³', '10⁻²', '10⁻¹', '10⁰']));
    expect(texts.some((t) => /^[0-9.]+$/.test(t))).toBe(false);
  });
});

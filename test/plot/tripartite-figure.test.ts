import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { logSpaced } from '../../src/oscillator/grid.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { createRecord } from '../../src/record/record.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { axisFromTicks, parseSvg, pathVertices } from './helpers.js';

/** A labelled diagonal value back in SI: "0.01 m" → 0.01, "2×10⁻⁴ m" → 2e-4, "10⁻⁵ g" → 1e-5. */
function labelValue(text: string): number {
  const number = text.split(' ')[0];
  const digits = '⁰¹²³⁴⁵⁶⁷⁸⁹';
  const power = /^(?:([\d.]+)×)?10([⁻⁰¹²³⁴⁵⁶⁷⁸⁹]+)$/.exec(number);
  if (!power) return Number(number);
  const exponent = Number([...power[2]].map((c) => (c === '⁻' ? '-' : String(digits.indexOf(c)))).join(''));
  return Number(power[1] ?? 1) * 10 ** exponent;
}

describe('four-way logarithmic plot', () => {
  const record = createRecord({
    name: 'invented decaying sine',
    dtS: 0.01,
    accelMS2: Float64Array.from(
      { length: 1500 },
      (_, i) => 2 * Math.sin(2 * Math.PI * 1.3 * i * 0.01) * Math.exp(-i / 600),
    ),
  });
  const spectrum = responseSpectrum(record, { periodsS: logSpaced(0.02, 5, 60), dampings: [0.05] });

  for (const unit of ['m', 'cm'] as const) {
    it(`the SD and PSA diagonals satisfy PSV = 2π·SD/T and PSV = PSA·T/(2π) at their labels (${unit})`, () => {
      // Newmark and Hall (1982), ch. 2: the pseudo relations of an undamped-form oscillator.
      const doc = parseSvg(tripartiteFigure(spectrum, { lengthUnit: unit }));
      const x = axisFromTicks(doc, 0, 'x', 'log');
      const y = axisFromTicks(doc, 0, 'y', 'log');
      const toT = (px: number) => 10 ** (Math.log10(0.1) + (px - x(0.1)) / (x(1) - x(0.1)));
      const toV = (py: number) => 10 ** (Math.log10(1) + (py - y(1)) / (y(10) - y(1)));
      const perMetre = unit === 'm' ? 1 : 100;
      const sd = doc.querySelectorAll('g.diagonal.sd');
      const psa = doc.querySelectorAll('g.diagonal.psa');
      expect(sd.length).toBeGreaterThanOrEqual(3);
      expect(psa.length).toBeGreaterThanOrEqual(3);
      for (const line of sd) {
        const label = line.querySelector('text')?.textContent;
        if (!label) continue;
        expect(label.endsWith(` ${unit}`)).toBe(true);
        const sdValue = labelValue(label);
        for (const [px, py] of pathVertices(line.querySelector('path')?.getAttribute('d') ?? '')) {
          const t = toT(px);
          expect(toV(py) / ((2 * Math.PI * sdValue) / t)).toBeCloseTo(1, 2);
        }
      }
      for (const line of psa) {
        const label = line.querySelector('text')?.textContent;
        if (!label) continue;
        expect(label.endsWith(' g')).toBe(true);
        const psaValue = labelValue(label) * STANDARD_GRAVITY_MS2 * perMetre;
        for (const [px, py] of pathVertices(line.querySelector('path')?.getAttribute('d') ?? '')) {
          const t = toT(px);
          expect(toV(py) / ((psaValue * t) / (2 * Math.PI))).toBeCloseTo(1, 2);
        }
      }
      // The curve itself: PSV at a grid period read back through the same axes.
      const p = 30;
      const vertex = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '')[p];
      expect(toV(vertex[1]) / (spectrum.curves[0].psvMS[p] * perMetre)).toBeCloseTo(1, 2);
    });
  }

  it('writes the labels of one family of diagonals in one style: no 10⁻⁴ m beside 0.001 m', () => {
    const doc = parseSvg(tripartiteFigure(spectrum, { lengthUnit: 'm' }));
    for (const kind of ['sd', 'psa']) {
      const texts = [...doc.querySelectorAll(`g.diagonal.${kind} text`)].map((t) => t.textContent ?? '');
      const powers = texts.filter((t) => /10[⁻⁰¹²³⁴⁵⁶⁷⁸⁹]/.test(t));
      const plain = texts.filter((t) => /^[\d.]+ /.test(t));
      expect(powers.length === 0 || plain.length === 0, `${kind}: ${texts.join(', ')}`).toBe(true);
    }
  });
});

import { describe, expect, it } from 'vitest';
import { createRecord } from '../../src/record/record.js';
import { spectrumFigures } from '../../src/report/spectrum-figures.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { sineRecord } from '../helpers/records.js';
import { parseSvg } from '../plot/helpers.js';

// Invented record: 4 cycles of a 0.5 s sine, 1 m/s² peak, 40 samples a cycle.
const sine = sineRecord(1, 0.5, 4, 40);
const record = createRecord({ name: 'invented sine <A> & "B"', ...sine });
const spectrum = responseSpectrum(record, {
  periodsS: [0, 0.1, 0.25, 0.5, 1, 2],
  dampings: [0.02, 0.05],
  method: 'piecewise-exact',
});
const shared = {
  lengthUnit: 'mm' as const,
  methodDescription: 'test method',
  overlays: [{ label: 'invented target', periodsS: [0.1, 1], psaG: [0.1, 0.05] }],
};

describe('spectrumFigures', () => {
  const figures = spectrumFigures(record, spectrum, shared, false);

  it('draws PSA, SD, PSV and the four-way plot, each under its own file name', () => {
    expect(figures.map((f) => f.file)).toEqual(['psa.svg', 'sd.svg', 'psv.svg', 'tripartite.svg']);
    expect(new Set(figures.map((f) => f.caption)).size).toBe(4);
    expect(figures[0].caption).toMatch(/PSA/);
    expect(figures[1].caption).toMatch(/SD/);
    expect(figures[2].caption).toMatch(/PSV/);
  });

  it('every figure is well-formed SVG that names the record as text (its markup characters escaped)', () => {
    for (const figure of figures) {
      const doc = parseSvg(figure.svg);
      expect(doc.documentElement.localName).toBe('svg');
      expect(doc.documentElement.textContent).toContain('invented sine <A> & "B"');
    }
  });

  it('draws the overlay on the PSA figure and gives SD and PSV in the length unit asked for', () => {
    expect(parseSvg(figures[0].svg).documentElement.textContent).toContain('invented target');
    expect(parseSvg(figures[1].svg).documentElement.textContent).toMatch(/\bmm\b/);
    expect(parseSvg(figures[2].svg).documentElement.textContent).toMatch(/mm\/s/);
  });

  it('adds the histories of the record when asked, last', () => {
    const withHistories = spectrumFigures(record, spectrum, shared, true);
    expect(withHistories.map((f) => f.file)).toEqual([
      'psa.svg',
      'sd.svg',
      'psv.svg',
      'tripartite.svg',
      'histories.svg',
    ]);
    const doc = parseSvg(withHistories[4].svg);
    expect(doc.documentElement.localName).toBe('svg');
    expect(withHistories[4].caption).toMatch(/acceleration, velocity and displacement/);
  });
});

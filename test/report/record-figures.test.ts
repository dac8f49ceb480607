import { describe, expect, it } from 'vitest';
import { groundMotionMeasures } from '../../src/record/measures.js';
import { createRecord } from '../../src/record/record.js';
import { recordFigures, smoothingStartHz } from '../../src/report/record-figures.js';
import { sineRecord } from '../helpers/records.js';
import { parseSvg, pathVertices } from '../plot/helpers.js';

// Invented record: 10 cycles of a 0.25 s sine (4 Hz), 2 m/s² peak, 20 samples a cycle: 201 samples.
const record = createRecord({ name: 'invented <sine>', ...sineRecord(2, 0.25, 10, 20) });
const measures = groundMotionMeasures(record);

describe('recordFigures', () => {
  const figures = recordFigures(record, measures, 40);

  it('gives the three figures of info by file name, each well-formed SVG naming the record', () => {
    expect(figures.map(([file]) => file)).toEqual(['histories.svg', 'husid.svg', 'fourier.svg']);
    for (const [, svg] of figures) {
      const doc = parseSvg(svg);
      expect(doc.documentElement.localName).toBe('svg');
      expect(doc.documentElement.textContent).toContain('invented <sine>');
    }
  });

  it('states the transform: 201 samples zero-padded to the next power of two, 256 (hand)', () => {
    expect(parseSvg(figures[2][1]).documentElement.textContent).toContain('FFT of 256 points (zero-padded)');
  });

  it('names the smoothing and its bandwidth when there is one, and none without', () => {
    expect(figures[2][1]).toContain('Konno–Ohmachi 1998, b = 40');
    const unsmoothed = recordFigures(record, measures, null);
    expect(unsmoothed[2][1]).not.toContain('Konno–Ohmachi');
    // The other two figures do not depend on the smoothing.
    expect(unsmoothed[0][1]).toBe(figures[0][1]);
    expect(unsmoothed[1][1]).toBe(figures[1][1]);
  });

  it('starts the smoothed curve where the window holds three lines: 0.2 Hz for 4096 × 0.01 s at b = 40', () => {
    // Δf = 1/40.96 s = 0.02441 Hz; main lobe f_c·(10^(π/40) − 10^(−π/40)) = 0.36399·f_c; 3Δf/0.36399
    // = 0.2012 Hz (hand arithmetic from Konno and Ohmachi 1998, eq. 4).
    expect(smoothingStartHz(1 / 40.96, 40)).toBeCloseTo(0.2012, 3);
    // Here Δt = 0.25/20 = 0.0125 s, Δf = 1/(256·0.0125 s) = 0.3125 Hz: the curve starts at
    // 3·0.3125/0.36399 = 2.58 Hz, and the figure says so.
    const doc = parseSvg(figures[2][1]);
    const smoothed = doc.querySelector('path.curve[data-label^="smoothed"]')?.getAttribute('d') ?? '';
    const unsmoothed = doc.querySelector('path.curve[data-label="unsmoothed"]')?.getAttribute('d') ?? '';
    expect(pathVertices(smoothed)[0][0]).toBeGreaterThan(pathVertices(unsmoothed)[0][0] + 100);
    expect(doc.querySelector('g.notes')?.textContent).toContain('The smoothed curve starts at 2.6 Hz');
  });
});

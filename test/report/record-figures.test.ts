import { describe, expect, it } from 'vitest';
import { groundMotionMeasures } from '../../src/record/measures.js';
import { createRecord } from '../../src/record/record.js';
import { recordFigures } from '../../src/report/record-figures.js';
import { sineRecord } from '../helpers/records.js';
import { parseSvg } from '../plot/helpers.js';

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
});

import { describe, expect, it } from 'vitest';
import { designFigure } from '../../src/plot/design-figure.js';
import { asce722MultiPeriodSpectrum, asce722TwoPeriodSpectrum } from '../../src/spectrum/asce722.js';
import { designPsaG } from '../../src/spectrum/design.js';
import { readSpectrumTable } from '../../src/spectrum/design-table.js';
import { axisFromTicks, EVERY_FIGURE, parseSvg, pathVertices } from './helpers.js';

describe('designFigure', () => {
  it('T = 0 is left off the log axis and its PSA stated; PSA = S_DS on the plateau (ASCE/SEI 7-16 §11.4.6)', () => {
    const doc = parseSvg(EVERY_FIGURE.design().svg);
    expect(doc.querySelector('g.notes')?.textContent).toContain('T = 0 s');
    expect(doc.querySelector('g.notes')?.textContent).toContain('PSA = 0.4 g'); // 0.4 S_DS at T = 0
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const x = axisFromTicks(doc, 0, 'x', 'log');
    const vertices = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '');
    // A vertex between T0 = 0.12 s and TS = 0.6 s sits at S_DS = 1 g.
    const plateau = vertices.filter(([px]) => px > x(0.15) && px < x(0.5));
    expect(plateau.length).toBeGreaterThan(3);
    for (const [, py] of plateau) expect(py).toBeCloseTo(y(1), 0);
  });

  it('names the ASCE 7-22 form in the legend; the two-period form is drawn densely, the multi-period table at its rows', () => {
    const figure = (spectrum: ReturnType<typeof asce722TwoPeriodSpectrum>, periodsS: Float64Array) =>
      parseSvg(designFigure({ spectrum, periodsS, psaG: designPsaG(spectrum, periodsS) }));
    const periodsS = Float64Array.from([0.1, 0.5, 1, 5]);
    const two = figure(asce722TwoPeriodSpectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 }), periodsS);
    expect(two.querySelector('g.legend')?.textContent).toContain('ASCE/SEI 7-22 two-period design spectrum');
    expect(pathVertices(two.querySelector('path.curve')?.getAttribute('d') ?? '').length).toBeGreaterThan(
      100,
    );
    // An invented site table of four rows.
    const table = readSpectrumTable('0.1,0.8\n0.5,1.0\n1,0.6\n5,0.1\n', 'mp.csv');
    const multi = figure(asce722MultiPeriodSpectrum(table, 'mp.csv'), table.periodsS);
    expect(multi.querySelector('g.legend')?.textContent).toContain(
      'ASCE/SEI 7-22 multi-period design spectrum',
    );
    expect(pathVertices(multi.querySelector('path.curve')?.getAttribute('d') ?? '')).toHaveLength(4);
  });
});

import { describe, expect, it } from 'vitest';
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
});

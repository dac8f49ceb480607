import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { axisFromTicks, handSpectrum, parseSvg, pathVertices } from './helpers.js';

const figures = {
  psa: psaFigure,
  sd: sdFigure,
  psv: psvFigure,
  tripartite: tripartiteFigure,
};

describe('spectrum figures (PSA, SD, PSV and the four-way plot)', () => {
  for (const [name, draw] of Object.entries(figures)) {
    it(`${name}: carries the caution, the record name, the method and the damping ratios`, () => {
      const doc = parseSvg(draw(handSpectrum('invented pier 7')));
      const caution = [...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ');
      expect(caution).toBe(CAUTION);
      const header = doc.querySelector('g.header')?.textContent ?? '';
      expect(header).toContain('invented pier 7');
      expect(header).toContain('newmark-average');
      expect(header).toContain('2%, 5%, 10%');
    });
  }

  it('a known (T, PSA) point lands on the pixel the axes give (log–log)', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(psaFigure(spectrum));
    const x = axisFromTicks(doc, 0, 'x', 'log');
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const d = doc.querySelectorAll('path.curve')[1].getAttribute('d') ?? '';
    const vertices = pathVertices(d);
    // T = 0 cannot go on a log axis, so vertex k is period k + 1.
    expect(vertices).toHaveLength(spectrum.periodsS.length - 1);
    const p = 4; // T = 0.5 s
    const psaG = spectrum.curves[1].psaMS2[p] / STANDARD_GRAVITY_MS2;
    expect(vertices[p - 1][0]).toBeCloseTo(x(0.5), 1);
    expect(vertices[p - 1][1]).toBeCloseTo(y(psaG), 1);
    expect(doc.querySelector('g.notes')?.textContent).toContain('T = 0 s');
  });

  it('linear axes keep T = 0 and start the period axis there', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(sdFigure(spectrum, { axes: 'linear', lengthUnit: 'cm' }));
    const x = axisFromTicks(doc, 0, 'x', 'linear');
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const vertices = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '');
    expect(vertices).toHaveLength(spectrum.periodsS.length);
    expect(vertices[0][0]).toBeCloseTo(x(0), 1);
    expect(vertices[6][1]).toBeCloseTo(y(spectrum.curves[0].sdM[6] * 100), 1);
    expect(doc.querySelector('.y-title')?.textContent).toBe('Relative displacement SD (cm)');
  });

  it('no curve runs beyond the period grid', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(psvFigure(spectrum));
    const x = axisFromTicks(doc, 0, 'x', 'log');
    for (const path of doc.querySelectorAll('path.curve')) {
      const xs = pathVertices(path.getAttribute('d') ?? '').map((v) => v[0]);
      expect(Math.min(...xs)).toBeCloseTo(x(0.05), 1);
      expect(Math.max(...xs)).toBeCloseTo(x(4), 1);
    }
  });

  it('overlays are drawn as extra series in the PSA and four-way plots', () => {
    const overlays = [{ label: 'invented target', periodsS: [0.1, 1, 2], psaG: [0.5, 0.5, 0.25] }];
    for (const draw of [psaFigure, tripartiteFigure]) {
      const doc = parseSvg(draw(handSpectrum(), { overlays }));
      expect(doc.querySelectorAll('path.overlay')).toHaveLength(1);
      expect(doc.querySelector('g.legend')?.textContent).toContain('invented target');
    }
  });

  it("shades an overlay's fitting range on the PSA plot, from its first to its last period, and says so", () => {
    const overlays = [
      { label: 'invented target', periodsS: [0.1, 1, 2], psaG: [0.5, 0.5, 0.25], rangeS: [0.2, 1] as const },
    ];
    const doc = parseSvg(psaFigure(handSpectrum(), { overlays }));
    const rect = doc.querySelector('g.underlay rect.fit-range');
    const x = axisFromTicks(doc, 0, 'x', 'log');
    expect(Number(rect?.getAttribute('x'))).toBeCloseTo(x(0.2), 0);
    expect(Number(rect?.getAttribute('x')) + Number(rect?.getAttribute('width'))).toBeCloseTo(x(1), 0);
    expect(doc.documentElement.textContent).toContain(
      'Shaded: the periods over which the record was fitted to the target, 0.2 to 1 s.',
    );
    expect(
      parseSvg(
        psaFigure(handSpectrum(), { overlays: [{ ...overlays[0], rangeS: undefined }] }),
      ).querySelector('rect.fit-range'),
    ).toBeNull();
  });
});

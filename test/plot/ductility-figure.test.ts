import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { constantDuctilitySpectra } from '../../src/inelastic/ductility.js';
import { referenceReductions } from '../../src/inelastic/r-mu-t.js';
import {
  ductilityFigures,
  ductilityReductionSvg,
  ductilityStrengthSvg,
} from '../../src/plot/ductility-figure.js';
import { axisFromTicks, ductilityInputs, inventedRecord, parseSvg, pathVertices } from './helpers.js';

const text = (doc: Document, selector: string) =>
  [...doc.querySelectorAll(selector)].map((t) => t.textContent).join(' ');

describe('ductilityStrengthSvg', () => {
  const { spectra } = ductilityInputs();
  const doc = parseSvg(ductilityStrengthSvg(spectra));

  it('draws A_y for each μ, μ = 1 named as the elastic PSA, with the caution and the model', () => {
    const labels = [...doc.querySelectorAll('path.curve')].map((p) => p.getAttribute('data-label'));
    expect(labels).toEqual(['μ = 1 (elastic PSA)', 'μ = 2', 'μ = 4']);
    expect(text(doc, 'g.caution text')).toBe(CAUTION);
    expect(text(doc, 'g.header')).toContain('Model: elastoplastic');
    expect(text(doc, 'g.curve-labels text')).toBe('μ = 1 μ = 2 μ = 4');
  });

  it('leaves T = 0 off the log axis and states A_y = PGA there', () => {
    const notes = text(doc, 'g.notes text');
    expect(notes).toContain('T = 0 s is in the period grid');
    expect(notes).toMatch(/A_y = PGA = [\d.]+ g for every μ/);
  });

  it('puts μ = 1 at the elastic PSA, ω²·u_o (definition of PSA), read back from the drawn ticks', () => {
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const first = doc.querySelector('path.curve')?.getAttribute('d') ?? '';
    const ys = pathVertices(first).map(([, py]) => py);
    const elastic = spectra.elastic[0];
    const expected = Array.from(spectra.periodsS)
      .map((t, p) => (t > 0 ? (((2 * Math.PI) / t) ** 2 * elastic.sdM[p]) / 9.80665 : Number.NaN))
      .filter(Number.isFinite);
    expect(ys).toHaveLength(expected.length);
    for (const [i, py] of ys.entries()) expect(py).toBeCloseTo(y(expected[i]), 1);
  });

  it('draws against frequency on --axis frequency', () => {
    const freq = parseSvg(ductilityStrengthSvg(spectra, { axis: 'frequency' }));
    expect(text(freq, '.x-title')).toBe('Frequency f = 1/T (Hz)');
    expect(text(freq, 'g.notes text')).toContain('(f = ∞)');
  });
});

describe('ductilityReductionSvg', () => {
  const { spectra } = ductilityInputs();
  const references = referenceReductions(spectra);
  const doc = parseSvg(ductilityReductionSvg(spectra, { references }));

  it('names both published relations with their year in the legend, and their sources in the notes', () => {
    const legend = text(doc, 'g.legend text');
    expect(legend).toContain('Newmark–Hall (1982)');
    expect(legend).toContain('Nassar–Krawinkler (1991)');
    const notes = text(doc, 'g.notes text');
    expect(notes).toContain('Newmark and Hall (1982)');
    expect(notes).toContain('Nassar and Krawinkler (1991)');
    expect(text(doc, 'g.caution text')).toBe(CAUTION);
  });

  it('draws each relation for each μ > 1, thin, in the colour of its μ', () => {
    const refs = [...doc.querySelectorAll('path.reference')];
    expect(refs.map((p) => p.getAttribute('data-label'))).toEqual([
      'Newmark–Hall (1982), μ = 2',
      'Nassar–Krawinkler (1991), μ = 2',
      'Newmark–Hall (1982), μ = 4',
      'Nassar–Krawinkler (1991), μ = 4',
    ]);
    const data = [...doc.querySelectorAll('path.curve')];
    for (const ref of refs) {
      const mu = ref.getAttribute('data-label')?.split(', ')[1];
      const curve = data.find((p) => p.getAttribute('data-label') === mu);
      expect(ref.getAttribute('stroke')).toBe(curve?.getAttribute('stroke'));
      expect(Number(ref.getAttribute('stroke-width'))).toBeLessThan(
        Number(curve?.getAttribute('stroke-width')),
      );
    }
  });

  it('ends Newmark–Hall at R = μ past T_c (equal displacement, closed form), on the drawn axis', () => {
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const nh4 = doc.querySelector('path.reference[data-label="Newmark–Hall (1982), μ = 4"]');
    const last = pathVertices(nh4?.getAttribute('d') ?? '').at(-1);
    expect(references.cornerPeriodsS[0].tcS).toBeLessThan(2);
    expect(last?.[1]).toBeCloseTo(y(4), 1);
  });
});

describe('ductilityReductionSvg with two damping ratios', () => {
  it('dashes the record curves by damping and draws the published relations once per μ, at 5%', () => {
    const record = inventedRecord(4);
    const model = { kind: 'elastoplastic' } as const;
    const periodsS = [0.1, 0.5, 2];
    const spectra = constantDuctilitySpectra(record, {
      periodsS,
      dampings: [0.02, 0.05],
      ductilities: [1, 3],
      model,
    });
    const doc = parseSvg(ductilityReductionSvg(spectra, { references: referenceReductions(spectra) }));
    const curves = [...doc.querySelectorAll('path.curve')];
    expect(curves.map((p) => p.getAttribute('data-label'))).toEqual([
      'μ = 1, ζ = 2%',
      'μ = 3, ζ = 2%',
      'μ = 1, ζ = 5%',
      'μ = 3, ζ = 5%',
    ]);
    expect(curves[1].getAttribute('stroke')).toBe(curves[3].getAttribute('stroke'));
    expect(curves[1].getAttribute('stroke-dasharray')).not.toBe(curves[3].getAttribute('stroke-dasharray'));
    const refs = [...doc.querySelectorAll('path.reference')].map((p) => p.getAttribute('data-label'));
    expect(refs).toEqual(['Newmark–Hall (1982), μ = 3', 'Nassar–Krawinkler (1991), μ = 3']);
    expect(text(doc, 'g.notes text')).toContain('drawn at ζ = 5% only');
  });
});

describe('ductilityFigures', () => {
  it('names the constant-ductility figures ductility-ay.svg and ductility-ry.svg', () => {
    const { spectra } = ductilityInputs();
    const figures = ductilityFigures(spectra, { references: referenceReductions(spectra) });
    expect(figures.map((f) => f.name)).toEqual(['ductility-ay.svg', 'ductility-ry.svg']);
  });

  it('names the demand figure ductility-demand.svg, one curve per given strength', () => {
    const [figure, ...rest] = ductilityFigures(ductilityInputs().demand);
    expect(rest).toHaveLength(0);
    expect(figure.name).toBe('ductility-demand.svg');
    const doc = parseSvg(figure.svg);
    const labels = [...doc.querySelectorAll('path.curve')].map((p) => p.getAttribute('data-label'));
    expect(labels).toEqual(['R_y = 2', 'R_y = 4']);
    expect(text(doc, '.y-title')).toBe('Ductility demand μ = u_m/u_y');
    expect(text(doc, 'g.caution text')).toBe(CAUTION);
  });
});

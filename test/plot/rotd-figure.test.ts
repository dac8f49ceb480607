import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { rotdFigure } from '../../src/plot/rotd-figure.js';
import type { RotDSpectra } from '../../src/spectrum/rotd.js';
import { axisFromTicks, parseSvg, pathVertices } from './helpers.js';

/**
 * Two identical components, u₂ = u₁, with PSA₁(T) = 0.5 g/(1 + T): PSA(θ) = ω²·max|u₁(cos θ + sin θ)|
 * = √2·|cos(θ − 45°)|·PSA₁, so RotD100 = √2·PSA₁ (at 45°), the geometric mean is PSA₁, and RotD50,
 * the median of √2·|cos φ| over a half turn, is √2·cos 45° · PSA₁ = PSA₁ (Boore 2010, hand calculation).
 */
function identicalComponents(dampings: number[], paddedSamples = 0): RotDSpectra {
  const periodsS = Float64Array.from([0, 0.1, 0.2, 0.5, 1, 2]);
  const psa1 = (d: number) => periodsS.map((t) => (0.5 * STANDARD_GRAVITY_MS2) / (1 + t) / (1 + d));
  const record = {
    name: 'invented pier',
    source: 'pier.csv',
    npts: 500,
    dtS: 0.01,
    pgaMS2: 4.9,
    processing: [],
  };
  return {
    records: [
      { ...record, processing: [{ operation: 'baseline', description: 'mean removed', parameters: {} }] },
      { ...record, name: 'invented pier, second' },
    ],
    method: 'newmark-average',
    periodsS,
    angleStepDeg: 2,
    paddedSamples,
    curves: dampings.map((damping, d) => ({
      damping,
      rotd50MS2: psa1(d),
      rotd100MS2: psa1(d).map((v) => Math.SQRT2 * v),
      geomeanMS2: psa1(d),
    })),
  };
}

describe('rotdFigure', () => {
  it('draws RotD100 √2 times the geometric mean and RotD50 on it, for identical components', () => {
    const doc = parseSvg(rotdFigure({ spectra: identicalComponents([0.05]), methodDescription: 'test' }));
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const pxPerDecade = y(1) - y(10);
    const curve = (label: string) =>
      pathVertices(doc.querySelector(`path.curve[data-label="${label}"]`)?.getAttribute('d') ?? '');
    const [rotd100, rotd50, geomean] = ['RotD100', 'RotD50', 'geometric mean'].map(curve);
    expect(geomean).toHaveLength(5); // T = 0 is left off the log axis
    geomean.forEach(([px, py], i) => {
      expect(rotd100[i][0]).toBe(px);
      expect(py - rotd100[i][1]).toBeCloseTo(pxPerDecade * Math.log10(Math.SQRT2), 1);
      expect(rotd50[i][1]).toBeCloseTo(py, 6);
    });
  });

  it('names both components, the angles and the values at T = 0 in g', () => {
    const doc = parseSvg(
      rotdFigure({ spectra: identicalComponents([0.05]), methodDescription: 'test method' }),
    );
    const header = doc.querySelector('g.header')?.textContent ?? '';
    expect(header).toContain('Component 1: invented pier (pier.csv)');
    expect(header).toContain('Component 2: invented pier, second');
    expect(header).toContain('Component 1 processed: mean removed');
    expect(header).toContain('Method: test method; damping ζ = 5%');
    const notes = doc.querySelector('g.notes')?.textContent ?? '';
    expect(notes).toContain('over 90 angles 0 ≤ θ < 180° in steps of 2°'); // 180° / 2°
    // At T = 0: PSA₁ = 0.5 g, so RotD50 = 0.5 g and RotD100 = 0.5·√2 = 0.7071 g.
    expect(notes).toContain('(there RotD50 = 0.5 g, RotD100 = 0.7071 g)');
    expect(notes).not.toContain('padded');
    expect(doc.querySelector('g.legend')?.textContent).toBe('RotD100RotD50geometric mean');
  });

  it('with several damping ratios: a colour per measure, a dash per damping ratio, both in the labels', () => {
    const spectra = identicalComponents([0.02, 0.05], 120);
    const doc = parseSvg(rotdFigure({ spectra, methodDescription: 'test' }));
    const paths = [...doc.querySelectorAll('path.curve')];
    expect(paths.map((p) => p.getAttribute('data-label'))).toEqual([
      'RotD100, ζ = 2%',
      'RotD50, ζ = 2%',
      'geometric mean, ζ = 2%',
      'RotD100, ζ = 5%',
      'RotD50, ζ = 5%',
      'geometric mean, ζ = 5%',
    ]);
    const stroke = paths.map((p) => p.getAttribute('stroke'));
    const dash = paths.map((p) => p.getAttribute('stroke-dasharray'));
    expect(stroke.slice(0, 3)).toEqual(stroke.slice(3));
    expect(new Set(stroke).size).toBe(3);
    expect(new Set(dash.slice(0, 3)).size).toBe(1);
    expect(dash[0]).not.toBe(dash[3]);
    expect(doc.querySelector('g.notes')?.textContent).toContain('padded with 120 zero samples');
  });

  it('parts RotD50 and the geometric mean in greyscale: the mean dashed and marked, in the legend too', () => {
    const one = parseSvg(rotdFigure({ spectra: identicalComponents([0.05]), methodDescription: 'test' }));
    const path = (label: string) => one.querySelector(`path.curve[data-label="${label}"]`);
    expect(path('RotD50')?.getAttribute('stroke-dasharray')).toBe('none');
    expect(path('geometric mean')?.getAttribute('stroke-dasharray')).not.toBe('none');
    // Markers on the curve (none on the others) and one in the legend's sample.
    expect(one.querySelectorAll('g.curves g.markers')).toHaveLength(1);
    expect(one.querySelectorAll('g.curves g.markers circle').length).toBeGreaterThan(1);
    expect(one.querySelectorAll('g.legend g.markers circle')).toHaveLength(1);
    // Several damping ratios: the dash is the damping's, the circles still mark each geometric mean.
    const two = parseSvg(
      rotdFigure({ spectra: identicalComponents([0.02, 0.05]), methodDescription: 'test' }),
    );
    expect(two.querySelectorAll('g.curves g.markers')).toHaveLength(2);
  });
});

import { describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { dampingFigure } from '../../src/plot/damping-figure.js';
import { designFigure } from '../../src/plot/design-figure.js';
import { floorFigure } from '../../src/plot/floor-figure.js';
import { type PeriodAxis, periodAxisSpec, periodLabel } from '../../src/plot/period-axis.js';
import { rotdFigure } from '../../src/plot/rotd-figure.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { compareDamping } from '../../src/spectrum/damping.js';
import { asce716Spectrum, designPsaG } from '../../src/spectrum/design.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { axisFromTicks, handSpectrum, inventedRecord, parseSvg, pathVertices } from './helpers.js';

const HZ_TITLE = 'Frequency f = 1/T (Hz)';

describe('periodAxisSpec', () => {
  it('period by default; frequency is the reciprocal of the same data, in Hz', () => {
    expect(periodAxisSpec()).toEqual({ title: 'Period T (s)' });
    expect(periodAxisSpec('period')).toEqual({ title: 'Period T (s)' });
    expect(periodAxisSpec('frequency')).toEqual({ title: HZ_TITLE, reciprocal: true });
  });
});

describe('periodLabel', () => {
  it('names a period in the axis units, the period kept beside a frequency', () => {
    expect(periodLabel('_b', 0.45)).toBe('T_b = 0.45 s');
    // 1/0.45 = 2.2222… Hz, four significant digits (by hand).
    expect(periodLabel('_b', 0.45, 'frequency')).toBe('f_b = 2.222 Hz (T_b = 0.45 s)');
    expect(periodLabel('_b', 0.5, 'frequency')).toBe('f_b = 2 Hz (T_b = 0.5 s)');
  });
});

/** Every figure drawn against period, from small invented inputs, with the axis given. */
function everySpectrumFigure(axis: PeriodAxis): Record<string, string> {
  const spectrum = handSpectrum();
  const record = inventedRecord(4);
  const grid = { periodsS: Float64Array.from([0, 0.05, 0.1, 0.3, 1, 3]), dampings: [0.05] };
  const design = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
  const building = { periodS: 0.5, damping: 0.05, modalFactor: 1.4 };
  const floor = floorSpectrum(record, building, grid, 0.15);
  return {
    psa: psaFigure(spectrum, { axis }),
    sd: sdFigure(spectrum, { axis }),
    psv: psvFigure(spectrum, { axis }),
    tripartite: tripartiteFigure(spectrum, { axis }),
    design: designFigure({
      spectrum: design,
      periodsS: grid.periodsS,
      psaG: designPsaG(design, grid.periodsS),
      axis,
    }),
    damping: dampingFigure({
      record: spectrum.record,
      methodDescription: 'test',
      comparison: compareDamping(spectrum),
      axis,
    }),
    rotd: rotdFigure({
      spectra: rotDSpectra(record, inventedRecord(4, 1), { ...grid, angleStepDeg: 1 }),
      methodDescription: 'test',
      axis,
    }),
    floor: floorFigure({
      ground: responseSpectrum(record, grid),
      floor: floor.spectrum,
      unbroadened: floor.unbroadened,
      broadening: 0.15,
      building,
      methodDescription: 'test',
      axis,
    }),
  };
}

describe('every spectrum figure against frequency', () => {
  const figures = everySpectrumFigure('frequency');
  for (const [name, svg] of Object.entries(figures)) {
    it(`${name}: titles its x axis in Hz, ticks ascend to the right, and states T = 0 is left off`, () => {
      const doc = parseSvg(svg);
      const titles = [...doc.querySelectorAll('.x-title')].map((t) => t.textContent);
      expect(titles.length).toBeGreaterThan(0);
      for (const title of titles) expect(title).toBe(HZ_TITLE);
      const ticks = [...doc.querySelectorAll('g.x-ticks text')].map((t) => ({
        value: Number(t.getAttribute('data-value')),
        px: Number(t.getAttribute('x')),
      }));
      for (let i = 1; i < ticks.length; i++) {
        // Higher frequency to the right (the common way to draw a frequency axis).
        expect(ticks[i].value).toBeGreaterThan(ticks[i - 1].value);
        expect(ticks[i].px).toBeGreaterThan(ticks[i - 1].px);
      }
      expect(doc.querySelector('g.notes')?.textContent).toContain(
        'T = 0 s (f = ∞) is in the period grid but cannot be drawn on a frequency axis',
      );
    });
  }

  it('a known (T, PSA) point lands at f = 1/T on the axis read back from its ticks', () => {
    const spectrum = handSpectrum();
    const doc = parseSvg(figures.psa);
    const x = axisFromTicks(doc, 0, 'x', 'log');
    const y = axisFromTicks(doc, 0, 'y', 'log');
    const vertices = pathVertices(doc.querySelectorAll('path.curve')[1].getAttribute('d') ?? '');
    // T = 0 (f = ∞) is left out: vertex k is period k + 1, drawn in the order of the periods.
    expect(vertices).toHaveLength(spectrum.periodsS.length - 1);
    const p = 4; // T = 0.5 s, so f = 1/0.5 = 2 Hz (by hand)
    expect(vertices[p - 1][0]).toBeCloseTo(x(2), 1);
    expect(vertices[p - 1][1]).toBeCloseTo(y(spectrum.curves[1].psaMS2[p] / STANDARD_GRAVITY_MS2), 1);
    // Periods 0.05 s and 4 s are 20 Hz and 0.25 Hz: the shortest period is the rightmost vertex.
    expect(vertices[0][0]).toBeCloseTo(x(20), 1);
    expect(vertices[vertices.length - 1][0]).toBeCloseTo(x(0.25), 1);
    expect(vertices[0][0]).toBeGreaterThan(vertices[vertices.length - 1][0]);
  });

  it('the floor figure marks the building at f_b = 1/T_b', () => {
    const doc = parseSvg(figures.floor);
    const mark = doc.querySelector('g.building-period');
    expect(mark?.textContent).toBe('f_b = 2 Hz (T_b = 0.5 s)');
    const x = axisFromTicks(doc, 0, 'x', 'log');
    expect(Number(mark?.querySelector('line')?.getAttribute('x1'))).toBeCloseTo(x(2), 1);
  });

  it('the four-way plot states its diagonals turned over: SD rising, PSA falling to the right', () => {
    const notes = parseSvg(figures.tripartite).querySelector('g.notes')?.textContent ?? '';
    // Against f: PSV = 2π·f·SD rises with f, PSV = PSA/(2π·f) falls (from PSV = ω·SD = PSA/ω).
    expect(notes).toContain('rising to the right are constant SD');
    expect(notes).toContain('falling to the right are constant PSA');
  });

  it('against period, every figure keeps its period axis', () => {
    for (const svg of Object.values(everySpectrumFigure('period'))) {
      const doc = parseSvg(svg);
      for (const title of doc.querySelectorAll('.x-title')) expect(title.textContent).toBe('Period T (s)');
    }
  });
});

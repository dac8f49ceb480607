import { JSDOM } from 'jsdom';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { analyseSuite } from '../../src/batch/suite.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../src/inelastic/ductility.js';
import { referenceReductions } from '../../src/inelastic/r-mu-t.js';
import { logSpaced } from '../../src/oscillator/grid.js';
import { anchorPlanSvg } from '../../src/plot/anchor-plan-figure.js';
import { dampingFigure } from '../../src/plot/damping-figure.js';
import { designFigure } from '../../src/plot/design-figure.js';
import {
  ductilityDemandSvg,
  ductilityReductionSvg,
  ductilityStrengthSvg,
} from '../../src/plot/ductility-figure.js';
import { floorFigure } from '../../src/plot/floor-figure.js';
import { floorSetFigure } from '../../src/plot/floor-set-figure.js';
import { fourierFigure } from '../../src/plot/fourier-figure.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { husidFigure } from '../../src/plot/husid-figure.js';
import { rotdFigure } from '../../src/plot/rotd-figure.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { suiteFigure } from '../../src/plot/suite-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { fourierAmplitudeSpectrum } from '../../src/record/fourier.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { groundMotionMeasures, husidCurve } from '../../src/record/measures.js';
import { createRecord } from '../../src/record/record.js';
import { compareDamping } from '../../src/spectrum/damping.js';
import { asce716Spectrum, designPsaG } from '../../src/spectrum/design.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { floorSpectrumSet, recordLabels } from '../../src/spectrum/floor-set.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { responseSpectrum, type Spectrum, type SpectrumOptions } from '../../src/spectrum/spectrum.js';

/** Parse SVG text as XML; jsdom's XML parser throws on anything that is not well formed. */
export function parseSvg(text: string): Document {
  return new JSDOM(text, { contentType: 'image/svg+xml' }).window.document;
}

/**
 * The pixel mapping of one axis, read back from the figure's own labelled ticks (their data-value
 * and position), so the checks do not reuse the code under test.
 */
export function axisFromTicks(
  doc: Document,
  panel: number,
  axis: 'x' | 'y',
  scale: 'log' | 'linear',
): (value: number) => number {
  const group = doc.querySelector(`g.panel[data-panel="${panel}"] g.${axis}-ticks`);
  const ticks = [...(group?.querySelectorAll('text') ?? [])].map((t) => ({
    value: Number(t.getAttribute('data-value')),
    px: Number(t.getAttribute(axis)),
  }));
  if (ticks.length < 2) throw new Error(`fewer than 2 labelled ${axis} ticks`);
  const a = ticks[0];
  const b = ticks[ticks.length - 1];
  // The y label sits 0.35 em below its tick; both labels carry the same offset, so the slope is exact.
  const offset = axis === 'y' ? Number(group?.closest('g.tick-labels')?.getAttribute('font-size')) * 0.35 : 0;
  const f = scale === 'log' ? Math.log10 : (v: number) => v;
  return (value) => a.px - offset + ((f(value) - f(a.value)) / (f(b.value) - f(a.value))) * (b.px - a.px);
}

/** The vertices of an SVG path made of M and L commands. */
export function pathVertices(d: string): [number, number][] {
  return [...d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

/**
 * A spectrum built by hand: SD(T) = c·T² at short periods, as for a rigid-ish range, with the pseudo
 * quantities from their definitions PSV = ωSD, PSA = ω²SD (Chopra, Dynamics of Structures, §6.6).
 */
export function handSpectrum(name = 'invented test record'): Spectrum {
  const periodsS = Float64Array.from([0, 0.05, 0.1, 0.2, 0.5, 1, 2, 4]);
  const dampings = [0.02, 0.05, 0.1];
  const curves = dampings.map((damping, d) => {
    const sdM = periodsS.map((t) => (0.02 * t * t) / (1 + t * t) / (1 + 2 * d));
    const psvMS = sdM.map((sd, i) => (periodsS[i] === 0 ? 0 : ((2 * Math.PI) / periodsS[i]) * sd));
    const psaMS2 = sdM.map((sd, i) =>
      periodsS[i] === 0 ? 0.3 * STANDARD_GRAVITY_MS2 : ((2 * Math.PI) / periodsS[i]) ** 2 * sd,
    );
    return { damping, sdM, psvMS, psaMS2, svMS: psvMS, saMS2: psaMS2 };
  });
  return {
    record: {
      name,
      source: 'hand-made',
      npts: 1000,
      dtS: 0.01,
      pgaMS2: 0.3 * STANDARD_GRAVITY_MS2,
      processing: [],
    },
    method: 'newmark-average',
    periodsS,
    curves,
    oscillatorSteps: 0,
  };
}

/** A name with every character XML escapes. */
export const NASTY = `yard <7> & "east" 'bay' (invented)`;

/** An invented record: two decaying sines, `seconds` long at 100 samples a second. */
export function inventedRecord(seconds = 15, phase = 0) {
  return createRecord({
    name: NASTY,
    dtS: 0.01,
    accelMS2: Float64Array.from({ length: Math.round(seconds * 100) }, (_, i) => {
      const t = i * 0.01;
      return (
        Math.exp(-t / 4) * (2 * Math.sin(2 * Math.PI * 1.2 * t + phase) + 0.8 * Math.sin(2 * Math.PI * 6 * t))
      );
    }),
  });
}

/** A drawn figure and the number of curves (or, for the anchor plan, anchors) it should show. */
export interface DrawnFigure {
  svg: string;
  curves: number;
}

/**
 * Every kind of figure, each drawn from invented data when it is asked for: the four spectrum
 * plots, design, damping, RotD, floor, the three of the info command and the anchor plan.
 */
export const EVERY_FIGURE: Record<string, () => DrawnFigure> = {
  psa: () => ({ svg: psaFigure(inputs().spectrum), curves: 3 }),
  sd: () => ({ svg: sdFigure(inputs().spectrum, { lengthUnit: 'cm' }), curves: 3 }),
  psv: () => ({ svg: psvFigure(inputs().spectrum, { axes: 'linear' }), curves: 3 }),
  tripartite: () => ({ svg: tripartiteFigure(inputs().spectrum, { lengthUnit: 'cm' }), curves: 3 }),
  design: () => {
    const design = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
    const periodsS = Float64Array.from([0, ...logSpaced(0.01, 10, 60)]);
    return {
      svg: designFigure({ spectrum: design, periodsS, psaG: designPsaG(design, periodsS) }),
      curves: 1,
    };
  },
  damping: () => ({
    svg: dampingFigure({
      record: inputs().spectrum.record,
      methodDescription: 'test',
      comparison: compareDamping(inputs().spectrum),
    }),
    curves: 6,
  }),
  rotd: () => {
    const { record, grid } = inputs();
    const spectra = rotDSpectra(record, inventedRecord(15, 1), { periodsS: grid.periodsS, dampings: [0.05] });
    return { svg: rotdFigure({ spectra, methodDescription: 'test' }), curves: 3 };
  },
  floor: () => {
    const { record, grid } = inputs();
    const floorGrid = { periodsS: grid.periodsS, dampings: [0.05] };
    const building = { periodS: 0.5, damping: 0.05, modalFactor: 1.4 };
    const floor = floorSpectrum(record, building, floorGrid, 0.15);
    const svg = floorFigure({
      ground: responseSpectrum(record, floorGrid),
      floor: floor.spectrum,
      unbroadened: floor.unbroadened,
      broadening: 0.15,
      building,
      methodDescription: 'test',
    });
    return { svg, curves: 3 };
  },
  floorSet: () => {
    const { record, grid } = inputs();
    const building = { periodS: 0.5, damping: 0.05, modalFactor: 1.4 };
    // Two records by two dampings: one panel per damping, each with 2 records, the mean and the envelope.
    const set = floorSpectrumSet(
      [record, inventedRecord(12, 1)],
      building,
      { ...grid, dampings: [0.02, 0.05] },
      0.15,
    );
    const svg = floorSetFigure({
      set,
      labels: recordLabels(set.grounds),
      building,
      methodDescription: 'test',
    });
    return { svg, curves: 8 };
  },
  suite: () => {
    const { grid, spectrum } = inputs();
    // Three invented records (one of them with the nasty name), each scaled to an ASCE 7-16 target.
    const periodsS = Array.from(grid.periodsS);
    const records = [0, 1, 2].map((k) => ({
      name: k === 0 ? NASTY : `invented-${k}`,
      file: `in/${k}.csv`,
      pgaG: 0.3,
      psaG: spectrum.curves.map((c) =>
        Array.from(c.psaMS2, (v, i) => (v / 9.80665) * (1 + 0.3 * Math.sin(i + k))),
      ),
    }));
    const analysis = analyseSuite(
      records,
      { periodsS, dampings: grid.dampings as number[] },
      {
        target: asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 }),
        scaleEach: true,
        check: { fraction: 0.9, rangeS: [0.2, 2], rangeSource: 'test' },
      },
    );
    const d = analysis.target?.dampingIndex ?? 0;
    const svg = suiteFigure({
      periodsS,
      damping: grid.dampings[d],
      members: analysis.members.map((m) => ({ name: m.name, psaG: m.psaG[d] })),
      curve: analysis.statistics[d],
      scaled: true,
      target: { description: 'ASCE/SEI 7-16 (invented parameters)', psaG: analysis.target?.psaG ?? [] },
      check: analysis.check,
      methodDescription: 'test',
    });
    // 3 records, 2 band edges, median, mean, target, 0.9 × target.
    return { svg, curves: 9 };
  },
  histories: () => {
    const { record } = inputs();
    return {
      svg: historiesFigure({ ...record, ...integrateRecord(record) }, { lengthUnit: 'cm' }),
      curves: 3,
    };
  },
  husid: () => {
    const { record } = inputs();
    const measures = groundMotionMeasures(record, { bracketThresholdMS2: 0.5 });
    const svg = husidFigure({
      name: NASTY,
      dtS: record.dtS,
      husid: husidCurve(record.accelMS2, record.dtS),
      t5S: measures.t5S,
      t75S: measures.t75S,
      t95S: measures.t95S,
    });
    return { svg, curves: 1 };
  },
  fourier: () => {
    const { record } = inputs();
    const fas = fourierAmplitudeSpectrum(record.accelMS2, record.dtS);
    const svg = fourierFigure({
      name: NASTY,
      frequenciesHz: fas.frequenciesHz,
      amplitudeMS: fas.amplitudeMS,
      smoothedHz: fas.frequenciesHz.slice(1, 50),
      smoothedMS: fas.amplitudeMS.slice(1, 50),
    });
    return { svg, curves: 2 };
  },
  'ductility-ay': () => ({ svg: ductilityStrengthSvg(ductilityInputs().spectra), curves: 3 }),
  'ductility-ry': () => {
    const { spectra } = ductilityInputs();
    return { svg: ductilityReductionSvg(spectra, { references: referenceReductions(spectra) }), curves: 3 };
  },
  'ductility-demand': () => ({ svg: ductilityDemandSvg(ductilityInputs().demand), curves: 2 }),
  'anchor-plan': () => ({
    svg: anchorPlanSvg({
      title: `${NASTY}: anchor plan`,
      forceUnit: 'kN',
      lengthUnit: 'm',
      anchors: [
        { x: -0.8, y: -0.5, tension: 15.48 },
        { x: 0.8, y: -0.5, tension: 15.48 },
        { x: 0.8, y: 0.5, tension: 15.48 },
        { x: -0.8, y: 0.5, tension: 15.48 },
      ],
      governingAnchor: 0,
      directionDeg: 71.27,
      cgPlan: [0, 0],
      centroid: [0, 0],
      subtitle: ['invented'],
    }),
    curves: 4,
  }),
};

let shared:
  | { record: ReturnType<typeof inventedRecord>; grid: SpectrumOptions; spectrum: Spectrum }
  | undefined;

/** The invented record, its grid and its spectrum, computed once for all the figures. */
function inputs() {
  if (!shared) {
    const record = inventedRecord();
    const grid = { periodsS: [0, ...logSpaced(0.02, 5, 40)], dampings: [0.02, 0.05, 0.1] };
    shared = { record, grid, spectrum: responseSpectrum(record, grid) };
  }
  return shared;
}

let ductility:
  | {
      spectra: ReturnType<typeof constantDuctilitySpectra>;
      demand: ReturnType<typeof ductilityDemandSpectra>;
    }
  | undefined;

/**
 * Constant-ductility (μ = 1, 2, 4) and demand (R_y = 2, 4) spectra of a short invented record (600
 * samples) at 5% damping on six periods, T = 0 among them: the yielding engine is slow.
 */
export function ductilityInputs() {
  if (!ductility) {
    const record = inventedRecord(6);
    const model = { kind: 'elastoplastic' } as const;
    const periodsS = [0, 0.1, 0.2, 0.5, 1, 2];
    ductility = {
      spectra: constantDuctilitySpectra(record, {
        periodsS,
        dampings: [0.05],
        ductilities: [1, 2, 4],
        model,
      }),
      demand: ductilityDemandSpectra(record, {
        periodsS: periodsS.slice(1),
        dampings: [0.05],
        model,
        ry: [2, 4],
      }),
    };
  }
  return ductility;
}

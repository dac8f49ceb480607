import { logSpaced } from '../../src/oscillator/grid.js';
import { anchorPlanSvg } from '../../src/plot/anchor-plan-figure.js';
import { dampingFigure } from '../../src/plot/damping-figure.js';
import { designFigure } from '../../src/plot/design-figure.js';
import { floorFigure } from '../../src/plot/floor-figure.js';
import { fourierFigure } from '../../src/plot/fourier-figure.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { husidFigure } from '../../src/plot/husid-figure.js';
import { rotdFigure } from '../../src/plot/rotd-figure.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { fourierAmplitudeSpectrum } from '../../src/record/fourier.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { groundMotionMeasures, husidCurve } from '../../src/record/measures.js';
import { createRecord } from '../../src/record/record.js';
import { compareDamping } from '../../src/spectrum/damping.js';
import { asce716Spectrum, designPsaG } from '../../src/spectrum/design.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { responseSpectrum, type Spectrum, type SpectrumOptions } from '../../src/spectrum/spectrum.js';

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

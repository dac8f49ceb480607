import type { AnchorageAnalysis } from '../anchorage/anchorage.js';
import { centroid, EQUIPMENT_UNITS } from '../anchorage/equipment.js';
import { anchorPlanSvg } from '../plot/anchor-plan.js';
import { lineChart } from '../plot/line-chart.js';
import type { DampingComparison } from '../spectrum/damping.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import { STANDARD_GRAVITY_MS2 } from '../units.js';

const percent = (damping: number) => `${Number((damping * 100).toPrecision(6))}%`;

/** Periods above 0 and the matching values (a log period axis cannot show T = 0). */
function positive(periodsS: Float64Array, values: Float64Array): { x: number[]; y: number[] } {
  const x: number[] = [];
  const y: number[] = [];
  for (let p = 0; p < periodsS.length; p++) {
    if (periodsS[p] > 0 && Number.isFinite(values[p])) {
      x.push(periodsS[p]);
      y.push(values[p]);
    }
  }
  return { x, y };
}

/** PSA(ζ)/PSA(reference) against period, one curve per damping ratio (linear ratio axis). */
export function dampingRatioFigure(comparison: DampingComparison, recordName: string): string {
  return lineChart({
    title: `Damping comparison: PSA(ζ) / PSA(${percent(comparison.referenceDamping)})`,
    subtitle: [`Record: ${recordName}`],
    x: { title: 'Period T (s)', scale: 'log' },
    y: { title: `PSA(ζ) / PSA(${percent(comparison.referenceDamping)}) (–)`, scale: 'linear' },
    legendTitle: 'Damping:',
    series: comparison.curves.map((curve) => ({
      label: `ζ = ${percent(curve.damping)}`,
      ...positive(comparison.periodsS, curve.ratio),
    })),
    notes: [
      'Ratio of this record’s PSA at each damping to its PSA at the reference damping, period by period.',
    ],
  });
}

/** RotD50, RotD100 and the geometric mean at one damping ratio against period. */
export function rotdFigure(spectra: RotDSpectra, index = 0): string {
  const curve = spectra.curves[index];
  const g = (values: Float64Array) =>
    positive(
      spectra.periodsS,
      values.map((v) => v / STANDARD_GRAVITY_MS2),
    );
  return lineChart({
    title: `Two-component PSA at ζ = ${percent(curve.damping)}: RotD50, RotD100, geometric mean`,
    subtitle: spectra.records.map((r, i) => `Component ${i + 1}: ${r.name} (${r.source})`),
    x: { title: 'Period T (s)' },
    y: { title: 'Pseudo-acceleration PSA (g)' },
    legendTitle: 'Measure:',
    series: [
      { label: 'RotD100', ...g(curve.rotd100MS2) },
      { label: 'RotD50', ...g(curve.rotd50MS2) },
      { label: 'geometric mean', ...g(curve.geomeanMS2) },
    ],
    notes: [`Rotation angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}° (Boore 2010).`],
  });
}

/** The plan view of one equipment item's anchors, in its own units. */
export function anchorPlanFigure(analysis: AnchorageAnalysis): string {
  const e = analysis.equipment;
  const system = EQUIPMENT_UNITS[e.units];
  const l = (m: number) => m / system.mPerLength;
  const a = analysis.anchors;
  return anchorPlanSvg({
    title: `${e.name}: anchor plan and worst tensions`,
    forceUnit: system.force,
    lengthUnit: system.length,
    anchors: a.perAnchor.map((p) => ({ x: l(p.x), y: l(p.y), tension: p.tension / system.kNPerForce })),
    governingAnchor: a.governingAnchor,
    directionDeg: a.maxTensionDirectionDeg,
    cgPlan: [l(e.cgPlanM[0]), l(e.cgPlanM[1])],
    centroid: centroid(e.anchorsM).map(l) as [number, number],
    notes: [
      `Horizontal force for the anchors ${(analysis.horizontalForAnchorsKN / system.kNPerForce).toPrecision(4)} ${system.force} ` +
        `(${analysis.governing === 'code' ? 'ASCE 7-16 §13.3.1 code force' : 'record elastic demand'}); rigid base, elastic bolt group.`,
      'Demands only; anchor capacities are not checked.',
    ],
  });
}

import { wrapText } from '../base/caution.js';
import type {
  DemandCurve,
  DuctilityDemandSpectra,
  DuctilitySpectra,
  ElasticPeaks,
} from '../inelastic/ductility.js';
import { describeHysteresis } from '../inelastic/hysteresis.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';
import { DEMAND_DEFINITION } from './ductility-json.js';
import {
  assumptionLines,
  dampingLabel,
  type PeriodColumn,
  periodTable,
  pgaText,
  recordLine,
  terminalText,
} from './layout.js';

/** Width of a value column: four significant digits and a heading such as `μ = 1.5`. */
const WIDTH = 9;

/** The strength convention in one short line (its full text closes the table). */
export const CONVENTION_LINE = 'the largest strength giving each μ (several may); T = 0: A_y = PGA, R_y = 1';

function openingLines(record: SpectrumRecordInfo): string[] {
  return [
    `${recordLine(record)}, ${pgaText(record.pgaMS2)}`,
    ...record.processing.map((step) => `        processed: ${step.description}`),
  ];
}

const column = (heading: string, at: (p: number) => number): PeriodColumn => ({
  name: heading,
  heading,
  width: Math.max(WIDTH, heading.length + 1),
  at,
});

const elasticColumn = (peaks: ElasticPeaks) => column('elastic', (p) => peaks.psaG[p]);

/** A target ductility as a heading: `μ = 1.5`. */
const muHeading = (mu: number) => `μ = ${mu}`;

/** A given strength as a heading: `R_y = 4` or `A_y = 0.2g`. */
export function strengthHeading(strength: DemandCurve['strength']): string {
  return 'ry' in strength ? `R_y = ${strength.ry}` : `A_y = ${strength.ayG}g`;
}

/** The curves of one damping ratio, with its elastic peaks, in the order of the result. */
function byDamping<Curve extends { damping: number }>(
  elastic: readonly ElasticPeaks[],
  curves: readonly Curve[],
) {
  return elastic.map((peaks) => ({ peaks, curves: curves.filter((c) => c.damping === peaks.damping) }));
}

/** Cells whose achieved ductility is off its target by more than the tolerance (a jump across it). */
function jumpCount(spectra: DuctilitySpectra): number {
  let count = 0;
  for (const curve of spectra.curves) {
    curve.achievedDuctility.forEach((achieved, p) => {
      // T = 0 stays elastic by its convention (RIGID_CONVENTION), which is not a jump.
      const off = Math.abs(achieved / curve.ductility - 1) > spectra.tolerance * (1 + 1e-9);
      if (off && spectra.periodsS[p] > 0) count++;
    });
  }
  return count;
}

/**
 * The terminal table of constant-ductility spectra: the caution, the record, the model and the
 * strength convention in a line each; per damping, A_y (g) by period for each μ beside the elastic
 * PSA, then R_y; the method and the full convention at the end.
 */
export function ductilityTable(spectra: DuctilitySpectra): string {
  const { periodsS } = spectra;
  const out = [
    ...openingLines(spectra.record),
    `model   ${describeHysteresis(spectra.model)}`,
    `f_y     ${CONVENTION_LINE}`,
  ];
  for (const { peaks, curves } of byDamping(spectra.elastic, spectra.curves)) {
    const d = dampingLabel(peaks.damping);
    out.push('', `A_y (g) at ${d} damping: the elastic PSA, then the yield strength for each target μ`);
    const ay = curves.map((c) => column(muHeading(c.ductility), (p) => c.ayG[p]));
    out.push(...periodTable(periodsS, [elasticColumn(peaks), ...ay]));
    out.push('', `R_y = f_o/f_y at ${d} damping, for each target μ`);
    out.push(
      ...periodTable(
        periodsS,
        curves.map((c) => column(muHeading(c.ductility), (p) => c.ry[p])),
      ),
    );
  }
  const cells = spectra.curves.length * periodsS.length;
  const jumps = jumpCount(spectra);
  out.push('');
  if (jumps > 0)
    out.push(
      ...wrapText(
        `${jumps} of ${cells} cells: μ jumps across its target; the strength just above the jump is given, its achieved μ in the JSON and CSV`,
        92,
      ),
    );
  out.push(`(${periodsS.length} periods; --format json or csv for all of them)`);
  out.push(
    ...assumptionLines([
      `Yielding oscillator: ${describeHysteresis(spectra.model)}, mass-proportional viscous damping at the elastic frequency, at rest at the start; ${spectra.method}.`,
      `Strength reported: ${spectra.convention}.`,
      `Achieved ductility within ${spectra.tolerance * 100}% of the target except where it jumps; R_y = f_o/f_y, f_o the elastic strength of the same oscillator.`,
    ]),
  );
  return terminalText(out);
}

/**
 * The terminal table of ductility demand spectra: per damping, the demand μ by period for each given
 * strength, then the strength in the other measure (A_y for a given R_y, R_y for a given A_y).
 */
export function ductilityDemandTable(demand: DuctilityDemandSpectra): string {
  const { periodsS } = demand;
  const out = [...openingLines(demand.record), `model   ${describeHysteresis(demand.model)}`];
  for (const { peaks, curves } of byDamping(demand.elastic, demand.curves)) {
    const d = dampingLabel(peaks.damping);
    out.push('', `ductility demand μ = u_m/u_y at ${d} damping, for each given strength`);
    out.push(
      ...periodTable(
        periodsS,
        curves.map((c) => column(strengthHeading(c.strength), (p) => c.ductility[p])),
      ),
    );
    const givenRy = curves.length > 0 && 'ry' in curves[0].strength;
    if (givenRy) {
      out.push('', `A_y (g) at ${d} damping: the elastic PSA, then the yield strength`);
      const ay = curves.map((c) => column(strengthHeading(c.strength), (p) => c.ayG[p]));
      out.push(...periodTable(periodsS, [elasticColumn(peaks), ...ay]));
    } else {
      out.push('', `R_y = f_o/f_y at ${d} damping (elastic PSA in g beside)`);
      const ry = curves.map((c) => column(strengthHeading(c.strength), (p) => c.ry[p]));
      out.push(...periodTable(periodsS, [elasticColumn(peaks), ...ry]));
    }
  }
  out.push('', `(${periodsS.length} periods; --format json or csv for all of them)`);
  out.push(
    ...assumptionLines([
      `Yielding oscillator: ${describeHysteresis(demand.model)}, mass-proportional viscous damping at the elastic frequency, at rest at the start; ${demand.method}.`,
      `Demand: ${DEMAND_DEFINITION}.`,
    ]),
  );
  return terminalText(out);
}

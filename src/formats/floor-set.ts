import { CAUTION } from '../base/caution.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';
import { STANDARD_GRAVITY_MS2 as G, gFromMS2 } from '../base/units.js';
import { type BuildingMode, FLOOR_METHOD_DESCRIPTION } from '../spectrum/floor.js';
import { type FloorSpectrumSet, recordLabels } from '../spectrum/floor-set.js';
import type { SpectrumCurve } from '../spectrum/spectrum.js';
import { broadeningToJson, buildingToJson, floorAssumptions } from './floor.js';
import { frequenciesHz } from './frequency.js';
import {
  alignRight,
  assumptionLines,
  csvText,
  dampingLabel,
  formatPeriod,
  type PeriodColumn,
  pgaText,
  terminalText,
} from './layout.js';
import { curvesToJson, recordToJson, toG } from './spectrum-json.js';

/** The order of the operations, for every output of a set of floor spectra. */
function combinationLine(set: FloorSpectrumSet): string {
  const n = set.members.length;
  const first =
    set.broadening === null
      ? `Mean and envelope of ${n} floor spectra (one per ground record, none broadened)`
      : `Mean and envelope of ${n} floor spectra taken after broadening: each record's floor spectrum broadened on its own first`;
  return `${first}, then at each period and damping their arithmetic mean and their envelope (the largest of them); SD, PSV, PSA, SV and SA each combined on its own.`;
}

/**
 * The assumptions of a set of floor spectra: those of one floor spectrum (for the coarsest time
 * step, so that its sampling warning is not missed), then how the set is combined.
 */
export function floorSetAssumptions(set: FloorSpectrumSet): string[] {
  return [...floorAssumptions(set.members[0]), combinationLine(set)];
}

/** For each damping and period, the label of the record whose PSA is the envelope's (the first such). */
function governing(set: FloorSpectrumSet, labels: string[]): string[][] {
  return set.envelope.curves.map((curve, d) =>
    Array.from(curve.psaMS2, (value, p) => {
      const i = set.members.findIndex((m) => m.spectrum.curves[d].psaMS2[p] === value);
      return labels[Math.max(i, 0)];
    }),
  );
}

/**
 * The JSON of `quakesweep floor` with several records: each record's floor spectrum by its label,
 * then "mean" and "envelope" with the same curves (the envelope naming the record that governs
 * each period's PSA), the building, the broadening and the assumptions.
 */
export function floorSetToJson(set: FloorSpectrumSet, building: BuildingMode, assumptions: string[]) {
  const labels = recordLabels(set.members.map((m) => m.spectrum.record));
  const by = governing(set, labels);
  return {
    caution: CAUTION,
    method: set.method,
    method_description: FLOOR_METHOD_DESCRIPTION,
    periods_s: Array.from(set.periodsS),
    frequencies_hz: frequenciesHz(set.periodsS),
    building: buildingToJson(building),
    broadening: broadeningToJson(set.broadening, {
      applied: 'to each record before the mean and the envelope',
    }),
    records: set.members.map((member, i) => ({
      label: labels[i],
      record: recordToJson(member.spectrum.record),
      ground_pga_g: gFromMS2(set.grounds[i].pgaMS2),
      spectra: curvesToJson(member.spectrum.curves, set.periodsS),
      unbroadened_psa_g: member.unbroadened.curves.map((c) => ({
        damping: c.damping,
        psa_g: toG(c.psaMS2, set.periodsS),
      })),
    })),
    mean: {
      label: 'mean',
      records: set.members.length,
      pga_g: gFromMS2(set.mean.pgaMS2),
      spectra: curvesToJson(set.mean.curves, set.periodsS),
    },
    envelope: {
      label: 'envelope',
      records: set.members.length,
      pga_g: gFromMS2(set.envelope.pgaMS2),
      spectra: curvesToJson(set.envelope.curves, set.periodsS).map((curve, d) => ({
        ...curve,
        psa_governed_by: by[d],
      })),
    },
    assumptions,
  };
}

/**
 * The CSV of several floor spectra: one row per period and, for each damping, a PSA column (g)
 * per record, then the mean and the envelope (`psa_g@5%:marrowby-h1`, …, `psa_g@5%:mean`,
 * `psa_g@5%:envelope`). Wide rather than long so that a spreadsheet plots it as it stands (the
 * period column against the others) and reads one period across a row; PSA only, since SD = PSA/ω²
 * and PSV = PSA/ω follow from it at each period and the JSON holds every quantity.
 */
export function floorSetToCsv(set: FloorSpectrumSet, assumptions: string[]): string {
  const labels = recordLabels(set.members.map((m) => m.spectrum.record));
  const notes = [
    ...set.members.map(
      (m, i) =>
        `record: ${labels[i]}; ${m.spectrum.record.source}; npts ${m.floor.accelMS2.length}; dt ${formatNumber(m.floor.dtS, 6)} s`,
    ),
    `method: ${set.method}`,
    `building: ${set.members[0].floor.processing.at(-1)?.description ?? ''}`,
    'columns: floor PSA (g) of each record, their mean and their envelope, per damping',
    ...assumptions.slice(-2),
  ];
  const columns: PeriodColumn[] = set.envelope.curves.flatMap((curve, d) => {
    const name = (label: string) => `psa_g@${dampingLabel(curve.damping)}:${label}`;
    const psaG = (c: SpectrumCurve) => (p: number) => c.psaMS2[p] / G;
    return [
      ...set.members.map((m, i) => ({ name: name(labels[i]), at: psaG(m.spectrum.curves[d]) })),
      { name: name('mean'), at: psaG(set.mean.curves[d]) },
      { name: name('envelope'), at: psaG(curve) },
    ];
  });
  return csvText(notes, set.periodsS, columns);
}

/** The largest value of a curve and its period (the first where it is reached). */
export function peakOf(
  periodsS: Float64Array,
  values: Float64Array,
): { value: number; periodS: number; index: number } {
  let best = 0;
  for (let p = 1; p < values.length; p++) if (values[p] > values[best]) best = p;
  return { value: values[best], periodS: periodsS[best], index: best };
}

/**
 * The terminal summary of several floor spectra: the records and the building, then the peak floor
 * PSA of each record, of the mean and of the envelope with the period where it is reached, per damping.
 */
export function floorSetTable(set: FloorSpectrumSet, building: BuildingMode, assumptions: string[]): string {
  const labels = recordLabels(set.members.map((m) => m.spectrum.record));
  const rows: { label: string; curves: readonly SpectrumCurve[] }[] = [
    ...set.members.map((m, i) => ({ label: labels[i], curves: m.spectrum.curves })),
    { label: 'mean', curves: set.mean.curves },
    { label: 'envelope', curves: set.envelope.curves },
  ];
  const first = Math.max(14, ...rows.map((r) => r.label.length));
  const widths = [first, ...set.envelope.curves.flatMap(() => [17, 10])];
  const heading = set.envelope.curves.flatMap((c) => {
    const d = dampingLabel(c.damping);
    return [`peak PSA g @${d}`, `at T (s)`];
  });
  const by = governing(set, labels);
  const peakLabels = set.envelope.curves.map((c, d) => by[d][peakOf(set.periodsS, c.psaMS2).index]);
  const from = [...new Set(peakLabels)].join(', ');
  const table = rows.map((row, r) => {
    const cells = row.curves.flatMap((c) => {
      const peak = peakOf(set.periodsS, c.psaMS2);
      return [formatSignificant(peak.value / G), formatPeriod(peak.periodS)];
    });
    const line = [row.label.padEnd(first), alignRight(cells, widths.slice(1))].join(' ');
    return r === rows.length - 1 ? `${line}  (from ${from})` : line;
  });
  const n = set.members.length;
  return terminalText([
    `records   ${n} ground records through the same building`,
    ...set.members.map(
      (m, i) =>
        `  ${labels[i]} (${m.spectrum.record.source}), ground ${pgaText(set.grounds[i].pgaMS2)}; floor ${pgaText(m.unbroadened.record.pgaMS2)}`,
    ),
    `building  T_b ${building.periodS} s, ζ_b ${building.damping}, Γφ ${building.modalFactor}`,
    `method    ${FLOOR_METHOD_DESCRIPTION}`,
    '',
    [''.padEnd(first), alignRight(heading, widths.slice(1))].join(' '),
    ...table,
    `(${set.periodsS.length} periods; --format json or csv for every period of every record, the mean and the envelope)`,
    ...assumptionLines(assumptions),
  ]);
}

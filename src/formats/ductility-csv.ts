import { formatNumber } from '../base/numbers.js';
import type {
  DemandCurve,
  DuctilityCurve,
  DuctilityDemandSpectra,
  DuctilitySpectra,
  ElasticPeaks,
} from '../inelastic/ductility.js';
import { describeHysteresis } from '../inelastic/hysteresis.js';
import type { SpectrumRecordInfo } from '../spectrum/spectrum.js';
import { DEMAND_DEFINITION } from './ductility-json.js';
import { columnsByDamping, csvText, dampingLabel, type PeriodColumn, type Quantity } from './layout.js';

/** A target ductility in a column name, e.g. `mu=1.5`. */
export const ductilityTag = (mu: number) => `mu=${mu}`;

/** A given strength in a column name: `ry=4` or `ay=0.2g`. */
export function strengthTag(strength: DemandCurve['strength']): string {
  return 'ry' in strength ? `ry=${strength.ry}` : `ay=${strength.ayG}g`;
}

/** The columns of every curve, each named `<quantity>@<damping>/<tag>`, e.g. `ay_g@5%/mu=2`. */
export function columnsByCurve<Curve extends { damping: number }>(
  curves: readonly Curve[],
  tag: (curve: Curve) => string,
  quantities: readonly Quantity<Curve>[],
): PeriodColumn[] {
  return curves.flatMap((curve) => {
    const label = `${dampingLabel(curve.damping)}/${tag(curve)}`;
    return quantities.map((q) => ({
      ...q,
      name: `${q.name}@${label}`,
      heading: q.heading,
      at: (p: number) => q.at(curve, p),
    }));
  });
}

/** The elastic peaks' columns, `sd_m@5%` and `psa_g@5%`. */
export function elasticColumns(elastic: readonly ElasticPeaks[]): PeriodColumn[] {
  return columnsByDamping(elastic, [
    { name: 'sd_m', at: (e, p) => e.sdM[p] },
    { name: 'psa_g', at: (e, p) => e.psaG[p] },
  ]);
}

const CURVE_QUANTITIES: Quantity<DuctilityCurve>[] = [
  { name: 'ay_g', at: (c, p) => c.ayG[p] },
  { name: 'uy_m', at: (c, p) => c.uyM[p] },
  { name: 'um_m', at: (c, p) => c.umM[p] },
  { name: 'ry', at: (c, p) => c.ry[p] },
  { name: 'strength_ratio', at: (c, p) => c.strengthRatio[p] },
  { name: 'achieved_ductility', at: (c, p) => c.achievedDuctility[p] },
];

const DEMAND_QUANTITIES: Quantity<DemandCurve>[] = [
  { name: 'ductility', at: (c, p) => c.ductility[p] },
  { name: 'ay_g', at: (c, p) => c.ayG[p] },
  { name: 'uy_m', at: (c, p) => c.uyM[p] },
  { name: 'um_m', at: (c, p) => c.umM[p] },
  { name: 'ry', at: (c, p) => c.ry[p] },
  { name: 'yield_events', at: (c, p) => c.yieldEvents[p] },
];

function recordNotes(record: SpectrumRecordInfo): string[] {
  return [
    `record: ${record.name}; npts ${record.npts}; dt ${formatNumber(record.dtS, 6)} s`,
    ...record.processing.map((step) => `processing: ${step.description}`),
  ];
}

/**
 * Constant-ductility spectra: one row per period; the elastic SD and PSA per damping, then A_y, u_y,
 * u_m, R_y, f̄_y and the achieved μ per damping and target μ; the caution, record, model, method,
 * strength convention and tolerance on leading `#` lines.
 */
export function ductilityToCsv(spectra: DuctilitySpectra): string {
  const notes = [
    ...recordNotes(spectra.record),
    `model: ${describeHysteresis(spectra.model)}`,
    `method: ${spectra.method}`,
    `strength convention: ${spectra.convention}`,
    `ductility tolerance: ${spectra.tolerance} of the target`,
  ];
  return csvText(notes, spectra.periodsS, [
    ...elasticColumns(spectra.elastic),
    ...columnsByCurve(spectra.curves, (c) => ductilityTag(c.ductility), CURVE_QUANTITIES),
  ]);
}

/** Ductility demand spectra: as ductilityToCsv, a column group per damping and given strength. */
export function ductilityDemandToCsv(demand: DuctilityDemandSpectra): string {
  const notes = [
    ...recordNotes(demand.record),
    `model: ${describeHysteresis(demand.model)}`,
    `method: ${demand.method}`,
    `demand: ${DEMAND_DEFINITION}`,
  ];
  return csvText(notes, demand.periodsS, [
    ...elasticColumns(demand.elastic),
    ...columnsByCurve(demand.curves, (c) => strengthTag(c.strength), DEMAND_QUANTITIES),
  ]);
}

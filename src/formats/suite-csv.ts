import type { SuiteAnalysis } from '../batch/suite.js';
import { SUITE_CHECK_NOTE } from '../batch/suite-check.js';
import { csvText, dampingLabel, type PeriodColumn } from './layout.js';

/** A number for a note a person reads: four significant figures. */
const r4 = (value: number) => Number(value.toPrecision(4));

/**
 * suite.csv: one row per period; per damping ratio the suite's mean, median, σ of ln PSA and the
 * band median·exp(∓σ) (the 16th and 84th percentiles of the log-normal fit), then every record's
 * PSA (scaled when the records were scaled) in its own column; with a target, at the target's
 * damping, the target, the ratio of the mean to it and whether the period is in the check range.
 * Leading `#` lines: the caution, how the numbers were made, each record's factor and the check.
 */
export function suiteToCsv(analysis: SuiteAnalysis, periodsS: readonly number[]): string {
  const { members, statistics, target, scaling, check, warnings } = analysis;
  const columns: PeriodColumn[] = [];
  statistics.forEach((curve, d) => {
    const at = dampingLabel(curve.damping);
    columns.push(
      { name: `mean_psa_g@${at}`, at: (p) => curve.mean_psa_g[p] },
      { name: `median_psa_g@${at}`, at: (p) => curve.median_psa_g[p] },
      { name: `sigma_ln_psa@${at}`, at: (p) => curve.sigma_ln_psa[p] },
      { name: `minus_1_sigma_psa_g@${at}`, at: (p) => curve.p16_psa_g[p] },
      { name: `plus_1_sigma_psa_g@${at}`, at: (p) => curve.p84_psa_g[p] },
    );
    if (target !== undefined && d === target.dampingIndex) {
      columns.push({ name: `target_psa_g@${at}`, at: (p) => target.psaG[p] });
      if (check !== undefined) {
        columns.push(
          { name: `ratio_mean_to_target@${at}`, at: (p) => check.ratios[p] },
          { name: 'in_check_range', at: (p) => (check.inRange[p] ? 1 : 0) },
        );
      }
    }
    for (const member of members)
      columns.push({ name: `${member.name}_psa_g@${at}`, at: (p) => member.psaG[d][p] });
  });
  const notes = [
    `suite of ${members.length} records; per-record columns <record>_psa_g@<damping> ${scaling ? 'are scaled by the factors below' : 'are as read and processed'}`,
    'band: minus_1_sigma = median·exp(−σ), plus_1_sigma = median·exp(+σ), σ = sigma_ln_psa (log-normal fit, n − 1)',
    ...warnings.map((w) => `warning: ${w}`),
  ];
  if (target !== undefined)
    notes.push(`target: ${target.spectrum.description} (at ${dampingLabel(target.damping)})`);
  if (scaling !== undefined) {
    notes.push(`scaling criterion: ${scaling.criterion}`);
    for (const r of scaling.records)
      notes.push(
        `scale factor ${r.name}: ${r4(r.factor)} over ${r4(r.rangeS[0])}-${r4(r.rangeS[1])} s (${r.periodCount} periods)`,
      );
  }
  if (check !== undefined) {
    notes.push(
      `suite check: ${check.pass ? 'PASS' : 'FAIL'}; least mean/target ${r4(check.worstRatio)} at T = ${r4(check.worstPeriodS)} s against ${check.fraction}; range ${r4(check.rangeS[0])}-${r4(check.rangeS[1])} s (${check.rangeSource}), ${check.periodCount} grid periods`,
      `suite check criterion: ${check.criterion}`,
      SUITE_CHECK_NOTE,
      ...check.warnings.map((w) => `warning: ${w}`),
    );
  }
  return csvText(notes, Float64Array.from(periodsS), columns);
}

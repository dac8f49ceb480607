import { CAUTION, cautionLines } from '../base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { DampingComparison } from '../spectrum/damping.js';
import type { Spectrum } from '../spectrum/spectrum.js';
import { dampingLabel } from './spectrum-csv.js';
import { recordToJson, toG } from './spectrum-json.js';
import { type PeriodColumn, periodTable } from './spectrum-table.js';

const SOURCES = {
  ec8_eta: 'EN 1998-1:2004 §3.2.2.2, Eq. 3.6: η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent; ratio η(ξ)/η(5%)',
  newmark_hall_1982:
    'Newmark and Hall (1982), median amplification factors 3.21 − 0.68 ln ξ (acceleration), 2.31 − 0.41 ln ξ (velocity), 1.82 − 0.27 ln ξ (displacement), ξ in percent; ratio at ξ to at 5% (coefficients from memory)',
};

const nullable = (value: number | null) => (value === null || Number.isNaN(value) ? null : value);

export function dampingToJson(spectrum: Spectrum, comparison: DampingComparison, added: boolean) {
  return {
    caution: CAUTION,
    record: recordToJson(spectrum.record),
    method: spectrum.method,
    method_description: METHOD_DESCRIPTIONS[spectrum.method],
    reference_damping: comparison.referenceDamping,
    reference_added: added,
    published_sources: SOURCES,
    periods_s: Array.from(comparison.periodsS),
    spectra: comparison.curves.map((curve) => ({
      damping: curve.damping,
      psa_g: toG(curve.psaMS2),
      ratio_to_reference: Array.from(curve.ratio, nullable),
      geometric_mean_ratio: nullable(curve.geometricMeanRatio),
      published: {
        ec8_eta_ratio: curve.published.ec8Eta,
        newmark_hall_1982_ratio: {
          acceleration: curve.published.newmarkHall.acceleration,
          velocity: curve.published.newmarkHall.velocity,
          displacement: curve.published.newmarkHall.displacement,
        },
      },
    })),
  };
}

export function dampingToCsv(spectrum: Spectrum, comparison: DampingComparison): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  lines.push(`# record: ${spectrum.record.name.replace(/[\r\n]+/g, ' ')}; method: ${spectrum.method}`);
  lines.push(`# reference damping: ${dampingLabel(comparison.referenceDamping)}`);
  for (const curve of comparison.curves) {
    const nh = curve.published.newmarkHall;
    lines.push(
      `# published ratio at ${dampingLabel(curve.damping)}: EC8 eta ${curve.published.ec8Eta}; Newmark-Hall acceleration ${nh.acceleration ?? ''} velocity ${nh.velocity ?? ''} displacement ${nh.displacement ?? ''}`,
    );
  }
  const header = ['period_s'];
  for (const curve of comparison.curves) header.push(`psa_g@${dampingLabel(curve.damping)}`);
  for (const curve of comparison.curves) header.push(`ratio@${dampingLabel(curve.damping)}`);
  lines.push(header.join(','));
  for (let p = 0; p < comparison.periodsS.length; p++) {
    const row = [String(comparison.periodsS[p])];
    for (const curve of comparison.curves) row.push(String(curve.psaMS2[p] / STANDARD_GRAVITY_MS2));
    for (const curve of comparison.curves)
      row.push(Number.isNaN(curve.ratio[p]) ? '' : String(curve.ratio[p]));
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

export function dampingTable(spectrum: Spectrum, comparison: DampingComparison, added: boolean): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  const r = spectrum.record;
  out.push('', `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dtS} s`);
  out.push(`method  ${METHOD_DESCRIPTIONS[spectrum.method]}`);
  out.push(`ratios  PSA(ξ)/PSA(5%)${added ? ' (5% added as the reference)' : ''}`, '');
  const f = (value: number | null) => (value === null || Number.isNaN(value) ? '-' : value.toFixed(3));
  out.push(
    `${'ξ'.padStart(7)} ${'record'.padStart(8)} ${'EC8 η'.padStart(8)} ${'NH acc'.padStart(8)} ${'NH vel'.padStart(8)} ${'NH disp'.padStart(8)}`,
  );
  for (const curve of comparison.curves) {
    const nh = curve.published.newmarkHall;
    out.push(
      [
        dampingLabel(curve.damping).padStart(7),
        f(curve.geometricMeanRatio).padStart(8),
        f(curve.published.ec8Eta).padStart(8),
        f(nh.acceleration).padStart(8),
        f(nh.velocity).padStart(8),
        f(nh.displacement).padStart(8),
      ].join(' '),
    );
  }
  out.push('(record: geometric mean of the ratio over the periods above 0 s)', '');
  const columns = comparison.curves.flatMap((curve): PeriodColumn[] => {
    const d = dampingLabel(curve.damping);
    return [
      { heading: `PSA g @${d}`, width: 13, at: (p) => curve.psaMS2[p] / STANDARD_GRAVITY_MS2 },
      { heading: `ratio @${d}`, width: 12, at: (p) => curve.ratio[p], format: f },
    ];
  });
  out.push(...periodTable(comparison.periodsS, columns));
  out.push(`(${comparison.periodsS.length} periods; --format json or csv for all of them)`);
  return `${out.join('\n')}\n`;
}

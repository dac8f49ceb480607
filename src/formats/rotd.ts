import { CAUTION, cautionLines } from '../base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { RotDSpectra } from '../spectrum/rotd.js';
import { dampingLabel } from './spectrum-csv.js';
import { recordToJson, toG } from './spectrum-json.js';
import { type PeriodColumn, periodTable } from './spectrum-table.js';

function notes(spectra: RotDSpectra): string[] {
  const out = [
    `PSA(θ) = ω² max|u₁ cos θ + u₂ sin θ| over ${180 / spectra.angleStepDeg} angles 0 ≤ θ < 180° in steps of ${spectra.angleStepDeg}°; RotD50 is the median over angles, RotD100 the largest (Boore 2010); geometric mean √(PSA₁ PSA₂) of the components as recorded`,
  ];
  if (spectra.paddedSamples > 0) {
    out.push(`the shorter component was padded with ${spectra.paddedSamples} zero samples (ground at rest)`);
  }
  return out;
}

export function rotdToJson(spectra: RotDSpectra) {
  return {
    caution: CAUTION,
    records: spectra.records.map(recordToJson),
    method: spectra.method,
    method_description: METHOD_DESCRIPTIONS[spectra.method],
    angle_step_deg: spectra.angleStepDeg,
    padded_samples: spectra.paddedSamples,
    notes: notes(spectra),
    periods_s: Array.from(spectra.periodsS),
    spectra: spectra.curves.map((curve) => ({
      damping: curve.damping,
      rotd50_g: toG(curve.rotd50MS2),
      rotd100_g: toG(curve.rotd100MS2),
      geomean_g: toG(curve.geomeanMS2),
    })),
  };
}

export function rotdToCsv(spectra: RotDSpectra): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  for (const record of spectra.records) {
    lines.push(`# record: ${record.name.replace(/[\r\n]+/g, ' ')}; npts ${record.npts}; dt ${record.dtS} s`);
  }
  lines.push(`# method: ${spectra.method}`);
  for (const note of notes(spectra)) lines.push(`# ${note}`);
  const header = ['period_s'];
  for (const curve of spectra.curves) {
    const d = dampingLabel(curve.damping);
    header.push(`rotd50_g@${d}`, `rotd100_g@${d}`, `geomean_g@${d}`);
  }
  lines.push(header.join(','));
  for (let p = 0; p < spectra.periodsS.length; p++) {
    const row = [String(spectra.periodsS[p])];
    for (const curve of spectra.curves) {
      row.push(
        String(curve.rotd50MS2[p] / STANDARD_GRAVITY_MS2),
        String(curve.rotd100MS2[p] / STANDARD_GRAVITY_MS2),
        String(curve.geomeanMS2[p] / STANDARD_GRAVITY_MS2),
      );
    }
    lines.push(row.join(','));
  }
  return `${lines.join('\n')}\n`;
}

export function rotdTable(spectra: RotDSpectra): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  out.push('');
  for (const r of spectra.records) {
    out.push(
      `record  ${r.name} (${r.source}), ${r.npts} samples at ${r.dtS} s, PGA ${(r.pgaMS2 / STANDARD_GRAVITY_MS2).toFixed(4)} g`,
    );
  }
  out.push(`method  ${METHOD_DESCRIPTIONS[spectra.method]}`);
  for (const note of notes(spectra)) out.push(`note    ${note}`);
  out.push('');
  const columns = spectra.curves.flatMap((curve): PeriodColumn[] => {
    const d = dampingLabel(curve.damping);
    return [
      { heading: `RotD50 g @${d}`, width: 15, at: (p) => curve.rotd50MS2[p] / STANDARD_GRAVITY_MS2 },
      { heading: `RotD100 g @${d}`, width: 16, at: (p) => curve.rotd100MS2[p] / STANDARD_GRAVITY_MS2 },
      { heading: `geomean g @${d}`, width: 16, at: (p) => curve.geomeanMS2[p] / STANDARD_GRAVITY_MS2 },
    ];
  });
  out.push(...periodTable(spectra.periodsS, columns));
  out.push(`(${spectra.periodsS.length} periods; --format json or csv for all of them)`);
  return `${out.join('\n')}\n`;
}

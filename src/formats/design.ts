import { CAUTION, cautionLines } from '../base/caution.js';
import type { DesignSpectrum } from '../spectrum/design.js';

export function designToJson(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array) {
  return {
    caution: CAUTION,
    code: spectrum.code,
    description: spectrum.description,
    parameters: spectrum.parameters,
    damping: spectrum.damping ?? null,
    periods_s: Array.from(periodsS),
    psa_g: Array.from(psaG),
  };
}

/** The caution and the description on `#` lines, then `period_s,psa_g` (readable again by --table). */
export function designToCsv(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  const lines = cautionLines().map((line) => `# ${line}`);
  lines.push(`# spectrum: ${spectrum.description.replace(/[\r\n]+/g, ' ')}`);
  lines.push('period_s,psa_g');
  for (let i = 0; i < periodsS.length; i++) lines.push(`${periodsS[i]},${psaG[i]}`);
  return `${lines.join('\n')}\n`;
}

export function designTable(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  const out = cautionLines(92).map((line) => `! ${line}`);
  out.push('', spectrum.description, '', `${'T (s)'.padStart(10)} ${'PSA (g)'.padStart(12)}`);
  for (let i = 0; i < periodsS.length; i++) {
    out.push(
      `${Number(periodsS[i].toPrecision(4)).toString().padStart(10)} ${psaG[i].toPrecision(5).padStart(12)}`,
    );
  }
  return `${out.join('\n')}\n`;
}

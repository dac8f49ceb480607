import { CAUTION } from '../base/caution.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';
import type { DesignSpectrum } from '../spectrum/design.js';
import { frequenciesHz } from './frequency.js';
import { alignRight, csvText, terminalText } from './layout.js';

export function designToJson(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array) {
  return {
    caution: CAUTION,
    code: spectrum.code,
    description: spectrum.description,
    parameters: spectrum.parameters,
    damping: spectrum.damping ?? null,
    periods_s: Array.from(periodsS),
    frequencies_hz: frequenciesHz(periodsS),
    psa_g: Array.from(psaG),
  };
}

/**
 * The caution and the description on `#` lines, then `period_s,frequency_hz,psa_g` (readable
 * again by --table, which passes the frequency over).
 */
export function designToCsv(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  return csvText([`spectrum: ${spectrum.description}`], periodsS, [{ name: 'psa_g', at: (p) => psaG[p] }]);
}

export function designTable(spectrum: DesignSpectrum, periodsS: Float64Array, psaG: Float64Array): string {
  const widths = [10, 12];
  const rows = Array.from(psaG, (psa, i) =>
    alignRight([formatNumber(periodsS[i]), formatSignificant(psa)], widths),
  );
  const header = spectrum.vertical ? ['T_v (s)', 'S_av (g)'] : ['T (s)', 'PSA (g)'];
  return terminalText([spectrum.description, '', alignRight(header, widths), ...rows]);
}

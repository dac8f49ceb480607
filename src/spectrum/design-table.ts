import { inputError } from '../base/errors.js';
import { checkPeriod, type DesignSpectrum } from './design.js';
import { interpolateSpectrum } from './interpolate.js';

/** A tabulated spectrum: periods (s, strictly increasing) and PSA (g, positive). */
export interface SpectrumTable {
  periodsS: Float64Array;
  psaG: Float64Array;
}

const SEPARATOR = /[\s,;]+/;
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

/**
 * Read a two-column table of period (s) and PSA (g). Blank lines and lines starting with `#` are
 * skipped, and one header line is allowed before the first row; when that header names a
 * `frequency_hz` column (as the CSV of `quakesweep design` does, empty at T = 0), the rows are
 * read as comma-separated and that column is passed over. Periods must be ≥ 0 and strictly
 * increasing (T = 0 only as the first row); PSA must be positive, since it is interpolated on a
 * log scale. Errors name `source` and the line.
 */
export function readSpectrumTable(text: string, source: string): SpectrumTable {
  const periods: number[] = [];
  const values: number[] = [];
  let headerSeen = false;
  let frequencyColumn = -1;
  const lines = text.replace(/^\uFEFF/, '').split('\n');
  for (let index = 0; index < lines.length; index++) {
    const place = { file: source, line: index + 1 };
    const trimmed = lines[index].trim();
    if (trimmed === '' || trimmed.startsWith('#')) continue;
    const fields =
      frequencyColumn < 0
        ? trimmed.split(SEPARATOR).filter((field) => field !== '')
        : trimmed
            .split(',')
            .map((field) => field.trim())
            .filter((_, i) => i !== frequencyColumn);
    if (!fields.every((field) => NUMBER.test(field))) {
      if (periods.length === 0 && !headerSeen) {
        headerSeen = true;
        frequencyColumn = fields.indexOf('frequency_hz');
        continue;
      }
      const bad = fields.find((field) => !NUMBER.test(field));
      throw inputError(`'${bad}' is not a number`, place);
    }
    if (fields.length !== 2) {
      throw inputError(`expected 2 columns (period in s, PSA in g), found ${fields.length}`, place);
    }
    const periodS = Number(fields[0]);
    const psa = Number(fields[1]);
    if (periodS < 0) throw inputError(`period ${periodS} s is negative`, place);
    if (periods.length > 0 && !(periodS > periods[periods.length - 1])) {
      throw inputError(`periods must increase: ${periodS} s follows ${periods[periods.length - 1]} s`, place);
    }
    if (!(psa > 0) || !Number.isFinite(psa)) {
      throw inputError(`PSA ${psa} g must be positive (the table is interpolated on a log scale)`, place);
    }
    periods.push(periodS);
    values.push(psa);
  }
  if (periods.length < 2) {
    throw inputError(`a spectrum table needs at least 2 rows, found ${periods.length}`, { file: source });
  }
  return { periodsS: Float64Array.from(periods), psaG: Float64Array.from(values) };
}

/**
 * A design spectrum from a table, read by interpolateSpectrum (log–log between rows, linear in T
 * after a T = 0 first row). Outside the table it is not extrapolated: evaluation there is an error.
 */
export function tableSpectrum(table: SpectrumTable, source: string): DesignSpectrum {
  const { periodsS, psaG } = table;
  const last = periodsS.length - 1;
  return {
    code: 'table',
    description: `user spectrum from ${source}: ${periodsS.length} rows, ${periodsS[0]} s to ${periodsS[last]} s, log–log interpolation${periodsS[0] === 0 ? ' (linear in T below the first positive period)' : ''}`,
    parameters: { source, rows: periodsS.length },
    damping: undefined,
    minPeriodS: periodsS[0],
    maxPeriodS: periodsS[last],
    tabulatedPeriodsS: periodsS,
    psaG(periodS: number): number {
      checkPeriod(this, periodS);
      return interpolateSpectrum(periodsS, psaG, periodS)?.value ?? Number.NaN;
    },
  };
}

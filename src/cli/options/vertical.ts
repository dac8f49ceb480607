import { usageError } from '../../base/errors.js';
import type { DesignSpectrum } from '../../spectrum/design.js';
import { type VerticalEdition, verticalSpectrum } from '../../spectrum/vertical.js';

/** The options the vertical design spectrum reads (the rest of `design`'s options are refused). */
export interface VerticalCliOptions {
  vertical?: boolean;
  code?: string;
  sds?: string;
  ss?: string;
  siteClass?: string;
}

/** Options of `design` that belong to another spectrum than the vertical one. */
const NOT_VERTICAL = ['sd1', 'tl', 'type', 'ground', 'ag', 'damping', 'table', 'multiPeriod'] as const;

/**
 * The §11.9 design vertical spectrum of `design --vertical --code asce7-16|asce7-22 --sds G
 * --ss G --site-class X`: S_DS and S_S in g; --sd1 and --tl are not needed and refused, as are
 * the Eurocode 8 and table options.
 */
export function verticalFromOptions(options: VerticalCliOptions & Record<string, unknown>): DesignSpectrum {
  const code = options.code?.trim().toLowerCase();
  if (code !== 'asce7-16' && code !== 'asce7-22') {
    throw usageError(
      `--vertical: give --code asce7-16 or --code asce7-22 (the §11.9 vertical spectrum)${code === undefined ? '' : `, not '${options.code}'`}`,
    );
  }
  for (const key of NOT_VERTICAL) {
    if (options[key] !== undefined)
      throw usageError(`--${key === 'multiPeriod' ? 'multi-period' : key} does not apply to --vertical`);
  }
  const number = (flag: string, text: string | undefined): number => {
    if (text === undefined || text.trim() === '') throw usageError(`--vertical needs ${flag}`);
    const value = Number(text);
    if (!Number.isFinite(value)) throw usageError(`${flag} '${text}' is not a number`);
    return value;
  };
  if (options.siteClass === undefined) throw usageError('--vertical needs --site-class');
  return verticalSpectrum({
    edition: code as VerticalEdition,
    sdsG: number('--sds', options.sds),
    ssG: number('--ss', options.ss),
    siteClass: options.siteClass,
  });
}

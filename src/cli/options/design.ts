import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { asce722MultiPeriodSpectrum } from '../../spectrum/asce722.js';
import type { DesignSpectrum } from '../../spectrum/design.js';
import { readSpectrumTable, tableSpectrum } from '../../spectrum/design-table.js';
import { CODE_KEYS, type CodeTarget, codeTarget, DESIGN_CODES, isDesignCode } from '../../spectrum/target.js';
import { type VerticalCliOptions, verticalFromOptions } from './vertical.js';

/** The options of the `design` command: the spectrum and the periods it is given at. */
export interface DesignCliOptions extends VerticalCliOptions {
  code?: string;
  sds?: string;
  sd1?: string;
  tl?: string;
  multiPeriod?: string;
  type?: string;
  ground?: string;
  ag?: string;
  damping?: string;
  table?: string;
  periods?: string;
  frequencies?: string;
}

export function addDesignOptions(command: Command): Command {
  return command
    .option('--code <code>', 'asce7-16, asce7-22 or ec8')
    .option('--sds <g>', 'ASCE 7-16, and 7-22 two-period: S_DS, g')
    .option('--sd1 <g>', 'ASCE 7-16, and 7-22 two-period: S_D1, g')
    .option('--tl <s>', 'ASCE 7-16, and 7-22 two-period: long-period transition period T_L, s')
    .option(
      '--multi-period <file>',
      'ASCE 7-22 §11.4.5.1: the site’s multi-period design spectrum, a two-column CSV of period (s) and S_a (g)',
    )
    .option('--type <n>', 'Eurocode 8: spectrum type, 1 or 2')
    .option('--ground <type>', 'Eurocode 8: ground type A, B, C, D or E')
    .option('--ag <g>', 'Eurocode 8: design ground acceleration on type A ground a_g, g')
    .option('--damping <ratio>', 'Eurocode 8: viscous damping for η, fraction or percentage (default 5%)')
    .option('--table <file>', 'a two-column CSV of period (s) and PSA (g) instead of a code')
    .option(
      '--vertical',
      'ASCE 7-16/7-22: the §11.9 design vertical spectrum S_av (needs --sds, --ss, --site-class)',
    )
    .option('--ss <g>', 'with --vertical: the MCE_R short-period S_S, g (for C_v, Table 11.9-1)')
    .option('--site-class <class>', 'with --vertical: site class (7-16: A–F; 7-22 also BC, CD, DE)');
}

/** Build the design spectrum the options describe, reading the table file if one is named. */
export function designFromOptions(options: DesignCliOptions): DesignSpectrum {
  if (options.vertical) return verticalFromOptions({ ...options });
  for (const key of ['ss', 'siteClass'] as const) {
    if (options[key] !== undefined)
      throw usageError(`--${key === 'ss' ? 'ss' : 'site-class'} applies to --vertical only`);
  }
  const code = options.code?.trim().toLowerCase();
  const fields = { ...options, 'multi-period': options.multiPeriod };
  if (options.table !== undefined) {
    if (code === 'asce7-22')
      throw usageError('--table does not apply to --code asce7-22: its site table is --multi-period FILE');
    if (code !== undefined) throw usageError('give either --code or --table, not both');
    refuse(
      fields,
      DESIGN_CODES.flatMap((c) => CODE_KEYS[c]),
      '--table',
    );
    return loadTableSpectrum(options.table);
  }
  if (code === undefined) {
    if (options.multiPeriod !== undefined) throw usageError('--multi-period needs --code asce7-22');
    throw usageError(`choose a spectrum: ${words(DESIGN_CODES.map((c) => `--code ${c}`))} or --table FILE`);
  }
  if (!isDesignCode(code)) throw usageError(`--code '${options.code}': use ${words(DESIGN_CODES, ' or ')}`);
  const own: readonly string[] = CODE_KEYS[code];
  const others = DESIGN_CODES.flatMap((c) => CODE_KEYS[c]).filter((key) => !own.includes(key));
  refuse(fields, others, `--code ${code}`);
  return loadCodeTarget(codeTarget(code, fields, (key) => `--${key}`));
}

/** The spectrum of a code target, reading the ASCE 7-22 multi-period table when it names one. */
export function loadCodeTarget(target: CodeTarget): DesignSpectrum {
  return target.kind === 'code' ? target.spectrum : loadMultiPeriodSpectrum(target.path);
}

/** Read a table spectrum file (errors name the file and line). */
export function loadTableSpectrum(path: string): DesignSpectrum {
  return tableSpectrum(readSpectrumTable(readFileSync(path, 'utf8'), path), path);
}

/** Read the site's ASCE 7-22 multi-period table (§11.4.5.1) with the same reader (errors name the file and line). */
export function loadMultiPeriodSpectrum(path: string): DesignSpectrum {
  return asce722MultiPeriodSpectrum(readSpectrumTable(readFileSync(path, 'utf8'), path), path);
}

/** 'a, b, c' or, with `last`, 'a, b or c'. */
function words(items: readonly string[], last = ', '): string {
  return items.length < 2
    ? items.join('')
    : `${items.slice(0, -1).join(', ')}${last}${items[items.length - 1]}`;
}

function refuse(fields: { [key: string]: unknown }, keys: readonly string[], context: string): void {
  for (const key of new Set(keys)) {
    if (fields[key] !== undefined) throw usageError(`--${key} does not apply to ${context}`);
  }
}

import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import type { DesignSpectrum } from '../../spectrum/design.js';
import { readSpectrumTable, tableSpectrum } from '../../spectrum/design-table.js';
import { CODE_KEYS, codeSpectrum } from '../../spectrum/target.js';

/** The options of the `design` command: the spectrum and the periods it is given at. */
export interface DesignCliOptions {
  code?: string;
  sds?: string;
  sd1?: string;
  tl?: string;
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
    .option('--code <code>', 'asce7-16 or ec8')
    .option('--sds <g>', 'ASCE 7-16: S_DS, g')
    .option('--sd1 <g>', 'ASCE 7-16: S_D1, g')
    .option('--tl <s>', 'ASCE 7-16: long-period transition period T_L, s')
    .option('--type <n>', 'Eurocode 8: spectrum type, 1 or 2')
    .option('--ground <type>', 'Eurocode 8: ground type A, B, C, D or E')
    .option('--ag <g>', 'Eurocode 8: design ground acceleration on type A ground a_g, g')
    .option('--damping <ratio>', 'Eurocode 8: viscous damping for η, fraction or percentage (default 5%)')
    .option('--table <file>', 'a two-column CSV of period (s) and PSA (g) instead of a code');
}

/** Build the design spectrum the options describe, reading the table file if one is named. */
export function designFromOptions(options: DesignCliOptions): DesignSpectrum {
  const code = options.code?.trim().toLowerCase();
  if (options.table !== undefined) {
    if (code !== undefined) throw usageError('give either --code or --table, not both');
    refuse(options, [...CODE_KEYS['asce7-16'], ...CODE_KEYS.ec8], '--table');
    return loadTableSpectrum(options.table);
  }
  if (code === undefined) throw usageError('choose a spectrum: --code asce7-16, --code ec8 or --table FILE');
  if (code !== 'asce7-16' && code !== 'ec8')
    throw usageError(`--code '${options.code}': use asce7-16 or ec8`);
  refuse(options, CODE_KEYS[code === 'ec8' ? 'asce7-16' : 'ec8'], `--code ${code}`);
  return codeSpectrum(code, options, (key) => `--${key}`);
}

/** Read a table spectrum file (errors name the file and line). */
export function loadTableSpectrum(path: string): DesignSpectrum {
  return tableSpectrum(readSpectrumTable(readFileSync(path, 'utf8'), path), path);
}

function refuse(options: DesignCliOptions, keys: readonly (keyof DesignCliOptions)[], context: string): void {
  for (const key of keys) {
    if (options[key] !== undefined) throw usageError(`--${key} does not apply to ${context}`);
  }
}

import { readFileSync } from 'node:fs';
import type { Command } from 'commander';
import { usageError } from '../../base/errors.js';
import { asce716Spectrum, type DesignSpectrum, ec8Spectrum } from '../../spectrum/design.js';
import { readSpectrumTable, tableSpectrum } from '../../spectrum/design-table.js';
import { parseDampingRatio, parseEc8Ground, parseEc8Type } from '../../spectrum/target.js';

/** The options that choose a design spectrum (the `design` command). */
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

const ASCE_KEYS = ['sds', 'sd1', 'tl'] as const;

const EC8_KEYS = ['type', 'ground', 'ag', 'damping'] as const;

/** Build the design spectrum the options describe, reading the table file if one is named. */
export function designFromOptions(options: DesignCliOptions): DesignSpectrum {
  if (options.table !== undefined) {
    if (options.code !== undefined) throw usageError('give either --code or --table, not both');
    refuse(options, [...ASCE_KEYS, ...EC8_KEYS], '--table');
    return loadTableSpectrum(options.table);
  }
  const code = options.code?.trim().toLowerCase();
  if (code === 'asce7-16') {
    refuse(options, EC8_KEYS, '--code asce7-16');
    return asce716Spectrum({
      sdsG: required(options, 'sds'),
      sd1G: required(options, 'sd1'),
      tlS: required(options, 'tl'),
    });
  }
  if (code === 'ec8') {
    refuse(options, ASCE_KEYS, '--code ec8');
    return ec8Spectrum({
      type: parseEc8Type(text(options, 'type')),
      ground: parseEc8Ground(text(options, 'ground')),
      agG: required(options, 'ag'),
      damping: options.damping === undefined ? 0.05 : parseDampingRatio(options.damping),
    });
  }
  if (code === undefined) throw usageError('choose a spectrum: --code asce7-16, --code ec8 or --table FILE');
  throw usageError(`--code '${options.code}': use asce7-16 or ec8`);
}

/** Read a table spectrum file (errors name the file and line). */
export function loadTableSpectrum(path: string): DesignSpectrum {
  return tableSpectrum(readSpectrumTable(readFileSync(path, 'utf8'), path), path);
}

function text(options: DesignCliOptions, key: keyof DesignCliOptions): string {
  const value = options[key];
  if (value === undefined) throw usageError(`--${key} is required with --code ${options.code}`);
  return value;
}

function required(options: DesignCliOptions, key: keyof DesignCliOptions): number {
  const raw = text(options, key);
  const value = Number(raw);
  if (raw.trim() === '' || !Number.isFinite(value)) throw usageError(`--${key} '${raw}' is not a number`);
  return value;
}

function refuse(options: DesignCliOptions, keys: readonly (keyof DesignCliOptions)[], context: string): void {
  for (const key of keys) {
    if (options[key] !== undefined) throw usageError(`--${key} does not apply to ${context}`);
  }
}

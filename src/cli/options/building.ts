import { usageError } from '../../base/errors.js';
import { MIN_PERIOD_S, parseDampings } from '../../oscillator/grid.js';
import type { BuildingMode } from '../../spectrum/floor.js';

/** The options that describe a one-mode building (floor, and report for equipment above the base). */
export interface BuildingCliOptions {
  buildingPeriod?: string;
  buildingDamping?: string;
  modalFactor?: string;
  broaden?: string | boolean;
}

/** --building-period, --building-damping and --modal-factor as a building mode. */
export function buildingFromOptions(options: BuildingCliOptions): BuildingMode {
  if (options.buildingPeriod === undefined) throw usageError('--building-period <seconds> is required');
  if (options.modalFactor === undefined)
    throw usageError(
      '--modal-factor <Γφ> is required (1 is the base of a rigid building; about 1.3 to 1.6 at the roof of a regular one)',
    );
  const periodS = Number(options.buildingPeriod);
  if (!(periodS >= MIN_PERIOD_S) || !Number.isFinite(periodS)) {
    throw usageError(
      `--building-period must be a number of seconds ≥ ${MIN_PERIOD_S}, got '${options.buildingPeriod}'`,
    );
  }
  const modalFactor = Number(options.modalFactor);
  if (options.modalFactor.trim() === '' || !Number.isFinite(modalFactor)) {
    throw usageError(`--modal-factor must be a number, got '${options.modalFactor}'`);
  }
  const dampings = parseDampings(options.buildingDamping ?? '5%');
  if (dampings.length !== 1 || !(dampings[0] < 1))
    throw usageError('--building-damping takes one ratio below 1');
  return { periodS, damping: dampings[0], modalFactor };
}

/** `--broaden [b]`: null when absent, 0.15 when given bare, else the fraction 0 ≤ b < 1. */
export function broadeningFromOptions(value: string | boolean | undefined): number | null {
  if (value === undefined || value === false) return null;
  if (value === true) return 0.15;
  const b = Number(value);
  if (value.trim() === '' || !(b >= 0) || !(b < 1))
    throw usageError(`--broaden must be a fraction 0 ≤ b < 1, got '${value}'`);
  return b;
}

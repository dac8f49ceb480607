import { usageError } from './errors.js';

/** Standard gravity, m/s² (CGPM 1901; exact by definition). */
export const STANDARD_GRAVITY_MS2 = 9.80665;

/** Acceleration units a record may be given in, with the factor that converts each to m/s². */
export const ACCELERATION_UNITS = {
  g: STANDARD_GRAVITY_MS2,
  'm/s2': 1,
  'cm/s2': 0.01,
  gal: 0.01,
  'mm/s2': 0.001,
  'in/s2': 0.0254,
  'ft/s2': 0.3048,
} as const;

export type AccelerationUnit = keyof typeof ACCELERATION_UNITS;

/** Length units for displacement output, with the factor that converts each to metres. */
export const LENGTH_UNITS = { m: 1, cm: 0.01, mm: 0.001, in: 0.0254, ft: 0.3048 } as const;

export type LengthUnit = keyof typeof LENGTH_UNITS;

const ACCEL_ALIASES: Readonly<Record<string, AccelerationUnit>> = {
  g: 'g',
  'm/s2': 'm/s2',
  'm/s^2': 'm/s2',
  'm/s²': 'm/s2',
  'cm/s2': 'cm/s2',
  'cm/s^2': 'cm/s2',
  'cm/s²': 'cm/s2',
  gal: 'gal',
  'mm/s2': 'mm/s2',
  'mm/s^2': 'mm/s2',
  'mm/s²': 'mm/s2',
  'in/s2': 'in/s2',
  'in/s^2': 'in/s2',
  'in/s²': 'in/s2',
  'ft/s2': 'ft/s2',
  'ft/s^2': 'ft/s2',
  'ft/s²': 'ft/s2',
};

/** The accepted spellings, for error messages. */
export const ACCELERATION_UNIT_NAMES = Object.keys(ACCELERATION_UNITS).join(', ');

/** Parse an acceleration unit name; units are never guessed, so a missing one is refused. */
export function parseAccelerationUnit(text: string | undefined): AccelerationUnit {
  if (text === undefined || text.trim() === '') {
    throw usageError(`the record's units are required (--units); accepted: ${ACCELERATION_UNIT_NAMES}`);
  }
  const unit = ACCEL_ALIASES[text.trim().toLowerCase()];
  if (unit === undefined) {
    throw usageError(`unknown acceleration unit '${text}'; accepted: ${ACCELERATION_UNIT_NAMES}`);
  }
  return unit;
}

export function parseLengthUnit(text: string): LengthUnit {
  const key = text.trim().toLowerCase();
  if (!(key in LENGTH_UNITS)) {
    throw usageError(`unknown length unit '${text}'; accepted: ${Object.keys(LENGTH_UNITS).join(', ')}`);
  }
  return key as LengthUnit;
}

export function toMetresPerSecondSquared(value: number, unit: AccelerationUnit): number {
  return value * ACCELERATION_UNITS[unit];
}

export function gFromMS2(valueMS2: number): number {
  return valueMS2 / STANDARD_GRAVITY_MS2;
}

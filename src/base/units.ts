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

/** The accepted spellings, for error messages. */
export const ACCELERATION_UNIT_NAMES = Object.keys(ACCELERATION_UNITS).join(', ');

/** Parse an acceleration unit name, in any case, with s2, s^2 or s² alike; never guessed when missing. */
export function parseAccelerationUnit(text: string | undefined): AccelerationUnit {
  if (text === undefined || text.trim() === '') {
    throw usageError(`the record's units are required (--units); accepted: ${ACCELERATION_UNIT_NAMES}`);
  }
  const key = text
    .trim()
    .toLowerCase()
    .replace(/s(\^2|²)$/, 's2');
  if (!Object.hasOwn(ACCELERATION_UNITS, key)) {
    throw usageError(`unknown acceleration unit '${text}'; accepted: ${ACCELERATION_UNIT_NAMES}`);
  }
  return key as AccelerationUnit;
}

export function parseLengthUnit(text: string): LengthUnit {
  const key = text.trim().toLowerCase();
  if (!Object.hasOwn(LENGTH_UNITS, key)) {
    throw usageError(`unknown length unit '${text}'; accepted: ${Object.keys(LENGTH_UNITS).join(', ')}`);
  }
  return key as LengthUnit;
}

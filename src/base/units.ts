import { usageError } from './errors.js';

/** Standard gravity, m/s² (CGPM 1901; exact by definition). */
export const STANDARD_GRAVITY_MS2 = 9.80665;

/**
 * An acceleration in m/s² as g, for outputs: the shortest decimal whose conversion to m/s² gives
 * back exactly this value. A record read in g keeps the values it was given (0.42 g, not
 * 0.41999999999999993, which is 0.42·g/g in floating point); any other value is within one unit
 * in the last place of a/g and converts back to the same m/s².
 */
export function gFromMS2(accelMS2: number): number {
  const quotient = accelMS2 / STANDARD_GRAVITY_MS2;
  if (!Number.isFinite(quotient)) return quotient;
  for (let digits = 1; digits < 17; digits++) {
    const candidate = Number(quotient.toPrecision(digits));
    if (candidate * STANDARD_GRAVITY_MS2 === accelMS2) return candidate;
  }
  return quotient;
}

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

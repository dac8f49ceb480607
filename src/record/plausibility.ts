import { inputError } from '../base/errors.js';
import { formatNumber, formatSignificant } from '../base/numbers.js';
import { ACCELERATION_UNITS, STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { integrateRecord } from './integrate.js';
import type { GroundRecord } from './record.js';

/**
 * Bands outside which a record is not a plausible ground motion in the unit it was read in (common
 * practice: recorded PGAs stay between about 0.001 g for a felt motion and 5 g; recorded PGVs
 * below about 4 m/s; PGDs below about 10 m even with a fault's permanent offset; strong shaking
 * lasts minutes, not hours). Outside them a wrong unit or time unit is the likely cause.
 */
export const PLAUSIBLE = {
  pgaMinG: 0.001,
  pgaMaxG: 5,
  pgvMaxMS: 5,
  pgdMaxM: 10,
  durationMaxS: 2 * 3600,
} as const;

/**
 * Beyond these a time column is plainly not in seconds (common practice: accelerographs sample
 * at 50–1000 Hz, Δt 0.001–0.02 s, and a record lasts seconds to minutes): refused unless told.
 */
export const TIME_LIMITS = { dtMaxS: 1, durationMaxS: 24 * 3600 } as const;

/** A part in 10¹² to spare, so a bound reached exactly through a unit factor is not warned about. */
const SPARE = 1e-12;

/** Warnings that the record's PGA, PGV, PGD or duration are implausible for a ground motion. */
export function plausibilityWarnings(record: GroundRecord): string[] {
  const warnings: string[] = [];
  const pgaG = record.pgaMS2 / STANDARD_GRAVITY_MS2;
  const unit = record.unitsRead;
  if (pgaG > PLAUSIBLE.pgaMaxG * (1 + SPARE) || pgaG < PLAUSIBLE.pgaMinG * (1 - SPARE)) {
    const bound = pgaG > PLAUSIBLE.pgaMaxG ? `above ${PLAUSIBLE.pgaMaxG} g` : `below ${PLAUSIBLE.pgaMinG} g`;
    warnings.push(
      `PGA ${formatSignificant(pgaG, 3)} g read in ${unit} is ${bound}: are the units right?${alternatives(record)}`,
    );
  }
  const { velocityMS, displacementM } = integrateRecord(record);
  const pgvMS = peak(velocityMS);
  const pgdM = peak(displacementM);
  const durationS = (record.accelMS2.length - 1) * record.dtS;
  const asRead = ' (as read, before any baseline correction)';
  if (pgvMS > PLAUSIBLE.pgvMaxMS)
    warnings.push(
      `PGV ${formatSignificant(pgvMS, 3)} m/s is above ${PLAUSIBLE.pgvMaxMS} m/s${asRead}: are the units and the time step right?`,
    );
  if (pgdM > PLAUSIBLE.pgdMaxM)
    warnings.push(
      `PGD ${formatSignificant(pgdM, 3)} m is above ${PLAUSIBLE.pgdMaxM} m${asRead}: are the units and the time step right, or does the record need a baseline correction?`,
    );
  if (durationS > PLAUSIBLE.durationMaxS)
    warnings.push(
      `the record lasts ${formatSignificant(durationS / 3600, 3)} h, above ${PLAUSIBLE.durationMaxS / 3600} h: is the time step in seconds?`,
    );
  return warnings;
}

/** "; in cm/s2 it would be 0.31 g, …": the units in which the peak would be a usual ground motion. */
function alternatives(record: GroundRecord): string {
  const readFactor = ACCELERATION_UNITS[record.unitsRead];
  const out: string[] = [];
  for (const [unit, factor] of Object.entries(ACCELERATION_UNITS)) {
    if (unit === 'gal' || factor === readFactor) continue;
    const altG = (record.pgaMS2 / readFactor) * (factor / STANDARD_GRAVITY_MS2);
    if (altG >= 0.01 && altG <= 2) out.push(`in ${unit} it would be ${formatSignificant(altG, 3)} g`);
  }
  return out.length > 0 ? `; ${out.join(', ')}` : '';
}

function peak(values: Float64Array): number {
  let largest = 0;
  for (let i = 0; i < values.length; i++) largest = Math.max(largest, Math.abs(values[i]));
  return largest;
}

/**
 * Refuse a time step or duration that is plainly not in seconds (`told`: the user said the unit,
 * so it is taken as it is). `where`: how the step was found, for the message.
 */
export function checkTimeScale(
  dtS: number,
  samples: number,
  where: string,
  source: string,
  told: boolean,
): void {
  if (told) return;
  const durationS = (samples - 1) * dtS;
  if (dtS < TIME_LIMITS.dtMaxS && durationS <= TIME_LIMITS.durationMaxS) return;
  const what =
    dtS >= TIME_LIMITS.dtMaxS
      ? `a time step of ${formatNumber(dtS, 6)} s (${where})`
      : `a duration of ${formatNumber(durationS / 3600, 3)} h (${where})`;
  throw inputError(
    `${what} is not a ground-motion record's in seconds: if the times are milliseconds give --time-unit ms, if they are seconds --time-unit s`,
    { file: source },
  );
}

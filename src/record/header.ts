import type { AccelerationUnit } from '../base/units.js';

/**
 * What a record's header may state, and the line that stated it. The spellings are our own small
 * set, matched without regard to case, a key and its value separated by `=`, `:` or spaces:
 *
 * - time step: `dt`, `delta t`, `time step`, `timestep`, `sample interval`, then a number and an
 *   optional unit `s`, `sec`, `seconds` or `ms` (seconds when none): `DT= 0.005 SEC`, `dt = 0.01 s`;
 * - point count: `npts`, `points`, `samples`, `point count`, `number of points` then a whole number,
 *   or a whole number then `points` or `samples`: `NPTS= 4000`, `points 3000`, `4001 POINTS`;
 * - unit: `units` or `unit` then an acceleration unit: `units: g`, `UNITS CM/S2`;
 *   or the name of the value column ending in a unit: `accel_g`, `acc (cm/s2)` (as `quakesweep synth` writes).
 */
export interface HeaderKeys {
  dtS?: { value: number; line: number; text: string };
  points?: { value: number; line: number };
  units?: { value: AccelerationUnit; line: number; text: string };
}

// Each pattern here lets a character match one way only (no `\d+\.?\d*`, no `\s*[=:]?\s*`, whose
// runs meet anywhere), so that a long run of digits or blanks is scanned in linear time.
const NUMBER_TEXT = '([+-]?(?:\\d+(?:\\.\\d*)?|\\.\\d+)(?:[eEdD][+-]?\\d+)?)';
const SEPARATOR = '\\s*(?:[=:]\\s*)?';
const DT = new RegExp(
  `(?:^|[^a-z])(?:dt|delta[ _-]?t|time[ _-]?step|sample[ _-]?interval)${SEPARATOR}${NUMBER_TEXT}\\s*(seconds?|secs?|ms|s)?(?![a-z])`,
  'i',
);
const POINTS_AFTER = new RegExp(
  `(?:^|[^a-z])(?:npts|points|samples|point[ _-]?count|number[ _-]of[ _-]points)${SEPARATOR}(\\d+)(?![\\d.])`,
  'i',
);
const POINTS_BEFORE = /(?:^|[^\d.])(\d+)\s+(?:points|samples)(?![a-z])/i;
/** Acceleration units as headers write them; the longer spellings first. */
const UNIT_TEXT =
  '(gal|g|(?:mm|cm|m|in|ft)\\s*/\\s*(?:s|sec)\\s*(?:\\^\\s*2|\\*\\*\\s*2|2|²|/\\s*(?:s|sec)))';
const UNITS = new RegExp(
  `(?:^|[^a-z])units?${SEPARATOR}(?:of\\s+acceleration\\s*)?(?:[([]\\s*)?${UNIT_TEXT}(?![a-z0-9])`,
  'i',
);
const COLUMN_UNIT = new RegExp(`[\\s_([]${UNIT_TEXT}\\s*[)\\]]?$`, 'i');
/** A time column's name that says milliseconds: `time_ms`, `t (ms)`. */
const TIME_MS = /^(?:t|time)[\s_([]*ms[)\]]?$/i;

/** The unit in a header's spelling, as one of ours: `CM/SEC2`, `cm/s/s` → `cm/s2`. */
export function headerUnit(text: string): AccelerationUnit {
  const compact = text.toLowerCase().replace(/\s+/g, '');
  if (compact === 'g' || compact === 'gal') return compact;
  const length = compact.slice(0, compact.indexOf('/'));
  return `${length}/s2` as AccelerationUnit;
}

/** Take what one header line states into `keys`; the first statement of each key wins. */
export function scanHeaderLine(text: string, line: number, keys: HeaderKeys): void {
  const hash = text.indexOf('#');
  const kept = hash === -1 ? text : text.slice(hash + 1);
  if (keys.dtS === undefined) {
    const m = DT.exec(kept);
    const value = m === null ? Number.NaN : Number(m[1].replace(/[dD]/, 'e'));
    if (m !== null && value > 0 && Number.isFinite(value)) {
      const ms = m[2]?.toLowerCase() === 'ms';
      keys.dtS = { value: ms ? value / 1000 : value, line, text: m[0].replace(/^[^a-z]/i, '').trim() };
    }
  }
  if (keys.points === undefined) {
    const m = POINTS_AFTER.exec(kept) ?? POINTS_BEFORE.exec(kept);
    if (m !== null && Number(m[1]) > 0) keys.points = { value: Number(m[1]), line };
  }
  if (keys.units === undefined) {
    const m = UNITS.exec(kept);
    if (m !== null) keys.units = { value: headerUnit(m[1]), line, text: m[0].replace(/^[^a-z]/i, '').trim() };
  }
}

/** The unit a value column's name ends in (`accel_g` → g), if any. */
export function columnNameUnit(name: string): AccelerationUnit | undefined {
  const m = COLUMN_UNIT.exec(name.trim());
  return m === null ? undefined : headerUnit(m[1]);
}

/** Whether a time column's name says its times are in milliseconds. */
export function timeNameInMs(name: string): boolean {
  return TIME_MS.test(name.trim());
}

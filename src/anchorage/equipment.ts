import { inputError } from '../base/errors.js';
import { printable } from '../base/printable.js';
import { MIN_PERIOD_S } from '../oscillator/grid.js';
import {
  BUILDING_KEYS,
  BUILDING_PERIOD_KEY,
  type ComponentEdition,
  type ComponentFactors,
  checkEditionKeys,
  EDITION_NAMES,
  EDITION_NUMBERS,
  readEdition,
  readFactors,
  readVertical,
  VERTICAL_KEYS,
  type VerticalInput,
} from './equipment-code.js';

/** Unit systems an equipment file may use: forces and lengths together. */
export type EquipmentUnits = 'SI' | 'US-kip-in' | 'US-lb-in';

export const EQUIPMENT_UNITS: Readonly<
  Record<EquipmentUnits, { force: string; length: string; kNPerForce: number; mPerLength: number }>
> = {
  // 1 lbf = 0.45359237 kg × 9.80665 m/s² = 4.4482216152605 N (exact by definition of the pound).
  SI: { force: 'kN', length: 'm', kNPerForce: 1, mPerLength: 1 },
  'US-kip-in': { force: 'kip', length: 'in', kNPerForce: 4.4482216152605, mPerLength: 0.0254 },
  'US-lb-in': { force: 'lb', length: 'in', kNPerForce: 0.0044482216152605, mPerLength: 0.0254 },
};

/**
 * A piece of equipment on its anchors, as read from its file, in SI inside (kN, m). The values as
 * the user wrote them are kept in `input` for echoing back in outputs.
 */
export interface Equipment {
  name: string;
  units: EquipmentUnits;
  /** Operating weight W_p, kN. */
  weightKN: number;
  /** Height of the centre of mass above the anchor plane, m. */
  cgHeightM: number;
  /** Plan coordinates of the anchors, m. */
  anchorsM: [number, number][];
  /** Plan position of the centre of mass, m; the anchors' centroid unless given. */
  cgPlanM: [number, number];
  /** True when the file gave the centre of mass in plan (it may then be eccentric). */
  cgPlanGiven: boolean;
  /** Component period, s, or 'rigid'. */
  periodS: number | 'rigid';
  /** Component damping ratio, fraction of critical. */
  damping: number;
  /** Attachment height z above the base, m. */
  zM: number;
  /** Roof height h above the base, m. */
  hM: number;
  /** The edition of ASCE/SEI 7 of the component force ("code"; asce7-16 when the file names none). */
  code: ComponentEdition;
  /** The edition's own coefficients: a_p and R_p (7-16), or C_AR, R_po and the building (7-22). */
  factors: ComponentFactors;
  // §13.3.1 coefficients of either edition as the file gives them: I_p, S_DS (g), the anchorage's Ω₀ or null.
  ip: number;
  sds: number;
  omega0: number | null;
  /** The vertical spectral demand's inputs (§11.9), or null when the file gives none. */
  vertical: VerticalInput | null;
  /** What the file said, in its own units. */
  input: Readonly<Record<string, unknown>>;
}

/** The required keys of each edition (the edition's coefficients after z and h). */
const REQUIRED: Readonly<Record<ComponentEdition, string[]>> = {
  'asce7-16': 'name units weight cg_height anchors period_s damping z h ap rp ip sds'.split(' '),
  'asce7-22': 'name units weight cg_height anchors period_s damping z h car rpo ip sds'.split(' '),
};
type UnitSystem = (typeof EQUIPMENT_UNITS)[EquipmentUnits];
const OPTIONAL = ['omega0', 'cg_plan', 'notes'];
const EDITION_OPTIONAL = ['code', ...VERTICAL_KEYS];
/** Every key of any edition (a key of the other edition is refused in its own words). */
const ALL_KEYS = [
  ...new Set([...REQUIRED['asce7-16'], ...REQUIRED['asce7-22'], ...OPTIONAL, ...EDITION_OPTIONAL]),
  ...BUILDING_KEYS,
  BUILDING_PERIOD_KEY,
];
/** The keys a file of the edition may hold, as its messages list them. */
const KNOWN: Readonly<Record<ComponentEdition, string[]>> = {
  'asce7-16': [...REQUIRED['asce7-16'], ...OPTIONAL, ...EDITION_OPTIONAL],
  'asce7-22': [
    ...REQUIRED['asce7-22'],
    ...OPTIONAL,
    ...EDITION_OPTIONAL,
    ...BUILDING_KEYS,
    BUILDING_PERIOD_KEY,
  ],
};

/** The numeric fields: the test each value must pass and what is expected, in the file's units. */
const NUMBERS: Record<string, [(v: number) => boolean, (u: UnitSystem, standard: string) => string]> = {
  weight: [(v) => v > 0, (u) => `a positive operating weight in ${u.force}`],
  cg_height: [(v) => v >= 0, (u) => `a height ≥ 0 in ${u.length}`],
  damping: [(v) => v >= 0 && v < 1, () => 'a fraction of critical, 0 ≤ ζ < 1 (0.05 for 5%)'],
  z: [
    (v) => v >= 0,
    (u, standard) =>
      `a height ≥ 0 above the base in ${u.length} (0 at or below the base, ${standard.replace('/SEI', '')} §13.3.1)`,
  ],
  h: [(v) => v > 0, (u) => `the roof height above the base, > 0, in ${u.length}`],
  ap: [(v) => v > 0, () => 'a positive amplification factor a_p'],
  rp: [(v) => v > 0, () => 'a positive response modification factor R_p'],
  ip: [(v) => v > 0, () => 'a positive importance factor I_p'],
  sds: [(v) => v > 0, () => 'a positive S_DS in g'],
  omega0: [
    (v) => v >= 1,
    (_, standard) =>
      standard === EDITION_NAMES['asce7-16']
        ? 'null or an overstrength factor Ω₀ ≥ 1'
        : 'null or the component anchorage\'s overstrength factor Ω₀ ≥ 1 (the building\'s Ω₀ for R_μ is "building_omega0")',
  ],
  ...EDITION_NUMBERS,
};

/** The 1-based line of a character offset in a text. */
function lineOf(text: string, offset: number): number {
  return text.slice(0, offset).split('\n').length;
}

/**
 * Read and check an equipment description (JSON text from `file`). Every refusal names the file,
 * the field and, where the key can be found in the text, its line.
 */
export function parseEquipment(text: string, file: string): Equipment {
  let raw: unknown;
  try {
    raw = JSON.parse(text);
  } catch (error) {
    const message = error instanceof Error ? error.message : String(error);
    const position = /position (\d+)/.exec(message);
    const place = { file, line: position ? lineOf(text, Number(position[1])) : undefined };
    throw inputError(`not valid JSON (${message.replace(/ in JSON at position \d+.*$/, '')})`, place);
  }
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw inputError('an equipment file holds one JSON object {"name": ..., "units": ..., ...}', { file });
  }
  const object = raw as Record<string, unknown>;
  const fail = (key: string, message: string): never => {
    const match = new RegExp(`"${key.replace(/[^\w]/g, '\\$&')}"\\s*:`).exec(text);
    throw inputError(`"${key}" ${message}`, { file, line: match ? lineOf(text, match.index) : undefined });
  };

  const code = readEdition({ object, fail });
  const known = KNOWN[code];
  for (const key of Object.keys(object)) {
    if (!ALL_KEYS.includes(key)) {
      const hint = known.find((k) => k.replace(/_/g, '') === key.replace(/_/g, '').toLowerCase());
      const suggestion = hint ? ` (did you mean "${hint}"?)` : '';
      fail(key, `is not a known field${suggestion}; known: ${known.join(', ')}`);
    }
  }
  checkEditionKeys({ object, fail }, code);
  const required = REQUIRED[code];
  for (const key of required) {
    if (!(key in object)) throw inputError(`"${key}" is missing; required: ${required.join(', ')}`, { file });
  }

  const name = object['name'];
  if (typeof name !== 'string' || name.trim() === '') fail('name', 'must be a non-empty string');
  const units = object['units'];
  if (typeof units !== 'string' || !Object.hasOwn(EQUIPMENT_UNITS, units)) {
    fail('units', `must be one of ${Object.keys(EQUIPMENT_UNITS).join(', ')}, got ${JSON.stringify(units)}`);
  }
  const system = EQUIPMENT_UNITS[units as EquipmentUnits];
  const m = system.mPerLength;
  const number = (key: string): number => {
    const [ok, expected] = NUMBERS[key];
    const value = object[key];
    const standard = EDITION_NAMES[code];
    if (!Number.isFinite(value)) fail(key, `must be a number (${expected(system, standard)})`);
    if (!ok(value as number)) fail(key, `must be ${expected(system, standard)}, got ${value}`);
    return value as number;
  };

  const [weight, cgHeight] = ['weight', 'cg_height'].map(number);
  const anchors = readAnchors(object['anchors'], (message) => fail('anchors', message));

  const cgGiven = object['cg_plan'] != null;
  if (cgGiven && !isPoint(object['cg_plan'])) fail('cg_plan', `must be [x, y] in ${system.length}`);
  const cgPlan = cgGiven ? (object['cg_plan'] as [number, number]) : centroid(anchors);

  const periodS = object['period_s'];
  const isPeriod = typeof periodS === 'number' && Number.isFinite(periodS) && periodS >= MIN_PERIOD_S;
  if (periodS !== 'rigid' && !isPeriod) {
    fail('period_s', `must be a period ≥ ${MIN_PERIOD_S} s or "rigid", got ${JSON.stringify(periodS)}`);
  }

  const [damping, z, h] = ['damping', 'z', 'h'].map(number);
  const reader = { object, fail, number };
  const factors = readFactors(reader, code, z > 0);
  const [ip, sds] = ['ip', 'sds'].map(number);
  const omega0 = object['omega0'] == null ? null : number('omega0');
  const vertical = readVertical(reader, code);
  if (object['notes'] !== undefined && typeof object['notes'] !== 'string') fail('notes', 'must be a string');

  return {
    name: printable(name as string),
    units: units as EquipmentUnits,
    weightKN: weight * system.kNPerForce,
    cgHeightM: cgHeight * m,
    anchorsM: anchors.map(([x, y]) => [x * m, y * m]),
    cgPlanM: [cgPlan[0] * m, cgPlan[1] * m],
    cgPlanGiven: cgGiven,
    periodS: periodS as number | 'rigid',
    damping,
    zM: z * m,
    hM: h * m,
    code,
    factors,
    ip,
    sds,
    omega0,
    vertical,
    input: object,
  };
}

/**
 * The anchors' plan positions: at least two, none repeated, and not all on one line (they could
 * not resist overturning across it).
 */
function readAnchors(value: unknown, fail: (message: string) => never): [number, number][] {
  if (!Array.isArray(value)) return fail('must be a list of [x, y] anchor positions');
  if (value.length < 2) return fail(`needs at least 2 anchors, got ${value.length}`);
  const anchors = value.map((point, i): [number, number] =>
    isPoint(point)
      ? [point[0], point[1]]
      : fail(`anchor ${i + 1} must be [x, y] with two numbers, got ${JSON.stringify(point)}`),
  );
  anchors.forEach(([x, y], i) => {
    const j = anchors.findIndex((p) => p[0] === x && p[1] === y);
    if (j < i) fail(`anchors ${j + 1} and ${i + 1} are at the same place`);
  });
  const { ixx, iyy, ixy } = secondMoments(anchors);
  if (!(ixx * iyy - ixy * ixy > 1e-12 * (ixx + iyy) ** 2)) {
    fail(
      'all lie on one line; the elastic bolt-group method needs anchors off that line to resist ' +
        'overturning across it (bearing of the base on its edge is not modelled)',
    );
  }
  return anchors;
}

/** Whether a JSON value is a plan point [x, y] of two finite numbers. */
function isPoint(value: unknown): value is [number, number] {
  return (
    Array.isArray(value) &&
    value.length === 2 &&
    value.every((v) => typeof v === 'number' && Number.isFinite(v))
  );
}

/** The centroid of the anchor pattern (each anchor weighted equally). */
export function centroid(points: readonly (readonly [number, number])[]): [number, number] {
  const sum = (axis: 0 | 1) => points.reduce((total, p) => total + p[axis], 0);
  return [sum(0) / points.length, sum(1) / points.length];
}

/** The anchors' offsets r_i from the centroid and the pattern's second moments Σx², Σy², Σxy, Σ|r|². */
export function secondMoments(points: readonly (readonly [number, number])[]) {
  const [cx, cy] = centroid(points);
  const rx = points.map((p) => p[0] - cx);
  const ry = points.map((p) => p[1] - cy);
  const sum = (term: (i: number) => number) => rx.reduce((total, _, i) => total + term(i), 0);
  const ixx = sum((i) => rx[i] * rx[i]);
  const iyy = sum((i) => ry[i] * ry[i]);
  const ixy = sum((i) => rx[i] * ry[i]);
  const polar = sum((i) => rx[i] * rx[i] + ry[i] * ry[i]);
  return { cx, cy, rx, ry, ixx, iyy, ixy, polar };
}

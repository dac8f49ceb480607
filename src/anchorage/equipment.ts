import { inputError } from '../base/errors.js';
import { MIN_PERIOD_S } from '../oscillator/grid.js';

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
  ap: number;
  rp: number;
  ip: number;
  sds: number;
  omega0: number | null;
  /** What the file said, in its own units. */
  input: Readonly<Record<string, unknown>>;
}

const REQUIRED = [
  'name',
  'units',
  'weight',
  'cg_height',
  'anchors',
  'period_s',
  'damping',
  'z',
  'h',
  'ap',
  'rp',
  'ip',
  'sds',
];
const OPTIONAL = ['omega0', 'cg_plan', 'notes'];
const KNOWN = [...REQUIRED, ...OPTIONAL];

/** The 1-based line of a character offset in a text. */
function lineOf(text: string, offset: number): number {
  let line = 1;
  for (let i = 0; i < offset && i < text.length; i++) if (text.charCodeAt(i) === 10) line++;
  return line;
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
    const line = position ? lineOf(text, Number(position[1])) : undefined;
    throw inputError(`not valid JSON (${message.replace(/ in JSON at position \d+.*$/, '')})`, {
      file,
      line,
    });
  }
  if (typeof raw !== 'object' || raw === null || Array.isArray(raw)) {
    throw inputError('an equipment file holds one JSON object {"name": ..., "units": ..., ...}', { file });
  }
  const object = raw as Record<string, unknown>;
  const where = (key: string) => {
    const match = new RegExp(`"${key.replace(/[^\w]/g, '\\$&')}"\\s*:`).exec(text);
    return { file, line: match ? lineOf(text, match.index) : undefined };
  };
  const fail = (key: string, message: string): never => {
    throw inputError(`"${key}" ${message}`, where(key));
  };

  for (const key of Object.keys(object)) {
    if (!KNOWN.includes(key)) {
      const hint = KNOWN.find((known) => known.replace(/_/g, '') === key.replace(/_/g, '').toLowerCase());
      fail(
        key,
        `is not a known field${hint ? ` (did you mean "${hint}"?)` : ''}; known: ${KNOWN.join(', ')}`,
      );
    }
  }
  for (const key of REQUIRED) {
    if (!(key in object)) throw inputError(`"${key}" is missing; required: ${REQUIRED.join(', ')}`, { file });
  }

  const number = (key: string, check: (v: number) => boolean, expected: string): number => {
    const value = object[key];
    if (typeof value !== 'number' || !Number.isFinite(value)) fail(key, `must be a number (${expected})`);
    if (!check(value as number)) fail(key, `must be ${expected}, got ${value}`);
    return value as number;
  };

  const name = object['name'];
  if (typeof name !== 'string' || name.trim() === '') fail('name', 'must be a non-empty string');
  const units = object['units'];
  if (typeof units !== 'string' || !(units in EQUIPMENT_UNITS)) {
    fail('units', `must be one of ${Object.keys(EQUIPMENT_UNITS).join(', ')}, got ${JSON.stringify(units)}`);
  }
  const system = EQUIPMENT_UNITS[units as EquipmentUnits];
  const m = system.mPerLength;

  const weight = number('weight', (v) => v > 0, `a positive operating weight in ${system.force}`);
  const cgHeight = number('cg_height', (v) => v >= 0, `a height ≥ 0 in ${system.length}`);
  const anchors = readPoints(object['anchors'], (message) => fail('anchors', message));
  checkPattern(anchors, (message) => fail('anchors', message));

  const cgGiven = object['cg_plan'] !== undefined && object['cg_plan'] !== null;
  if (cgGiven && !isPoint(object['cg_plan'])) fail('cg_plan', `must be [x, y] in ${system.length}`);
  const cgPlan = cgGiven ? (object['cg_plan'] as [number, number]) : centroid(anchors);

  const periodS = object['period_s'];
  const isPeriod = typeof periodS === 'number' && Number.isFinite(periodS) && periodS >= MIN_PERIOD_S;
  if (periodS !== 'rigid' && !isPeriod) {
    fail('period_s', `must be a period ≥ ${MIN_PERIOD_S} s or "rigid", got ${JSON.stringify(periodS)}`);
  }

  const damping = number(
    'damping',
    (v) => v >= 0 && v < 1,
    'a fraction of critical, 0 ≤ ζ < 1 (0.05 for 5%)',
  );
  const z = number(
    'z',
    (v) => v >= 0,
    `a height ≥ 0 above the base in ${system.length} (0 at or below the base, ASCE 7-16 §13.3.1)`,
  );
  const h = number('h', (v) => v > 0, `the roof height above the base, > 0, in ${system.length}`);
  const ap = number('ap', (v) => v > 0, 'a positive amplification factor a_p');
  const rp = number('rp', (v) => v > 0, 'a positive response modification factor R_p');
  const ip = number('ip', (v) => v > 0, 'a positive importance factor I_p');
  const sds = number('sds', (v) => v > 0, 'a positive S_DS in g');
  const omega0 =
    object['omega0'] === undefined || object['omega0'] === null
      ? null
      : number('omega0', (v) => v >= 1, 'null or an overstrength factor Ω₀ ≥ 1');
  if (object['notes'] !== undefined && typeof object['notes'] !== 'string') fail('notes', 'must be a string');

  return {
    name: name as string,
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
    ap,
    rp,
    ip,
    sds,
    omega0,
    input: object,
  };
}

function readPoints(value: unknown, fail: (message: string) => never): [number, number][] {
  if (!Array.isArray(value)) return fail('must be a list of [x, y] anchor positions');
  if (value.length < 2) return fail(`needs at least 2 anchors, got ${value.length}`);
  return value.map((point, i) => {
    if (!isPoint(point)) {
      return fail(`anchor ${i + 1} must be [x, y] with two numbers, got ${JSON.stringify(point)}`);
    }
    return [point[0], point[1]] as [number, number];
  });
}

/** Whether a JSON value is a plan point [x, y] of two finite numbers. */
function isPoint(value: unknown): value is [number, number] {
  return (
    Array.isArray(value) &&
    value.length === 2 &&
    value.every((v) => typeof v === 'number' && Number.isFinite(v))
  );
}

/** Refuse repeated anchors and patterns on one line (they cannot resist overturning across it). */
function checkPattern(anchors: [number, number][], fail: (message: string) => never): void {
  for (let i = 0; i < anchors.length; i++) {
    for (let j = 0; j < i; j++) {
      if (anchors[i][0] === anchors[j][0] && anchors[i][1] === anchors[j][1]) {
        fail(`anchors ${j + 1} and ${i + 1} are at the same place`);
      }
    }
  }
  const { ixx, iyy, ixy } = secondMoments(anchors);
  const det = ixx * iyy - ixy * ixy;
  if (!(det > 1e-12 * (ixx + iyy) ** 2)) {
    fail(
      'all lie on one line; the elastic bolt-group method needs anchors off that line to resist ' +
        'overturning across it (bearing of the base on its edge is not modelled)',
    );
  }
}

/** The centroid of the anchor pattern (each anchor weighted equally). */
export function centroid(points: readonly (readonly [number, number])[]): [number, number] {
  let x = 0;
  let y = 0;
  for (const [px, py] of points) {
    x += px;
    y += py;
  }
  return [x / points.length, y / points.length];
}

/** The anchors' offsets r_i from the centroid and the pattern's second moments Σx², Σy², Σxy, Σ|r|². */
export function secondMoments(points: readonly (readonly [number, number])[]) {
  const [cx, cy] = centroid(points);
  const rx = points.map((p) => p[0] - cx);
  const ry = points.map((p) => p[1] - cy);
  let ixx = 0;
  let iyy = 0;
  let ixy = 0;
  let polar = 0;
  for (let i = 0; i < points.length; i++) {
    ixx += rx[i] * rx[i];
    iyy += ry[i] * ry[i];
    ixy += rx[i] * ry[i];
    polar += rx[i] * rx[i] + ry[i] * ry[i];
  }
  return { cx, cy, rx, ry, ixx, iyy, ixy, polar };
}

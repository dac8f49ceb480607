import { VERTICAL_MAX_PERIOD_S, VERTICAL_SITE_CLASSES } from '../spectrum/vertical.js';
import type { SupportingBuilding } from './code-force-7-22.js';

/** The editions of ASCE/SEI 7 whose component force an equipment file may name ("code"). */
export type ComponentEdition = 'asce7-16' | 'asce7-22';

export const COMPONENT_EDITIONS: readonly ComponentEdition[] = ['asce7-16', 'asce7-22'];

/** The standard's name for outputs. */
export const EDITION_NAMES: Readonly<Record<ComponentEdition, string>> = {
  'asce7-16': 'ASCE/SEI 7-16',
  'asce7-22': 'ASCE/SEI 7-22',
};

/** The coefficients of the component force, by edition, as the file gives them. */
export type ComponentFactors =
  | { code: 'asce7-16'; ap: number; rp: number }
  | { code: 'asce7-22'; car: number; rpo: number; building: SupportingBuilding | null };

/** What the vertical spectral demand (§11.9) needs: the component's vertical period, S_S, site class. */
export interface VerticalInput {
  periodS: number | 'rigid';
  ssG: number;
  siteClass: string;
}

/** The keys of each edition's coefficients. */
export const EDITION_KEYS: Readonly<Record<ComponentEdition, readonly string[]>> = {
  'asce7-16': ['ap', 'rp'],
  'asce7-22': ['car', 'rpo'],
};

/** The building's keys (ASCE/SEI 7-22 only): R, Ω₀ and I_e for R_μ, and T_a for H_f. */
export const BUILDING_KEYS = ['building_r', 'building_omega0', 'building_ie'] as const;
export const BUILDING_PERIOD_KEY = 'building_ta_s';
export const VERTICAL_KEYS = ['vertical_period_s', 'ss', 'site_class'] as const;

/** The numeric keys of this file, their test and what is expected (see NUMBERS in equipment.ts). */
export const EDITION_NUMBERS: Record<string, [(v: number) => boolean, () => string]> = {
  car: [(v) => v > 0, () => 'a positive component resonance ductility factor C_AR (ASCE/SEI 7-22 §13.3.1)'],
  rpo: [(v) => v > 0, () => 'a positive component strength factor R_po (ASCE/SEI 7-22 §13.3.1)'],
  building_r: [
    (v) => v > 0,
    () => "the building's response modification coefficient R, > 0 (for R_μ, ASCE/SEI 7-22 §13.3.1.2)",
  ],
  building_omega0: [
    (v) => v >= 1,
    () =>
      'the building\'s overstrength factor Ω₀ ≥ 1 (for R_μ, §13.3.1.2; the component anchorage\'s Ω₀ is "omega0")',
  ],
  building_ie: [
    (v) => v > 0,
    () => "the building's importance factor I_e, > 0 (for R_μ, ASCE/SEI 7-22 §13.3.1.2)",
  ],
  building_ta_s: [
    (v) => v > 0,
    () => "the building's approximate period T_a in s, > 0 (for H_f, ASCE/SEI 7-22 §13.3.1.1)",
  ],
  ss: [(v) => v >= 0, () => 'the MCE_R short-period S_S in g, ≥ 0 (for C_v, Table 11.9-1)'],
};

interface Reader {
  object: Record<string, unknown>;
  /** Refuse, naming the key (and its line where the key is in the file). */
  fail: (key: string, message: string) => never;
  number: (key: string) => number;
}

const given = (object: Record<string, unknown>, key: string) => object[key] !== undefined;

/** The edition the file names ("code"), ASCE/SEI 7-16 when it names none. */
export function readEdition({ object, fail }: Pick<Reader, 'object' | 'fail'>): ComponentEdition {
  const code = object['code'];
  if (code === undefined) return 'asce7-16';
  if (typeof code !== 'string' || !COMPONENT_EDITIONS.includes(code as ComponentEdition)) {
    fail('code', `must be "asce7-16" (the default) or "asce7-22", got ${JSON.stringify(code)}`);
  }
  return code as ComponentEdition;
}

/**
 * Refuse the other edition's keys (a 7-16 file, "code" given or not, refuses C_AR, R_po and the
 * building's keys; a 7-22 file refuses a_p and R_p), and C_AR without R_po or R_po without C_AR.
 */
export function checkEditionKeys(
  { object, fail }: Pick<Reader, 'object' | 'fail'>,
  code: ComponentEdition,
): void {
  const other = code === 'asce7-16' ? 'asce7-22' : 'asce7-16';
  const defaulted = object['code'] === undefined ? ', the default when "code" is not given' : '';
  for (const key of [
    ...EDITION_KEYS[other],
    ...(code === 'asce7-16' ? [...BUILDING_KEYS, BUILDING_PERIOD_KEY] : []),
  ]) {
    if (given(object, key)) {
      fail(
        key,
        `is an ${EDITION_NAMES[other]} coefficient; this file is ${EDITION_NAMES[code]}${defaulted}` +
          ` and gives ${EDITION_KEYS[code].map((k) => `"${k}"`).join(' and ')} instead` +
          (code === 'asce7-16' ? ' (add "code": "asce7-22" for the 7-22 force)' : ''),
      );
    }
  }
  if (code === 'asce7-22' && given(object, 'car') !== given(object, 'rpo')) {
    const absent = given(object, 'car') ? 'rpo' : 'car';
    fail(absent, 'is missing: ASCE/SEI 7-22 Eq. 13.3-1 needs both "car" (C_AR) and "rpo" (R_po)');
  }
}

/**
 * The edition's coefficients (their presence checked before). A 7-22 file gives C_AR and R_po and,
 * for a component above grade (z > 0), the building's R, Ω₀ and I_e (T_a optional); at grade
 * those are not needed and, when given, are checked and not used (the outputs say so).
 */
export function readFactors(reader: Reader, code: ComponentEdition, zAboveGrade: boolean): ComponentFactors {
  const { object, fail, number } = reader;
  if (code === 'asce7-16') return { code, ap: number('ap'), rp: number('rp') };
  const factors = { code, car: number('car'), rpo: number('rpo') };
  const present = BUILDING_KEYS.filter((key) => given(object, key));
  const list = BUILDING_KEYS.map((k) => `"${k}"`).join(', ');
  if (present.length > 0 && present.length < BUILDING_KEYS.length) {
    const absent = BUILDING_KEYS.find((key) => !given(object, key)) as string;
    fail(absent, `is missing: R_μ (ASCE/SEI 7-22 §13.3.1.2, Eq. 13.3-6) needs all three of ${list}`);
  }
  if (present.length === 0) {
    if (zAboveGrade) {
      fail(
        'building_r',
        `is missing: a component above grade (z > 0) needs the building's R, Ω₀ and I_e for R_μ ` +
          `(ASCE/SEI 7-22 §13.3.1.2): give ${list} (the building's Ω₀, not the anchorage "omega0")`,
      );
    }
    if (given(object, BUILDING_PERIOD_KEY)) number(BUILDING_PERIOD_KEY);
    return { ...factors, building: null };
  }
  const [r, omega0, ie] = BUILDING_KEYS.map(number);
  const taS = given(object, BUILDING_PERIOD_KEY) ? number(BUILDING_PERIOD_KEY) : null;
  return { ...factors, building: { r, omega0, ie, taS } };
}

/**
 * The vertical spectral demand's inputs (§11.9), all three or none: the component's vertical
 * period (≤ 2.0 s, or "rigid"), S_S and a site class of the edition.
 */
export function readVertical(reader: Reader, code: ComponentEdition): VerticalInput | null {
  const { object, fail, number } = reader;
  const present = VERTICAL_KEYS.filter((key) => given(object, key));
  if (present.length === 0) return null;
  if (present.length < VERTICAL_KEYS.length) {
    const absent = VERTICAL_KEYS.find((key) => !given(object, key)) as string;
    fail(
      absent,
      `is missing: the vertical spectral demand (§11.9) needs all three of ${VERTICAL_KEYS.map((k) => `"${k}"`).join(', ')}`,
    );
  }
  const periodS = object['vertical_period_s'];
  const isPeriod =
    typeof periodS === 'number' &&
    Number.isFinite(periodS) &&
    periodS >= 0 &&
    periodS <= VERTICAL_MAX_PERIOD_S;
  if (periodS !== 'rigid' && !isPeriod) {
    fail(
      'vertical_period_s',
      `must be the component's vertical period T_v in s, 0 to ${VERTICAL_MAX_PERIOD_S} (§11.9.2 gives S_av to ` +
        `${VERTICAL_MAX_PERIOD_S} s), or "rigid", got ${JSON.stringify(periodS)}`,
    );
  }
  const siteClass = object['site_class'];
  const classes = VERTICAL_SITE_CLASSES[code];
  if (typeof siteClass !== 'string' || !classes.includes(siteClass.trim().toUpperCase())) {
    fail(
      'site_class',
      `must be a site class of ${EDITION_NAMES[code]}: ${classes.join(', ')}, got ${JSON.stringify(siteClass)}`,
    );
  }
  return {
    periodS: periodS as number | 'rigid',
    ssG: number('ss'),
    siteClass: (siteClass as string).trim().toUpperCase(),
  };
}

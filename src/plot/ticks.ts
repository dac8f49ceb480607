import { scaleLinear } from 'd3-scale';

/** Ticks of one axis: every tick position, and the subset that carries a label (with its text). */
export interface AxisTicks {
  major: number[];
  minor: number[];
  labels: { value: number; text: string }[];
}

/** Rough width of a label in a sans-serif font: 0.6 em a character (wide enough for DejaVu Sans). */
export function textWidthPx(text: string, fontSizePx: number): number {
  return text.length * fontSizePx * 0.6;
}

const SUPERSCRIPT_DIGITS = '⁰¹²³⁴⁵⁶⁷⁸⁹';

/** How the labels of one log axis are written: plain decimals, or powers of ten throughout. */
export type LogLabelStyle = 'plain' | 'power';

/**
 * The label style of a log axis over `domain`: plain decimals when every decade in it lies from
 * 0.001 to 10 000, powers of ten for every label otherwise, so one axis never mixes 10⁻⁴ with 0.001.
 */
export function logLabelStyle(domain: readonly [number, number]): LogLabelStyle {
  const exponents = domain.map((v) => Math.floor(Math.log10(v) + 1e-9));
  return exponents.every((e) => e >= -3 && e <= 4) ? 'plain' : 'power';
}

/** A tick value for a log axis, in the axis' style (by default the style of the value alone). */
export function formatLogValue(value: number, style: LogLabelStyle = logLabelStyle([value, value])): string {
  const exponent = Math.floor(Math.log10(value) + 1e-9);
  if (style === 'plain') return String(Number(value.toPrecision(6)));
  const mantissa = Number((value / 10 ** exponent).toPrecision(3));
  const superscript = (c: string) => (c === '-' ? '⁻' : SUPERSCRIPT_DIGITS[Number(c)]);
  const power = `10${String(exponent).split('').map(superscript).join('')}`;
  return mantissa === 1 ? power : `${mantissa}×${power}`;
}

/** A label's extent along its axis, px, centred on its tick. */
type LabelSpan = { value: number; text: string; from: number; to: number };

function labelSpan(
  value: number,
  text: string,
  toPixel: (value: number) => number,
  labelExtentPx: (text: string) => number,
): LabelSpan {
  const half = labelExtentPx(text) / 2;
  return { value, text, from: toPixel(value) - half, to: toPixel(value) + half };
}

/** Whether no two labels come within 4 px of each other; sorts `spans` by position. */
function clear(spans: LabelSpan[]): boolean {
  spans.sort((a, b) => a.from - b.from);
  return spans.every((s, i) => i === 0 || s.from >= spans[i - 1].to + 4);
}

/**
 * Decade ticks with minor ticks at 2…9 × 10ᵏ on a log axis (common practice). Decades are labelled,
 * thinned to every second or third decade when their labels would touch; 2 and 5 × 10ᵏ are labelled
 * too when the axis spans less than about two decades and there is room. Every label of the axis
 * is written in one style (`logLabelStyle`).
 */
export function logTicks(
  domain: readonly [number, number],
  toPixel: (value: number) => number,
  labelExtentPx: (text: string) => number,
): AxisTicks {
  const [low, high] = domain[0] < domain[1] ? domain : [domain[1], domain[0]];
  const inside = (v: number) => v >= low * (1 - 1e-9) && v <= high * (1 + 1e-9);
  const major: number[] = [];
  const minor: number[] = [];
  for (let k = Math.floor(Math.log10(low)); k <= Math.ceil(Math.log10(high)); k++) {
    const decade = 10 ** k;
    if (inside(decade)) major.push(decade);
    for (let m = 2; m <= 9; m++) if (inside(m * decade)) minor.push(m * decade);
  }
  const style = logLabelStyle([low, high]);
  const span = (value: number) => labelSpan(value, formatLogValue(value, style), toPixel, labelExtentPx);
  let placed: LabelSpan[] = [];
  for (let stride = 1; stride <= Math.max(1, major.length); stride++) {
    placed = major.filter((_, i) => i % stride === 0).map(span);
    if (clear(placed)) break;
  }
  const decades = Math.log10(high / low);
  if (placed.length < 3 || decades < 2) {
    const extra = decades < 1.2 ? minor : minor.filter((v) => [2, 5].includes(leadingDigit(v)));
    for (const s of extra.map(span)) {
      if (placed.every((p) => s.to + 4 <= p.from || s.from >= p.to + 4)) placed.push(s);
    }
  }
  placed.sort((a, b) => a.value - b.value);
  return { major, minor, labels: placed.map(({ value, text }) => ({ value, text })) };
}

/**
 * Ticks of a linear axis from d3-scale's 1-2-5 tick rule, as many as fit: the count is lowered
 * until no two labels touch.
 */
export function linearTicks(
  domain: readonly [number, number],
  toPixel: (value: number) => number,
  labelExtentPx: (text: string) => number,
  lengthPx: number,
): AxisTicks {
  const scale = scaleLinear().domain(domain);
  for (let count = Math.max(2, Math.round(lengthPx / 50)); ; count--) {
    const values = scale.ticks(count);
    const format = scale.tickFormat(count);
    const spans = values.map((value) => labelSpan(value, format(value), toPixel, labelExtentPx));
    if (clear(spans) || count === 2) {
      const minor = scale.ticks(count * 5).filter((v) => !values.includes(v));
      return { major: values, minor, labels: spans.map(({ value, text }) => ({ value, text })) };
    }
  }
}

function leadingDigit(value: number): number {
  return Math.round(value / 10 ** Math.floor(Math.log10(value) + 1e-9));
}

/** The 1-2-5 value at or below `value` (> 0). */
export function niceFloor125(value: number): number {
  const decade = 10 ** Math.floor(Math.log10(value) + 1e-12);
  for (const s of [5, 2, 1]) if (s * decade <= value * (1 + 1e-12)) return s * decade;
  return decade;
}

/** The 1-2-5 value at or above `value` (> 0). */
export function niceCeil125(value: number): number {
  const decade = 10 ** Math.floor(Math.log10(value) + 1e-12);
  for (const s of [1, 2, 5, 10]) if (s * decade >= value * (1 - 1e-12)) return s * decade;
  return 10 * decade;
}

/** Room kept above the highest curve of a log axis: a tenth of its value, about 0.04 decade. */
export const LOG_HEADROOM = 1.1;

/**
 * The top of a log axis over data as high as `value` (> 0): the first of 1, 1.5, 2, 3, 5, 7 × 10ᵏ
 * at or above `value` × LOG_HEADROOM, so a curve (a design plateau at 1 g) never lies on the frame.
 */
export function niceCeilWithHeadroom(value: number): number {
  const wanted = value * LOG_HEADROOM;
  const decade = 10 ** Math.floor(Math.log10(wanted) + 1e-12);
  const step = [1, 1.5, 2, 3, 5, 7, 10].find((s) => s * decade >= wanted * (1 - 1e-12)) ?? 10;
  return Number((step * decade).toPrecision(12));
}

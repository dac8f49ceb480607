// The record reader's fast path for numeric rows (src/record/rows.ts): it reads, over many lines of
// ASCII text at once, exactly the rows the TypeScript reader (src/record/reader.ts) would take
// without a word, with the values parseNumber (src/record/number.ts) gives, and stops before any
// other line. TypeScript runs unoptimized for the first tens of thousands of rows
// in a fresh process; this runs at full speed from the first line. Written by hand; compiled by
// scripts/build-wasm.mjs (no SIMD).

/** 10⁰ to 10²², every one exact in binary64 (5²² < 2⁵³). */
const POWERS_OF_TEN = memory.data<f64>([
  1, 1e1, 1e2, 1e3, 1e4, 1e5, 1e6, 1e7, 1e8, 1e9, 1e10, 1e11, 1e12, 1e13, 1e14, 1e15, 1e16, 1e17, 1e18, 1e19,
  1e20, 1e21, 1e22,
]);

/** Longest line read here (MAX_LINE_CHARACTERS in separator.ts). */
const MAX_LINE: usize = 1_000_000;

/** First free byte of linear memory: the caller lays out its arrays from here. */
export function heapBase(): usize {
  return (__heap_base + 15) & ~15;
}

function isBlank(c: u32): bool {
  return c === 32 || c === 9;
}

function isFieldEnd(c: u32): bool {
  return c === 44 || isBlank(c);
}

/** Where the last decimal() stopped: the byte after its number. */
let decimalEnd: usize = 0;

/**
 * The number that starts at `from` and goes no further than `to`: a sign, digits with at most one
 * point, an `e` or `E` exponent of at most three digits, at most 15 significant digits and a
 * scale within 10^±22, read with one multiplication or division of exact numbers, which rounds
 * once, to the nearest double, as Number() does (closed form); NaN for anything else. It stops
 * at the first byte that cannot continue the number (decimalEnd), which the caller checks ends
 * the field.
 */
function decimal(from: usize, to: usize): f64 {
  if (from >= to) return NaN;
  let i = from;
  let c = <u32>load<u8>(i);
  const negative = c === 45;
  if (negative || c === 43) i++;
  // The digits as an integer: with at most 15 significant ones it is below 2⁵³, so it converts to
  // f64 exactly (longer runs may wrap; they are refused below). A digit is significant from the
  // first that is not 0, across the point.
  let mantissa: u64 = 0;
  let significant = 0;
  const integerStart = i;
  let d: u32 = 0;
  while (i < to && (d = <u32>load<u8>(i) - 48) < 10) {
    significant += <i32>((mantissa | <u64>d) !== 0);
    mantissa = mantissa * 10 + <u64>d;
    i++;
  }
  let digits = <i32>(i - integerStart);
  let decimals = 0;
  if (i < to && load<u8>(i) === 46) {
    const fractionStart = ++i;
    while (i < to && (d = <u32>load<u8>(i) - 48) < 10) {
      significant += <i32>((mantissa | <u64>d) !== 0);
      mantissa = mantissa * 10 + <u64>d;
      i++;
    }
    decimals = <i32>(i - fractionStart);
    digits += decimals;
  }
  if (digits === 0 || significant > 15) return NaN;
  let exponent = 0;
  if (i < to && (load<u8>(i) | 32) === 101) {
    // e or E: a sign, then one to three digits.
    if (++i === to) return NaN;
    c = <u32>load<u8>(i);
    const negativeExponent = c === 45;
    if (negativeExponent || c === 43) i++;
    const exponentStart = i;
    while (i < to && (d = <u32>load<u8>(i) - 48) < 10) {
      exponent = exponent * 10 + <i32>d;
      i++;
    }
    const exponentDigits = i - exponentStart;
    if (exponentDigits === 0 || exponentDigits > 3) return NaN;
    if (negativeExponent) exponent = -exponent;
  }
  decimalEnd = i;
  const scale = exponent - decimals;
  if (scale < -22 || scale > 22) return NaN;
  const exact = <f64>mantissa;
  const magnitude =
    scale >= 0
      ? exact * load<f64>(POWERS_OF_TEN + ((<usize>scale) << 3))
      : exact / load<f64>(POWERS_OF_TEN + ((<usize>-scale) << 3));
  return negative ? -magnitude : magnitude;
}

/**
 * Read the rows of the `length` bytes at `text`, line after line from its start, while each is a
 * row the reader would take: `columns` fields of short decimals separated by commas (or, when
 * `whitespace`, by runs of spaces and tabs), blanks around them, the value in column
 * `valueColumn` with |value|·`unit` at most `limit`, and (with more than one column) a time that
 * increases by the mean step to 1e-6. Empty lines are skipped; lines end with `\n` or `\r\n`.
 * It stops before the first line that is anything else, before a line with no end in the text,
 * and before `capacity` values. The values, times `unit` (m/s²), go to `values`; `state` holds, in and out: [0] the
 * samples read before (and after), [1] the first time, [2] the previous time; [3] the bytes read,
 * [4] the lines read, [5] the index among them of the last that held a row (−1 if none) and
 * [6] why it stopped (1: before a line it does not read; 0: at the end of the text or of the
 * capacity) are written.
 */
export function scanRows(
  text: usize,
  length: i32,
  columns: i32,
  valueColumn: i32,
  whitespace: i32,
  unit: f64,
  limit: f64,
  values: usize,
  capacity: i32,
  state: usize,
): void {
  let count = <i32>load<f64>(state);
  const timeFirst = load<f64>(state, 8);
  let timePrevious = load<f64>(state, 16);
  const end = text + <usize>length;
  let lineStart = text;
  let lines = 0;
  let lastRow = -1;
  let written = 0;
  let refused = 0;
  while (lineStart < end && written < capacity) {
    // The line's end: a \n, or \r\n; a lone \r, a byte outside ASCII or no end stops the reading.
    let stop = lineStart;
    while (stop < end) {
      const c = <u32>load<u8>(stop);
      if (c === 10 || c === 13 || c >= 128) break;
      stop++;
    }
    if (stop === end) break;
    const terminator = <u32>load<u8>(stop);
    if (terminator >= 128 || stop - lineStart > MAX_LINE) {
      refused = 1;
      break;
    }
    let next = stop + 1;
    if (terminator === 13) {
      if (next === end) break;
      if (load<u8>(next) !== 10) {
        refused = 1;
        break;
      }
      next++;
    }
    if (stop > lineStart) {
      let i = lineStart;
      let column = 0;
      let time: f64 = 0;
      let value: f64 = 0;
      let good = true;
      for (;;) {
        while (i < stop && isBlank(<u32>load<u8>(i))) i++;
        if (i === stop && (whitespace !== 0 || column === 0)) break;
        // The number reads as far as it goes; the field must end there (a comma, a blank or the
        // line's end), which is the field the reader splits off and reads whole.
        const number = decimal(i, stop);
        i = decimalEnd;
        // biome-ignore lint/suspicious/noSelfCompare: the NaN test (not a short decimal)
        if (number !== number || (i < stop && !isFieldEnd(<u32>load<u8>(i)))) {
          good = false;
          break;
        }
        column++;
        if (column === 1) time = number;
        if (column === valueColumn) value = number;
        while (i < stop && isBlank(<u32>load<u8>(i))) i++;
        if (i === stop) break;
        if (whitespace === 0) {
          if (load<u8>(i) !== 44) {
            good = false;
            break;
          }
          i++;
        }
      }
      if (!good || column !== columns || Math.abs(value) * unit > limit) {
        refused = 1;
        break;
      }
      if (columns > 1) {
        let uniform = time > timePrevious;
        if (uniform && count >= 2) {
          const meanStep = (timePrevious - timeFirst) / <f64>(count - 1);
          uniform = Math.abs(time - timePrevious - meanStep) <= 1e-6 * meanStep;
        }
        if (!uniform) {
          refused = 1;
          break;
        }
        timePrevious = time;
      }
      // In m/s², as the reader stores it: the value times the unit's factor.
      store<f64>(values + ((<usize>written) << 3), value * unit);
      written++;
      count++;
      lastRow = lines;
    }
    lines++;
    lineStart = next;
  }
  store<f64>(state, <f64>count);
  store<f64>(state, timePrevious, 16);
  store<f64>(state, <f64>(lineStart - text), 24);
  store<f64>(state, <f64>lines, 32);
  store<f64>(state, <f64>lastRow, 40);
  store<f64>(state, <f64>refused, 48);
}

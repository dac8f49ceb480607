/**
 * The line splitter and the row scanner (the reader's fast path) against the TypeScript reader
 * alone. The oracle is readRecordText with no scanner (null): every line split by the line splitter
 * and read by RecordReader.row. The fast path, the stream reader and every way of cutting a
 * stream into chunks must give the same samples, the same step and the same error message with
 * the same line number. Where a check names values or lines of its own, they were counted by hand.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { type ReadOptions, readRecordStream, readRecordText } from '../../src/record/read.js';
import type { GroundRecord } from '../../src/record/record.js';
import { RowScanner } from '../../src/record/rows.js';
import { FUZZ_SEED, runs } from '../helpers/fuzz-budget.js';
import { chunked, mutatedRecord, streamOf, wellFormedRecord } from '../helpers/fuzz-records.js';

const SOURCE = 'scan/rec.txt';
const MAX = 1_000_000; // the reader's MAX_LINE_CHARACTERS
const LONG_LINE = `${SOURCE}:%d: a line longer than ${MAX} characters: is this a text record?`;

type Outcome = { samples: number[]; dtS: number } | { error: string; kind: string; line: number | undefined };

async function outcome(read: () => Promise<GroundRecord> | GroundRecord): Promise<Outcome> {
  try {
    const record = await read();
    return { samples: Array.from(record.accelMS2), dtS: record.dtS };
  } catch (error) {
    if (!isQuakesweepError(error)) throw error; // anything else is a defect
    return { error: error.describe(), kind: error.kind, line: error.line };
  }
}

const bytesOf = (text: string) => new Uint8Array(Buffer.from(text, 'utf8'));

/** The oracle: the TypeScript reader alone, on the whole text. */
function alone(text: string, options: Omit<ReadOptions, 'source'>): Promise<Outcome> {
  return outcome(() => readRecordText(text, { ...options, source: SOURCE }, null));
}

function fromChunks(chunks: (string | Uint8Array)[], options: Omit<ReadOptions, 'source'>) {
  async function* all() {
    yield* chunks;
  }
  return outcome(() => readRecordStream(all(), { ...options, source: SOURCE }));
}

/** Bytes of `text` in pieces of `size`, cutting lines, `\r\n` and characters. */
function pieces(text: string, size: number): Uint8Array[] {
  const bytes = bytesOf(text);
  const out: Uint8Array[] = [];
  for (let i = 0; i < bytes.length; i += size) out.push(bytes.subarray(i, i + size));
  return out;
}

/** The reader with its fast path three ways (whole text, bytes cut at `cuts`, one chunk) and the oracle; all must agree. */
async function agree(text: string, options: Omit<ReadOptions, 'source'>, cuts: number[] = []) {
  const expected = await alone(text, options);
  expect(await outcome(() => readRecordText(text, { ...options, source: SOURCE }))).toEqual(expected);
  expect(await fromChunks(chunked(bytesOf(text), cuts), options)).toEqual(expected);
  expect(
    await outcome(() => readRecordStream(streamOf([bytesOf(text)]), { ...options, source: SOURCE })),
  ).toEqual(expected);
  return expected;
}

/** Lines of every kind: plain numbers and separators, words, comments, quotes, odd spaces, control characters. */
const token = fc.oneof(
  {
    weight: 6,
    arbitrary: fc.constantFrom('0', '1', '-2.5', '1.5e-3', '+.5', '3.', '12.3450', '1.23456789e-02', '0,5'),
  },
  { weight: 4, arbitrary: fc.constantFrom(',', ';', ' ', '\t', '  ', ' , ', ' ; ', '\t\t') },
  {
    weight: 2,
    arbitrary: fc.constantFrom('1.5D-03', 'e', 'E5', '--', '.', '1.2.3', '1e999', '-0', '1e', '9'.repeat(20)),
  },
  {
    weight: 2,
    arbitrary: fc.constantFrom(
      '#',
      '# note',
      '"',
      '"1"',
      "'",
      '\ufeff',
      '\u00a0',
      '\u2028',
      '\u3000',
      '\u000b',
      '\u000c',
      '\u0085',
      '\u0000',
      '\u0007',
      '\u001b',
      '\ufffd',
      '\ud800',
      'é',
      '°',
      '😀',
      'time',
      'accel (g)',
      'NaN',
      'Infinity',
      '0x10',
    ),
  },
  { weight: 1, arbitrary: fc.string({ maxLength: 3, unit: 'binary' }) },
);
const soupLine = fc.array(token, { maxLength: 8 }).map((parts) => parts.join(''));
const soup = fc.record({
  lines: fc.array(soupLine, { maxLength: 30 }),
  ends: fc.array(fc.constantFrom('\n', '\r\n', '\r'), { minLength: 30, maxLength: 30 }),
  trailing: fc.boolean(),
  bom: fc.boolean(),
  options: fc.record({
    units: fc.constantFrom('g' as const, 'cm/s2' as const),
    dtS: fc.option(fc.constant(0.01), { nil: undefined }),
    skip: fc.option(fc.integer({ min: 0, max: 3 }), { nil: undefined }),
    layout: fc.constantFrom('auto' as const, 'single' as const, 'table' as const, 'wrapped' as const),
    column: fc.option(fc.integer({ min: 1, max: 3 }), { nil: undefined }),
  }),
});
const soupText = (s: { lines: string[]; ends: string[]; trailing: boolean; bom: boolean }) =>
  (s.bom ? '\ufeff' : '') +
  s.lines.map((line, i) => line + (i < s.lines.length - 1 || s.trailing ? s.ends[i] : '')).join('');

describe('the fast path and the stream reader against the TypeScript reader (property)', () => {
  it('gives the same samples, step and error on well-formed files, whatever the chunks', async () => {
    await fc.assert(
      fc.asyncProperty(wellFormedRecord, fc.array(fc.nat(), { maxLength: 8 }), async (written, cuts) => {
        const result = await agree(written.text, written.options, cuts);
        expect('samples' in result).toBe(true); // well-formed: read (the generator's own check)
      }),
      { seed: FUZZ_SEED + 10, numRuns: runs(150) },
    );
  });

  it('gives the same on damaged files (lines of at most 1,000,000 characters)', async () => {
    await fc.assert(
      fc.asyncProperty(
        mutatedRecord.filter((m) => !m.mutations.includes('longLine')),
        fc.array(fc.nat(), { maxLength: 8 }),
        async (damaged, cuts) => {
          await agree(damaged.text, damaged.options, cuts);
        },
      ),
      { seed: FUZZ_SEED + 11, numRuns: runs(300) },
    );
  });

  it('gives the same on lines of every kind, plain and not, with every line end', async () => {
    await fc.assert(
      fc.asyncProperty(soup, fc.array(fc.nat(), { maxLength: 8 }), async (s, cuts) => {
        await agree(soupText(s), s.options, cuts);
      }),
      { seed: FUZZ_SEED + 12, numRuns: runs(400) },
    );
  });

  it('gives the same when a line of over 1,000,000 characters starts a line', async () => {
    await fc.assert(
      fc.asyncProperty(
        wellFormedRecord,
        fc.nat(),
        fc.constantFrom('1', 'x'),
        fc.array(fc.nat(), { maxLength: 4 }),
        async (written, at, character, cuts) => {
          const starts = [0];
          for (const m of written.text.matchAll(/\r\n|\n|\r/g)) starts.push((m.index ?? 0) + m[0].length);
          let start = starts[at % starts.length];
          if (start === 0 && written.text.startsWith('\ufeff')) start = 1;
          const text = written.text.slice(0, start) + character.repeat(MAX + 2) + written.text.slice(start);
          const result = await agree(text, written.options, cuts);
          expect(result).toMatchObject({ error: expect.stringContaining('a line longer than 1000000') });
        },
      ),
      { seed: FUZZ_SEED + 13, numRuns: runs(12, 4) },
    );
  });
});

describe('chunk boundaries', () => {
  const files: [string, string, Omit<ReadOptions, 'source'>][] = [
    [
      'CRLF, BOM, comments, header, blank lines',
      '\ufeff# séisme inventé 😀\r\ntime_s,accel_g\r\n\r\n0.000,1.5\r\n0.005, -2.5e-1\r\n# half\r\n\r\n0.010 ,3\r\n0.015,4\r\n',
      { units: 'g' },
    ],
    ['CR only, spaces', '  0  1\r\r  0.5  2\r# c\r  1.0  3\r', { units: 'm/s2' }],
    ['mixed ends, semicolons, decimal commas', 't;a\n0;0,5\r\n0,01;-1,25\r0,02;2,0D-1', { units: 'gal' }],
    ['an error on line 7', '0,1\r\n\r\n# x\r\n0.1,2\r\r\n0.2,3\n0.3,abc\r\n0.4,5\r\n', { units: 'g' }],
    ['a header, then binary data', 'time,a\r\n0,1\r\n0.1,\u00012\r\n', { units: 'g' }],
  ];

  it.each(files)(
    '%s: the same in pieces of 1, 2, 3 and 7 bytes, cut inside every \\r\\n, and as strings',
    async (_, text, options) => {
      const expected = await alone(text, options);
      for (const size of [1, 2, 3, 7]) {
        expect(await fromChunks(pieces(text, size), options)).toEqual(expected);
        const strings: string[] = [];
        for (let i = 0; i < text.length; i += size) strings.push(text.slice(i, i + size)); // cuts 😀 in two
        expect(await fromChunks(strings, options)).toEqual(
          await alone(text.replace('😀', '\ufffd\ufffd'), options),
        );
      }
      // Cut between the two halves of every \r\n.
      const bytes = bytesOf(text);
      const cuts: number[] = [];
      bytes.forEach((b, i) => {
        if (b === 13 && bytes[i + 1] === 10) cuts.push(i + 1);
      });
      expect(await fromChunks(chunked(bytes, cuts), options)).toEqual(expected);
      expect(await outcome(() => readRecordText(text, { ...options, source: SOURCE }))).toEqual(expected);
    },
  );

  it('reads the files above as expected (counted by hand)', async () => {
    expect(await alone(files[0][1], files[0][2])).toMatchObject({
      samples: [1.5, -0.25, 3, 4].map((g) => g * 9.80665),
    });
    expect(await alone(files[3][1], files[3][2])).toMatchObject({ line: 7 });
    expect(await alone(files[4][1], files[4][2])).toMatchObject({ line: 3 });
  });
});

describe('line numbers in error messages', () => {
  // Each file has its bad value on the line given, counted by hand.
  it.each([
    ['LF', '0,1\n0.1,2\n0.2,x\n', 3],
    ['CRLF', '0,1\r\n0.1,2\r\n0.2,x\r\n', 3],
    ['CR', '0,1\r0.1,2\r0.2,x\r', 3],
    ['LF then CR: two breaks', '0,1\n\r0.1,2\r0.2,x', 4],
    ['blank lines', '\n\n0,1\n\n\n0.1,2\n\n0.2,x\n', 8],
    ['blank CRLF lines', '\r\n0,1\r\n\r\n0.1,2\r\n0.2,x\r\n', 5],
    ['# comments', '# a\n# b\n0,1\n# c\n0.1,2\n0.2,x # d\n', 6],
    ['comments and --skip', 'head\n# a\n0,1\n0.1,2\n0.2,x\n', 5],
    ['BOM and a header', '\ufefftime,a\n0,1\n0.1,2\n0.2,x\n', 4],
    ['the last line without a break', '0,1\r\n0.1,2\r\n0.2,3\r\n0.25,4', 4],
    ['a quote', '0,1\n0.1,"2"\n', 2],
    ['a second header', 'time,a\n0,1\nt,a\n', 3],
  ])('%s', async (name, text, line) => {
    const options = { units: 'g' as const, skip: name.includes('--skip') ? 1 : 0 };
    const expected = await agree(text, options, [1, 5, 9]);
    expect(expected).toMatchObject({ line });
  });
});

describe('byte-order marks, UTF-16LE, skipped lines', () => {
  it('removes one byte-order mark, at the start only', async () => {
    for (const text of [
      '\ufeff0 1\n0.5 2\n',
      '\ufeff\ufeff0 1\n0.5 2\n',
      '\ufeff\ufeff0,1\n0.5,2\n',
      '0,1\n\ufeff0.5,2\n',
      '0 1\n\ufeff0.5 2\n',
      '\ufeff',
      '\ufeff\n0,1\n1,2\n',
    ])
      await agree(text, { units: 'g' }, [1, 2, 3, 4]);
  });

  it('reads a UTF-16LE file (bytes FF FE first)', async () => {
    const bytes = new Uint8Array(Buffer.from('\ufefftime\ta\r\n0\t1\r\n0.5\t2\r\n1.0\t3\r\n', 'utf16le'));
    const expected = { samples: [1, 2, 3], dtS: 0.5 }; // the values written
    expect(await fromChunks([bytes], { units: 'm/s2' })).toEqual(expected);
    expect(await fromChunks(chunked(bytes, [1, 2, 3, 7]), { units: 'm/s2' })).toEqual(expected);
  });

  it('holds skipped lines to the limit in bytes too', async () => {
    // 400,000 characters of three bytes each: over the limit of 1,000,000 bytes of fields
    // (fields.ts), within the splitter's 1,000,000 characters.
    const text = `${'€'.repeat(400_000)}\n0,1\n0.1,2\n`;
    const expected = await agree(text, { units: 'g', skip: 1 });
    expect(expected).toMatchObject({ line: 1, error: LONG_LINE.replace('%d', '1') });
    expect(await agree('head: 1,2;3 é\n0,1\n0.1,2\n', { units: 'g', skip: 1 })).toMatchObject({
      samples: [1, 2].map((g) => g * 9.80665),
    });
  });
});

describe('lines longer than 1,000,000 characters', () => {
  it('refuses a data line of 1,000,001 digits at its line', async () => {
    const text = `0,1\r\n0.1,2\r\n0.2,${'3'.repeat(MAX + 1)}9\r\n0.3,4\r\n`;
    const expected = await agree(text, { units: 'g' }, [65536, 131072]);
    expect(expected).toMatchObject({ error: LONG_LINE.replace('%d', '3'), line: 3 });
  });

  it.each([
    ['a comment', `0,1\n# ${'x'.repeat(MAX)}\n0.1,2\n`, 2],
    ['spaces', `0 1\n${' '.repeat(MAX + 1)}\n0.1 2\n`, 2],
    ['separators', `0,1\n0.1,2${','.repeat(MAX)}\n`, 2],
  ])(
    'refuses %s longer than the limit, though the limit in bytes does not count it',
    async (_, text, line) => {
      const options = { units: 'g' as const };
      const refused = { error: LONG_LINE.replace('%d', String(line)), kind: 'input', line };
      expect(await outcome(() => readRecordText(text, { ...options, source: SOURCE }))).toEqual(refused);
      expect(await fromChunks(pieces(text, 65536), options)).toEqual(refused);
    },
  );

  it('refuses a line that never ends once it passes the limit, without reading on', async () => {
    for (const [before, line] of [
      ['', 1],
      ['0,1\r\n0.1,2\r\n', 3],
    ] as const) {
      let pulled = 0;
      let closed = false;
      const endless = async function* () {
        try {
          yield bytesOf(before);
          const block = bytesOf('1'.repeat(65536));
          for (; pulled < 100; pulled++) yield block;
          throw new Error('read on far past the limit'); // a defect, not a refusal: fails the test
        } finally {
          closed = true;
        }
      };
      const result = await outcome(() => readRecordStream(endless(), { units: 'g', source: SOURCE }));
      expect(result).toEqual({ error: LONG_LINE.replace('%d', String(line)), kind: 'input', line });
      // The limit's worth of 64 KiB blocks and one more (closed form: ⌈10⁶ / 65536⌉ = 16).
      expect(pulled).toBeLessThanOrEqual(Math.ceil(MAX / 65536) + 1);
      expect(closed).toBe(true); // the file is closed
    }
  });

  it('refuses a file of lone carriage returns and one endless line without holding it all', async () => {
    let pulled = 0;
    const endless = async function* () {
      yield bytesOf('0,1\r0.1,2\r');
      for (; pulled < 100; pulled++) yield bytesOf('x'.repeat(65536));
      throw new Error('read on far past the limit'); // a defect, not a refusal: fails the test
    };
    const result = await outcome(() => readRecordStream(endless(), { units: 'g', source: SOURCE }));
    expect(result).toMatchObject({ line: 3 });
    expect(pulled).toBeLessThanOrEqual(Math.ceil(MAX / 65536) + 1); // closed form, as above
  });
});

describe('the fast path over a long text', () => {
  it('reads the rows between odd lines anywhere in 60,000 lines, across the pieces it copies', async () => {
    // A fixed pseudo-random sequence (a linear congruential generator, common practice) places
    // lines the fast path does not read (comments with and without letters outside ASCII, a
    // Fortran exponent, 16 significant digits, blank lines, spaces) among plain rows.
    let seed = 4242;
    const next = () => {
      seed = (seed * 1103515245 + 12345) % 2 ** 31;
      return seed / 2 ** 31;
    };
    const lines = ['time_s,accel_g'];
    const expected: number[] = [];
    for (let k = 0; k < 60_000; k++) {
      const t = (k * 0.005).toFixed(4);
      const odd = next();
      let value = ((k % 97) - 48) / 7;
      if (odd < 0.002) lines.push('# a comment');
      else if (odd < 0.004) lines.push('# séisme inventé');
      else if (odd < 0.006) lines.push('');
      let row = `${t},${value.toFixed(6)}`;
      if (odd > 0.998) {
        row = `${t},${(value * 10).toFixed(5)}D-01`; // the same value, written as Fortran does
      } else if (odd > 0.996) {
        row = `${t},${value.toFixed(15)}`; // 16 or 17 significant digits: the long way
        value = Number(value.toFixed(15));
      } else if (odd > 0.994) {
        row = ` ${t} , ${value.toFixed(6)} `;
      }
      if (odd <= 0.996) value = Number(value.toFixed(6));
      lines.push(row);
      expected.push(odd > 0.998 ? Number(`${((((k % 97) - 48) / 7) * 10).toFixed(5)}e-01`) : value);
    }
    const text = `${lines.join('\n')}\n`;
    expect(text.length).toBeGreaterThan(3 * 2 ** 18); // more than three of the scanner's pieces
    const options = { units: 'm/s2' as const };
    const read = await agree(text, options, [65536, 65537, 300_001]);
    expect(read).toMatchObject({ samples: expected });
    expect(await fromChunks(pieces(text, 65536), options)).toEqual(read);
    // The fast path read the rows after each odd line, not only those before the first.
    const scanner = RowScanner.get();
    if (scanner === null) throw new Error('no WebAssembly on this engine');
    let scanned = 0;
    const counting = {
      scan: (...args: Parameters<RowScanner['scan']>) => {
        const run = scanner.scan(...args);
        scanned += run.values.length;
        return run;
      },
      release: () => scanner.release(),
    } as unknown as RowScanner;
    readRecordText(text, { ...options, source: SOURCE }, counting);
    expect(scanned).toBeGreaterThan(0.99 * 60_000);
  });
});

/**
 * Property tests of the record loader (readRecordText and readRecordStream) on generated and
 * damaged files. Sources of the checks: the expected samples come from a plain parse of what the
 * generator printed (Number() on each field), the unit factors from their definitions (see
 * UNIT_FACTOR), the unit-warning bounds 5 g and 0.0001 g from the loader's documented rule
 * (common practice). Either a record comes back that matches, or a one-line input error that
 * names the file; never another kind of exception.
 */
import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { isQuakesweepError } from '../../src/base/errors.js';
import { readRecordStream, readRecordText, unitWarnings } from '../../src/record/read.js';
import type { GroundRecord } from '../../src/record/record.js';
import { FUZZ_SEED, report, runs } from '../helpers/fuzz-budget.js';
import {
  chunked,
  cutLineRefusal,
  G_MS2,
  mutatedRecord,
  streamOf,
  wellFormedRecord,
} from '../helpers/fuzz-records.js';

const SOURCE = 'fuzz/record.txt';

type Failure = { error: string; line: number | undefined };
type Outcome = { record: GroundRecord } | Failure;

function outcome(read: () => GroundRecord): Outcome {
  try {
    return { record: read() };
  } catch (error) {
    return failure(error);
  }
}

async function outcomeAsync(read: () => Promise<GroundRecord>): Promise<Outcome> {
  try {
    return { record: await read() };
  } catch (error) {
    return failure(error);
  }
}

function failure(error: unknown): Outcome {
  // Anything but a typed quakesweep error (a TypeError, a raw csv-parse error) is a defect.
  if (!isQuakesweepError(error)) throw error;
  return { error: error.describe(), line: error.line };
}

function checkFailure(result: Failure, lineCount: number): void {
  expect(result.error).not.toMatch(/[\r\n\u2028\u2029]/); // one line for a person
  expect(result.error).toContain(SOURCE);
  if (result.line !== undefined) {
    expect(result.line).toBeGreaterThanOrEqual(1);
    expect(result.line).toBeLessThanOrEqual(lineCount);
  }
}

function checkRecord(record: GroundRecord): void {
  expect(record.accelMS2.length).toBeGreaterThanOrEqual(2);
  expect(Number.isFinite(record.dtS) && record.dtS > 0).toBe(true);
  for (const value of record.accelMS2) expect(Number.isFinite(value)).toBe(true);
}

function same(a: Outcome, b: Outcome): void {
  if ('record' in a && 'record' in b) {
    expect(Array.from(b.record.accelMS2)).toEqual(Array.from(a.record.accelMS2));
    expect(b.record.dtS).toBe(a.record.dtS);
  } else {
    expect(b).toEqual(a);
  }
}

describe('loader on well-formed files', () => {
  it('reads the values and step the generator wrote, from text and from any chunking of the bytes', async () => {
    let cases = 0;
    await fc.assert(
      fc.asyncProperty(wellFormedRecord, fc.array(fc.nat(), { maxLength: 6 }), async (written, cuts) => {
        cases++;
        const options = { ...written.options, source: SOURCE };
        const fromText = outcome(() => readRecordText(written.text, options));
        if ('error' in fromText) {
          if (cutLineRefusal(written.text, fromText.error)) return;
          throw new Error(`refused a well-formed file: ${fromText.error}\n${written.text}`);
        }
        const record = fromText.record;
        expect(Array.from(record.accelMS2)).toEqual(written.expectedMS2);
        expect(Math.abs(record.dtS - written.expectedDtS)).toBeLessThanOrEqual(1e-12 * written.expectedDtS);
        expect(record.unitsRead).toBe(options.units);
        const pgaG = Math.max(...written.expectedMS2.map(Math.abs)) / G_MS2;
        // The PGA band of plausibility.ts, 0.001–5 g (common practice); PGV, PGD and duration have their own.
        const warnings = unitWarnings(record).filter((w) => w.startsWith('PGA'));
        if (pgaG > 5 * (1 + 1e-9) || pgaG < 1e-3 * (1 - 1e-9)) {
          expect(warnings).toHaveLength(1);
          expect(warnings[0]).toContain(`read in ${options.units}`);
        } else if (pgaG < 5 * (1 - 1e-9) && pgaG > 1e-3 * (1 + 1e-9)) {
          expect(warnings).toEqual([]);
        }
        const bytes = Buffer.from(written.text, 'utf8');
        same(fromText, await outcomeAsync(() => readRecordStream(streamOf(chunked(bytes, cuts)), options)));
      }),
      { seed: FUZZ_SEED, numRuns: runs(200) },
    );
    report('loader well-formed (text + stream)', { cases, failures: 0 });
  });
});

describe('loader on damaged files', () => {
  it('reads them or refuses them in one line naming the file and a real line; text and stream agree', async () => {
    let cases = 0;
    let refused = 0;
    await fc.assert(
      fc.asyncProperty(mutatedRecord, fc.array(fc.nat(), { maxLength: 6 }), async (damaged, cuts) => {
        cases++;
        const options = { ...damaged.options, source: SOURCE };
        const fromText = outcome(() => readRecordText(damaged.text, options));
        if ('error' in fromText) {
          refused++;
          checkFailure(fromText, damaged.lineCount);
        } else {
          checkRecord(fromText.record);
        }
        const bytes = Buffer.from(damaged.text, 'utf8');
        same(fromText, await outcomeAsync(() => readRecordStream(streamOf(chunked(bytes, cuts)), options)));
      }),
      { seed: FUZZ_SEED + 1, numRuns: runs(300) },
    );
    report('loader damaged (text + stream)', { cases, refused, failures: 0 });
  });

  it('treats raw bytes that are not UTF-8 as binary, in one line', async () => {
    let cases = 0;
    await fc.assert(
      fc.asyncProperty(fc.uint8Array({ minLength: 0, maxLength: 400 }), async (bytes) => {
        cases++;
        const options = { units: 'g' as const, dtS: 0.01, source: SOURCE };
        const result = await outcomeAsync(() => readRecordStream(streamOf([bytes]), options));
        if ('error' in result)
          checkFailure(
            result,
            Buffer.from(bytes)
              .toString('utf8')
              .split(/\r\n|\n|\r/).length,
          );
        else checkRecord(result.record);
      }),
      { seed: FUZZ_SEED + 2, numRuns: runs(100) },
    );
    report('loader raw bytes (stream)', { cases, failures: 0 });
  });
});

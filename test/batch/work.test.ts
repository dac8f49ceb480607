import { existsSync, mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { claimRecords, processRecord, type RecordOutcome, type SuiteSettings } from '../../src/batch/work.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

// The work of one record of a suite: read, process, sweep, write spectra.json. Records: two
// invented synthetic ground motions, written one value a line in m/s² with every digit
// (String(x) reads back as x, ECMAScript's round trip), so that the file holds the record exactly.

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-work-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

const settings: SuiteSettings = {
  read: { units: 'm/s2', dtS: 0.01, layout: 'single' },
  plan: {},
  periodsS: [0, 0.1, 0.5, 2],
  dampings: [0.02, 0.05],
  method: 'newmark-average',
};
const records = [1, 2].map((seed) => synthesizeRecord({ seed, dtS: 0.01, durationS: 8, pgaG: 0.1 * seed }));
const files = records.map((record, k) => {
  const file = join(folder, `invented-${k + 1}.txt`);
  writeFileSync(file, `${Array.from(record.accelMS2, String).join('\n')}\n`);
  return file;
});
const task = (k: number) => ({ file: files[k], name: `r${k + 1}`, outDir: join(folder, 'out'), settings });

describe('processRecord', () => {
  it('gives each record the spectrum of the single-record API, in g, and the text of its spectra.json', () => {
    for (const k of [0, 1]) {
      const outcome = processRecord(task(k));
      if (!outcome.ok) throw new Error(outcome.error);
      const expected = responseSpectrum(records[k], settings).curves.map((curve) =>
        Array.from(curve.psaMS2, (psa) => psa / STANDARD_GRAVITY_MS2),
      );
      expect(outcome.psaG).toEqual(expected);
      expect(outcome.warnings).toEqual([]); // PGAs of 0.1 g and 0.2 g: inside 0.0001–5 g
      // PSA at T = 0 is the PGA (a rigid oscillator moves with the ground; common practice).
      for (const curve of outcome.psaG) expect(curve[0]).toBeCloseTo(0.1 * (k + 1), 12);
      expect(outcome.pgaG).toBeCloseTo(0.1 * (k + 1), 12); // PSA(0) = PGA, and the records' PGA by construction
      const written = JSON.parse(outcome.spectra);
      expect(written.spectra.map((curve: { psa_g: number[] }) => curve.psa_g)).toEqual(outcome.psaG);
    }
  });

  it('comes back with the error, in one line naming the file, instead of throwing', () => {
    const missing = processRecord({ ...task(0), file: join(folder, 'none.txt'), name: 'none' });
    expect(missing).toEqual({
      ok: false,
      file: join(folder, 'none.txt'),
      name: 'none',
      error: `${join(folder, 'none.txt')}: no such file`,
    });
    const bad = join(folder, 'bad.txt');
    writeFileSync(bad, '0.1\n0.2\nwind\n');
    const outcome = processRecord({ ...task(0), file: bad, name: 'bad' });
    expect(outcome).toMatchObject({ ok: false, error: `${bad}:3: 'wind' is not a number` });
    expect(existsSync(join(folder, 'out', 'bad'))).toBe(false);
  });
});

describe('claimRecords', () => {
  it('runs every task once, in the order of the counter, and reports each by its index', async () => {
    const tasks = [task(1), task(0), task(1)];
    const counter = new Int32Array(new SharedArrayBuffer(4));
    const reported: [number, RecordOutcome][] = [];
    await claimRecords(tasks, counter, (index, outcome) => reported.push([index, outcome]));
    expect(reported.map(([index]) => index)).toEqual([0, 1, 2]);
    expect(reported.map(([, outcome]) => outcome.name)).toEqual(['r2', 'r1', 'r2']);
    expect(reported[2][1]).toEqual(reported[0][1]);
    expect(counter[0]).toBeGreaterThanOrEqual(tasks.length); // nothing left to claim
  });

  it('leaves the tasks another thread has claimed', async () => {
    const counter = new Int32Array(new SharedArrayBuffer(4));
    counter[0] = 2; // two claimed elsewhere
    const seen: string[] = [];
    await claimRecords(
      [task(0), task(1), task(0)],
      counter,
      (_, outcome) => seen.push(outcome.name),
      (t) => ({
        ok: false,
        file: t.file,
        name: t.name,
        error: 'not run',
      }),
    );
    expect(seen).toEqual(['r1']);
  });
});

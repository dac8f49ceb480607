import { readFileSync } from 'node:fs';
import { isQuakesweepError } from '../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../base/units.js';
import { formatJson, spectrumToJson, toG } from '../formats/spectrum-json.js';
import { periodWarnings } from '../oscillator/grid.js';
import type { Method } from '../oscillator/recurrence.js';
import { applyProcessingPlan, type ProcessingPlan } from '../record/process.js';
import { type ReadOptions, readRecordText, unitWarnings } from '../record/read.js';
import { responseSpectrum } from '../spectrum/spectrum.js';

/** What every record of a suite shares: how to read it, process it and sweep it (plain data, for workers). */
export interface SuiteSettings {
  read: Omit<ReadOptions, 'source' | 'name'>;
  plan: ProcessingPlan;
  periodsS: number[];
  dampings: number[];
  method: Method;
}

export interface RecordTask {
  file: string;
  /** Folder name under the output folder (already sanitised and unique). */
  name: string;
  outDir: string;
  settings: SuiteSettings;
}

export type RecordOutcome =
  | {
      ok: true;
      file: string;
      name: string;
      psaG: number[][];
      pgaG: number;
      warnings: string[];
      /** The text of <name>/spectra.json, written by the command with the rest of the suite, in one transaction. */
      spectra: string;
    }
  | { ok: false; file: string; name: string; error: string };

/** One line for a person from whatever a record's reading or sweeping threw. */
function describeError(error: unknown, file: string): string {
  if (isQuakesweepError(error))
    return error.file === undefined ? `${file}: ${error.message}` : error.describe();
  const errno = error as NodeJS.ErrnoException;
  if (errno?.code === 'ENOENT') return `${file}: no such file`;
  if (errno?.code === 'EISDIR') return `${file}: is a folder`;
  if (errno?.code === 'EACCES') return `${file}: permission denied`;
  const message = error instanceof Error ? error.message : String(error);
  return `${file}: ${message.split('\n')[0]}`;
}

/** Read, process and sweep a record into the text of its spectra.json; a failure comes back as its outcome. */
export function processRecord(task: RecordTask): RecordOutcome {
  const { file, name, settings } = task;
  try {
    const text = readFileSync(file, 'utf8');
    const record = applyProcessingPlan(
      readRecordText(text, { ...settings.read, source: file }),
      settings.plan,
    );
    const spectrum = responseSpectrum(record, settings);
    const spectra = formatJson(spectrumToJson(spectrum));
    const psaG = spectrum.curves.map((curve) => toG(curve.psaMS2, spectrum.periodsS));
    const pgaG = spectrum.record.pgaMS2 / STANDARD_GRAVITY_MS2;
    const durationS = (record.accelMS2.length - 1) * record.dtS;
    const warnings = [...unitWarnings(record), ...periodWarnings(settings.periodsS, durationS)];
    return { ok: true, file, name, psaG, pgaG, warnings, spectra };
  } catch (error) {
    return { ok: false, file, name, error: describeError(error, file) };
  }
}

/**
 * Claim records from `counter` and run each on this thread, giving its outcome to `report`, until
 * none is left; yield between records so that other threads' outcomes come in and progress shows.
 */
export async function claimRecords(
  tasks: readonly RecordTask[],
  counter: Int32Array,
  report: (index: number, outcome: RecordOutcome) => void,
  here: (task: RecordTask) => RecordOutcome = processRecord,
): Promise<void> {
  for (;;) {
    const index = Atomics.add(counter, 0, 1);
    if (index >= tasks.length) return;
    report(index, here(tasks[index]));
    await new Promise((resolve) => setImmediate(resolve));
  }
}

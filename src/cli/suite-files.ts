import { join } from 'node:path';
import { formatNumber } from '../base/numbers.js';
import type { SuiteAnalysis } from '../batch/suite.js';
import type { SuiteSettings } from '../batch/work.js';
import { formatJson } from '../formats/spectrum-json.js';
import { type SuiteFailure, type SuiteRecord, suiteJson } from '../formats/suite.js';
import { suiteToCsv } from '../formats/suite-csv.js';
import { METHOD_DESCRIPTIONS } from '../oscillator/recurrence.js';
import type { OutputSet } from '../output/output-set.js';

/**
 * Add the suite files of a whole run (batch, or merge of shards) to `outputs`: suite.csv, and with
 * records suite.svg and suite.html, then suite.json, which names the others, last. The suite
 * check's warnings go to standard error. Returns the files and the check's result for the summary.
 */
export async function addSuiteFiles(
  outputs: OutputSet,
  out: string,
  input: {
    analysis: SuiteAnalysis;
    records: readonly SuiteRecord[];
    failed: readonly SuiteFailure[];
    settings: SuiteSettings;
    commandLine: readonly string[];
  },
): Promise<{ written: string[]; result: string }> {
  const { analysis, records, failed, settings } = input;
  for (const warning of analysis.check?.warnings ?? [])
    process.stderr.write(`quakesweep: warning: suite check: ${warning}\n`);
  const written = [join(out, 'suite.json'), join(out, 'suite.csv')];
  outputs.file(join(out, 'suite.csv'), suiteToCsv(analysis, settings.periodsS));
  if (records.length > 0) {
    // The figure and report modules (and jsdom) load only here.
    const { suiteFigures } = await import('../report/suite-outputs.js');
    const figures = await suiteFigures({
      analysis,
      settings,
      failed,
      methodDescription: METHOD_DESCRIPTIONS[settings.method],
      commandLine: input.commandLine,
      written: ['suite.json', 'suite.csv', 'suite.svg'],
    });
    for (const [file, text] of figures) {
      outputs.file(join(out, file), text);
      written.push(join(out, file));
    }
  }
  outputs.file(join(out, 'suite.json'), formatJson(suiteJson(records, failed, settings, analysis)));
  const check = analysis.check;
  const result =
    check === undefined
      ? ''
      : `; suite check ${check.pass ? 'PASS' : 'FAIL'} (least mean/target ${formatNumber(check.worstRatio, 3)} at ${formatNumber(check.worstPeriodS, 3)} s, needs ${check.fraction}; preliminary)`;
  return { written, result };
}

import { join } from 'node:path';
import type { Command } from 'commander';
import { OutputSet } from '../../output/output-set.js';
import { assembleReport } from '../../report/assemble.js';
import { announceSuccess, count } from '../announce.js';
import { addAxisOption } from '../options/axis.js';
import { addGridOptions } from '../options/grid.js';
import { addProcessingOptions } from '../options/processing.js';
import { addRecordOptions } from '../options/record.js';
import { type ReportCliOptions, reportRequest } from '../options/report.js';
import { addTargetOptions } from '../options/target.js';

const collect = (value: string, previous: string[]) => [...previous, value];

export function registerReport(program: Command): void {
  const command = program
    .command('report')
    .description('a self-contained HTML calculation report (with spectra.json, spectra.csv and SVG figures)')
    .argument('<record>', 'record file');
  addRecordOptions(command);
  addProcessingOptions(command);
  addGridOptions(command);
  addTargetOptions(command);
  command
    .requiredOption(
      '--out <dir>',
      'folder for report.html and the files beside it (created if its parent exists)',
    )
    .option(
      '--note <text>',
      'a paragraph under the title, e.g. where the inputs come from (repeatable)',
      collect,
      [],
    )
    .option('--title <text>', 'title of the report (default: "Response spectra of <record name>")')
    .option('--project <text>', 'project named in the title block (default: a blank line to fill in)')
    .option('--prepared-by <name>', 'who prepared the report, in the title block (default: a blank line)')
    .option('--checked-by <name>', 'who checked the report, in the title block (default: a blank line)')
    .option('--length-unit <unit>', 'length unit of SD and PSV in tables and figures: m, cm, mm, in, ft', 'm')
    .option('--axes <axes>', 'axes of the PSA, SD and PSV figures: log or linear', 'log');
  addAxisOption(
    command,
    'x axis of every spectrum figure: period or frequency (default: frequency for the floor spectra of equipment, period for the others)',
  )
    .option('--pair <record>', 'second horizontal component, at right angles: adds RotD50 and RotD100')
    .option('--angle-step <degrees>', 'with --pair: rotation step, at most 1° and a divisor of 180', '1')
    .option(
      '--equipment <file>',
      'equipment description (JSON) for anchorage demands (repeatable)',
      collect,
      [],
    )
    .option('--building-period <seconds>', 'for equipment above the base: the building period T_b, s')
    .option('--building-damping <ratio>', "for equipment above the base: the building's modal damping", '5%')
    .option('--modal-factor <value>', 'for equipment above the base: Γφ at its floor')
    .option('--broaden [fraction]', 'broaden the floor spectrum peaks, b = 0.15 unless given')
    .option(
      '--ductility <list>',
      'adds constant-ductility spectra at these target ductilities μ ≥ 1 (e.g. 1,2,4,8), at 5% damping where the grid has it',
    )
    .option('--model <model>', 'with --ductility: elastoplastic (default) or bilinear:α (0 ≤ α < 1)')
    .option(
      '--ductility-periods <grid>',
      "with --ductility: its periods, as --periods takes them (default: the report's periods; the search is slow)",
    )
    .option(
      '--floor-envelope',
      'with --pair: equipment above the base takes the envelope of both components’ floor spectra',
    )
    .action(async (source: string, options: ReportCliOptions, cmd: Command) => {
      const words =
        (cmd.parent as unknown as { rawArgs?: string[] } | null)?.rawArgs ?? process.argv.slice(2);
      await runReport(source, options, words);
    });
}

export async function runReport(
  source: string,
  options: ReportCliOptions,
  commandLine: string[],
): Promise<void> {
  const { request, inputs, out } = await reportRequest(source, options, commandLine);
  const files = Array.from(await assembleReport(request));
  new OutputSet(inputs).folder(out, files).write();
  announceSuccess(`calculation report of ${request.read.name}`, [
    `${count(files.length, 'file')} in ${out} (open ${join(out, 'report.html')})`,
  ]);
}

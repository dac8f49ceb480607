import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { cautionLines } from '../../base/caution.js';
import { formatNumber, formatSignificant } from '../../base/numbers.js';
import { OutputSet } from '../../output/output-set.js';
import { assembleReport } from '../../report/assemble.js';
import { announceSuccess, count } from '../announce.js';
import { demoReport, recordsFolder, shown } from '../options/demo-scenario.js';
import { optionWords, reportRequest } from '../options/report.js';

export function registerDemo(program: Command): void {
  program
    .command('demo')
    .description('write the full report of the invented Marrowby Flats scenario (records/README.md)')
    .option('--out <dir>', 'folder for the report (created if its parent exists)', 'demo-output')
    .action(runDemo);
}

export async function runDemo({ out }: { out: string }): Promise<void> {
  const { source, options } = demoReport(recordsFolder(), out);
  const started = Date.now();
  // The report states the report command that makes the same report.
  const words = ['report', source, ...optionWords(options)];
  const { request, inputs } = await reportRequest(source, options, words);
  const files = Array.from(await assembleReport(request));
  new OutputSet(inputs).folder(out, files).write();
  const seconds = ((Date.now() - started) / 1000).toFixed(1);
  const spectra = JSON.parse(readFileSync(join(out, 'spectra.json'), 'utf8'));
  const lines = cautionLines(92).map((line) => `! ${line}`);
  lines.push(
    '',
    'Invented scenario: Marrowby Flats pumping station, H1 (all data invented; see records/README.md).',
  );
  lines.push('ASCE 7-16 target with invented site values S_DS 1.0 g, S_D1 0.6 g, T_L 8 s.', '');
  lines.push(`${'damping'.padEnd(9)} ${'peak PSA g'.padStart(11)} ${'at T s'.padStart(8)}`);
  for (const curve of spectra.spectra as { damping: number; psa_g: number[] }[]) {
    let best = 0;
    curve.psa_g.forEach((v, i) => {
      if (spectra.periods_s[i] > 0 && v > curve.psa_g[best]) best = i;
    });
    lines.push(
      `${`${curve.damping * 100}%`.padEnd(9)} ${formatSignificant(curve.psa_g[best]).padStart(11)} ${formatNumber(spectra.periods_s[best]).padStart(8)}`,
    );
  }
  const scaling = spectra.scaling as { factor: number } | undefined;
  if (scaling)
    lines.push('', `scale factor to the target at 5%: ${formatSignificant(scaling.factor)} (not applied)`);
  lines.push(
    '',
    `${'equipment'.padEnd(52)} ${'code'.padEnd(8)} ${'horizontal'.padStart(12)} ${'max tension'.padStart(12)}`,
  );
  for (const n of [1, 2, 3]) {
    const a = JSON.parse(readFileSync(join(out, `anchorage-${n}.json`), 'utf8'));
    const unit = a.force_unit as string;
    const code = String(a.horizontal.code ?? 'asce7-16');
    lines.push(
      `${String(a.equipment.name).padEnd(52)} ${code.padEnd(8)} ${`${formatSignificant(a.horizontal.force_for_anchors)} ${unit}`.padStart(12)} ${`${formatSignificant(a.anchors.max_tension)} ${unit}`.padStart(12)}`,
    );
  }
  lines.push('(anchor demands only: capacities are not checked)');
  lines.push('', `report written in ${seconds} s: ${shown(resolve(out, 'report.html'))}`);
  lines.push('open it in a browser; it needs no network and prints on A4 or letter.');
  process.stdout.write(`${lines.join('\n')}\n`);
  announceSuccess('report of the invented demo scenario', [`${count(files.length, 'file')} in ${out}`]);
}

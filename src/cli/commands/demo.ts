import { readFileSync } from 'node:fs';
import { join, resolve } from 'node:path';
import type { Command } from 'commander';
import { parseEquipment } from '../../anchorage/equipment.js';
import { cautionLines } from '../../base/caution.js';
import { checkFolder, OutputSet } from '../../output/output-set.js';
import { assembleReport } from '../../report/assemble.js';
import type { DesignSpectrum } from '../../spectrum/design.js';
import { broadeningFromOptions, buildingFromOptions } from '../options/building.js';
import { demoReportArguments, recordsFolder, shown } from '../options/demo-scenario.js';
import { generationTime } from '../options/generation-time.js';
import { gridFromOptions } from '../options/grid.js';
import { applyProcessing } from '../options/processing.js';
import { loadRecord } from '../options/record.js';
import { loadTarget } from '../options/target.js';

export function registerDemo(program: Command): void {
  program
    .command('demo')
    .description('write the full report of the invented Marrowby Flats scenario (records/README.md)')
    .option('--out <dir>', 'folder for the report (created if its parent exists)', 'demo-output')
    .action(async (options: { out: string }) => {
      await runDemo(options.out);
    });
}

export async function runDemo(out: string): Promise<void> {
  const records = recordsFolder();
  const args = demoReportArguments(records, out);
  const started = Date.now();
  checkFolder({ path: out, option: '--out' });
  const file = (name: string) => shown(join(records, name));
  const processing = { baseline: 'linear', taper: '5%', filter: 'bandpass:0.1-25' };
  const read = await loadRecord(file('marrowby-h1.csv'), {
    units: 'g',
    name: 'Marrowby Flats H1 (invented)',
  });
  const second = await loadRecord(file('marrowby-h2.csv'), { units: 'g' });
  const equipment = ['equipment-generator.json', 'equipment-cabinet-floor4.json'].map((name) => ({
    file: file(name),
    value: parseEquipment(readFileSync(file(name), 'utf8'), file(name)),
  }));
  const at = (option: string) => args[args.indexOf(option) + 1];
  const files = await assembleReport({
    read,
    processed: applyProcessing(read, processing),
    grid: gridFromOptions({ damping: at('--damping') }),
    target: { spectrum: loadTarget({ target: at('--target') }) as DesignSpectrum },
    pair: { record: applyProcessing(second, processing), angleStepDeg: 1 },
    equipment,
    building: buildingFromOptions({
      buildingPeriod: at('--building-period'),
      modalFactor: at('--modal-factor'),
    }),
    broadening: broadeningFromOptions(true),
    title: at('--title'),
    notes: args.filter((_, i) => args[i - 1] === '--note'),
    // The report states the report command that makes the same report.
    commandLine: args,
    workingDirectory: process.cwd(),
    generatedAt: generationTime(),
  });
  new OutputSet([read.source, second.source, ...equipment.map((e) => e.file)]).folder(out, files).write();
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
      `${`${curve.damping * 100}%`.padEnd(9)} ${curve.psa_g[best].toPrecision(4).padStart(11)} ${Number(spectra.periods_s[best].toPrecision(3)).toString().padStart(8)}`,
    );
  }
  const scaling = spectra.scaling as { factor: number } | undefined;
  if (scaling)
    lines.push('', `scale factor to the target at 5%: ${scaling.factor.toPrecision(4)} (not applied)`);
  lines.push('', `${'equipment'.padEnd(52)} ${'horizontal'.padStart(12)} ${'max tension'.padStart(12)}`);
  for (const n of [1, 2]) {
    const a = JSON.parse(readFileSync(join(out, `anchorage-${n}.json`), 'utf8'));
    const unit = a.force_unit as string;
    lines.push(
      `${String(a.equipment.name).padEnd(52)} ${`${a.horizontal.force_for_anchors.toPrecision(4)} ${unit}`.padStart(12)} ${`${a.anchors.max_tension.toPrecision(4)} ${unit}`.padStart(12)}`,
    );
  }
  lines.push('(anchor demands only: capacities are not checked)');
  lines.push('', `report written in ${seconds} s: ${shown(resolve(out, 'report.html'))}`);
  lines.push('open it in a browser; it needs no network and prints on A4 or letter.');
  process.stdout.write(`${lines.join('\n')}\n`);
}

import type { Command } from 'commander';
import { CAUTION } from '../../base/caution.js';
import { usageError } from '../../base/errors.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { OutputSet } from '../../output/output-set.js';
import { type SynthOptions, synthesizeRecord } from '../../record/synth.js';
import { positiveNumber } from '../options/record.js';

interface SynthCliOptions {
  seed?: string;
  dt?: string;
  duration?: string;
  pga?: string;
  siteFrequency?: string;
  siteDamping?: string;
  highPass?: string;
  name?: string;
  out?: string;
}

export function registerSynth(program: Command): void {
  program
    .command('synth')
    .description('write a seeded stochastic ground-acceleration record (for demos and tests, not for design)')
    .option('--seed <n>', 'seed of the random generator (same seed, same record)', '1')
    .option('--dt <seconds>', 'time step, s', '0.01')
    .option('--duration <seconds>', 'duration, s', '30')
    .option('--pga <g>', 'peak ground acceleration the record is scaled to, g', '0.3')
    .option('--site-frequency <hz>', 'Kanai–Tajimi ground frequency, Hz', '2.5')
    .option('--site-damping <ratio>', 'Kanai–Tajimi ground damping ratio', '0.6')
    .option('--high-pass <hz>', 'Clough–Penzien high-pass frequency, Hz', '0.25')
    .option('--name <name>', 'name written in the header')
    .option('--out <path>', 'write to this file instead of standard output')
    .action((options: SynthCliOptions) => {
      const synth: SynthOptions = {
        seed: integer('--seed', options.seed ?? '1'),
        dtS: positiveNumber('--dt', options.dt ?? '0.01'),
        durationS: positiveNumber('--duration', options.duration ?? '30'),
        pgaG: positiveNumber('--pga', options.pga ?? '0.3'),
        groundFrequencyHz: positiveNumber('--site-frequency', options.siteFrequency ?? '2.5'),
        groundDamping: positiveNumber('--site-damping', options.siteDamping ?? '0.6'),
        highPassFrequencyHz: positiveNumber('--high-pass', options.highPass ?? '0.25'),
        name: options.name,
      };
      const text = synthText(synth);
      new OutputSet().text(options.out, text).write();
    });
}

/** The record as a two-column CSV in g with `#` header lines that say how it was made. */
export function synthText(options: SynthOptions): string {
  const record = synthesizeRecord(options);
  const lines = [
    `# ${record.name}: synthetic ground acceleration written by quakesweep synth (invented data).`,
    `# Kanai-Tajimi filtered white noise with a Clough-Penzien high-pass and a Jennings-Housner-Tsai envelope;`,
    `# seed ${options.seed}, dt ${record.dtS} s, PGA ${options.pgaG ?? 0.3} g. For demonstration and testing only.`,
    `# ${CAUTION}`,
    'time_s,accel_g',
  ];
  const a = record.accelMS2;
  for (let i = 0; i < a.length; i++) {
    lines.push(`${(i * record.dtS).toFixed(6)},${(a[i] / STANDARD_GRAVITY_MS2).toExponential(8)}`);
  }
  return `${lines.join('\n')}\n`;
}

function integer(option: string, text: string): number {
  const value = Number(text);
  if (!Number.isInteger(value) || value < 0 || value > 4294967295) {
    throw usageError(`${option} must be a whole number from 0 to 4294967295, got '${text}'`);
  }
  return value;
}

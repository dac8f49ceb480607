import { type Command, Option } from 'commander';
import { CAUTION } from '../../base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../base/units.js';
import { OutputSet } from '../../output/output-set.js';
import { type SynthOptions, synthesizeRecord } from '../../record/synth.js';
import { announceSuccess } from '../announce.js';
import { positiveNumber, wholeNumber } from '../options/record.js';

type SynthNumber =
  | 'dtS'
  | 'durationS'
  | 'pgaG'
  | 'groundFrequencyHz'
  | 'groundDamping'
  | 'highPassFrequencyHz';

/** The generator's positive numbers: option, help, default and the field of SynthOptions it sets. */
const NUMBERS: [string, string, string, SynthNumber][] = [
  ['--dt <seconds>', 'time step, s', '0.01', 'dtS'],
  ['--duration <seconds>', 'duration, s', '30', 'durationS'],
  ['--pga <g>', 'peak ground acceleration the record is scaled to, g', '0.3', 'pgaG'],
  ['--site-frequency <hz>', 'Kanai–Tajimi ground frequency, Hz', '2.5', 'groundFrequencyHz'],
  ['--site-damping <ratio>', 'Kanai–Tajimi ground damping ratio', '0.6', 'groundDamping'],
  ['--high-pass <hz>', 'Clough–Penzien high-pass frequency, Hz', '0.25', 'highPassFrequencyHz'],
];

export function registerSynth(program: Command): void {
  const command = program
    .command('synth')
    .description('write a seeded stochastic ground-acceleration record (for demos and tests, not for design)')
    .option('--seed <n>', 'seed of the random generator (same seed, same record)', '1');
  const numbers = NUMBERS.map(([flags, help, value, field]) => {
    const option = new Option(flags, help).default(value);
    command.addOption(option);
    return { option, field };
  });
  command
    .option('--name <name>', 'name written in the header')
    .option('--out <path>', 'write to this file instead of standard output')
    .action((options: { [name: string]: string }) => {
      const synth: SynthOptions = {
        seed: wholeNumber('--seed', options.seed, 0, 4294967295),
        name: options.name,
      };
      for (const { option, field } of numbers) {
        synth[field] = positiveNumber(option.long as string, options[option.attributeName()]);
      }
      new OutputSet().text(options.out, synthText(synth)).write();
      announceSuccess(`seeded stochastic record (seed ${synth.seed}), not for design`, [
        options.out ?? 'csv on standard output',
      ]);
    });
}

/** The record as a two-column CSV in g with `#` header lines that say how it was made. */
function synthText(options: SynthOptions): string {
  const record = synthesizeRecord(options);
  const lines = [
    `# ${record.name}: synthetic ground acceleration written by quakesweep synth (invented data).`,
    `# Kanai-Tajimi filtered white noise with a Clough-Penzien high-pass and a Jennings-Housner-Tsai envelope;`,
    `# seed ${options.seed}, dt ${record.dtS} s, PGA ${options.pgaG} g. For demonstration and testing only.`,
    `# ${CAUTION}`,
    'time_s,accel_g',
  ];
  const a = record.accelMS2;
  for (let i = 0; i < a.length; i++) {
    lines.push(`${(i * record.dtS).toFixed(6)},${(a[i] / STANDARD_GRAVITY_MS2).toExponential(8)}`);
  }
  return `${lines.join('\n')}\n`;
}

import { existsSync } from 'node:fs';
import { dirname, join, relative, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import { usageError } from '../../base/errors.js';
import type { ReportCliOptions } from './report.js';

/**
 * The package's records/ folder whatever the cwd: the first records/ holding the demo records
 * above this file (dist/cli/options/demo-scenario.js, or the CLI bundle dist/cli/quakesweep.cjs).
 */
export function recordsFolder(): string {
  const here = dirname(fileURLToPath(import.meta.url));
  for (const up of [2, 3]) {
    const folder = resolve(here, ...Array(up).fill('..'), 'records');
    if (existsSync(join(folder, 'marrowby-h1.csv'))) return folder;
  }
  throw usageError(`the demo records are missing from ${resolve(here, '..', '..', '..', 'records')}`);
}

/** A path as short as it can be said from the cwd (relative when it lies below it). */
export function shown(path: string): string {
  const r = relative(process.cwd(), path);
  return r !== '' && !r.startsWith('..') ? r : path;
}

/**
 * The record and options of `quakesweep report` for the invented Marrowby Flats scenario
 * (records/README.md): H1 processed, four dampings, an invented ASCE 7-16 site, RotD of H1 and H2,
 * the invented generator on grade, the invented cabinet on level 4 (both ASCE 7-16) and the invented
 * pump on the roof (ASCE 7-22) of an invented one-mode building (the envelope of the floor spectra
 * of H1 and H2), and constant-ductility spectra of H1 (μ = 1, 2, 4, 8; elastoplastic; 36 periods).
 */
export function demoReport(records: string, out: string): { source: string; options: ReportCliOptions } {
  const file = (name: string) => shown(join(records, name));
  const options: ReportCliOptions = {
    units: 'g',
    name: 'Marrowby Flats H1 (invented)',
    baseline: 'linear',
    taper: '5%',
    filter: 'bandpass:0.1-25',
    damping: '2%,5%,10%,20%',
    target: 'asce7-16:sds=1.0,sd1=0.6,tl=8',
    pair: file('marrowby-h2.csv'),
    equipment: [
      file('equipment-generator.json'),
      file('equipment-cabinet-floor4.json'),
      file('equipment-pump-roof-7-22.json'),
    ],
    buildingPeriod: '0.8',
    modalFactor: '1.3',
    broaden: true,
    floorEnvelope: true,
    // A modest grid: the strength search runs each oscillator tens of times.
    ductility: '1,2,4,8',
    ductilityPeriods: '0.03:5:36',
    note: [
      'Everything in this report is invented for demonstration: the Marrowby Flats site, the Corrin Ridge scenario event, the records (written by quakesweep synth), the building and the equipment. The ASCE 7-16 site values S_DS = 1.0 g, S_D1 = 0.6 g, T_L = 8 s are invented too. Nothing here may be used for design.',
      'Equipment: the invented standby generator G-1 on grade and the invented cabinet EC-4 on level 4 (both ASCE 7-16), and the invented booster pump BP-2 on the roof (ASCE 7-22 §13.3.1, with the invented building’s R, Ω₀, I_e and T_a), in an invented building idealised by one mode (T_b = 0.8 s, ζ_b = 5%, Γφ = 1.3, floor spectrum peaks broadened ±15%; the demand above grade is the envelope of the floor spectra of H1 and H2, each broadened first). The one Γφ serves both floors: at the roof a first mode gives a larger Γφ, so the pump’s record demand is understated; the example shows the mechanics, not a design.',
    ],
    title: 'Marrowby Flats pumping station (invented scenario): record H1',
    out,
  };
  return { source: file('marrowby-h1.csv'), options };
}

import { mkdtempSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import type { Equipment } from '../../../src/anchorage/equipment.js';
import { readSpectrumFile } from '../../../src/cli/options/spectrum-file.js';

const folder = mkdtempSync(join(tmpdir(), 'quakesweep-spectrum-file-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

function file(name: string, content: unknown): string {
  const path = join(folder, name);
  writeFileSync(path, typeof content === 'string' ? content : JSON.stringify(content));
  return path;
}

const spectrum = {
  record: { pga_g: 0.3 },
  periods_s: [0, 0.1, 1],
  spectra: [
    { damping: 0.02, psa_g: [0.3, 0.9, 0.4] },
    { damping: 0.05, psa_g: [0.3, 0.7, 0.3] },
  ],
};
const at = (periodS: number | 'rigid') => ({ damping: 0.05, periodS }) as Equipment;

describe('readSpectrumFile', () => {
  it("takes the PSA of the curve at the component's damping, at its period", () => {
    const read = readSpectrumFile(file('ground.json', spectrum), at(0.1));
    expect(read.value.psaG).toBe(0.7);
    expect(read.value.how).toBe('PSA at T = 0.1 s, a point of the grid');
    expect(read.isFloor).toBe(false);
    expect(read.floorNote).toBe('');
  });

  it('reads files with frequencies_hz beside periods_s (null at T = 0) as those without', () => {
    const withFrequencies = { ...spectrum, frequencies_hz: [null, 10, 1] };
    const read = readSpectrumFile(file('new.json', withFrequencies), at(0.1));
    expect(read.value.psaG).toBe(0.7);
    expect(read.value.how).toBe('PSA at T = 0.1 s, a point of the grid');
    expect(readSpectrumFile(file('new-rigid.json', withFrequencies), at('rigid')).value.psaG).toBe(0.3);
  });

  it('a rigid component takes T = 0, or record.pga_g when the grid has no T = 0', () => {
    expect(readSpectrumFile(file('rigid.json', spectrum), at('rigid')).value.psaG).toBe(0.3);
    const noZero = { ...spectrum, periods_s: [0.05, 0.1, 1], record: { pga_g: 0.25 } };
    const read = readSpectrumFile(file('no-zero.json', noZero), at('rigid'));
    expect(read.value.psaG).toBe(0.25);
    expect(read.value.how).toMatch(/"record.pga_g"/);
  });

  it('recognises a floor spectrum by its building and says what it assumed', () => {
    const floor = {
      ...spectrum,
      building: { period_s: 0.5, damping: 0.05, modal_factor: 1.3 },
      broadening: null,
    };
    const read = readSpectrumFile(file('floor.json', floor), at(0.1));
    expect(read.isFloor).toBe(true);
    expect(read.floorNote).toMatch(
      /^Floor spectrum: building T_b = 0\.5 s, ζ_b = 0\.05, Γφ = 1\.3, not broadened;/,
    );
  });

  it('a floor JSON of several records gives its envelope, and the note says so; a rigid component takes its T = 0 or envelope.pga_g', () => {
    const floorSet = {
      periods_s: [0.05, 0.1, 1],
      building: { period_s: 0.5, damping: 0.05, modal_factor: 1.3 },
      broadening: { fraction: 0.15 },
      records: [{ label: 'h1', spectra: [{ damping: 0.05, psa_g: [9, 9, 9] }] }, { label: 'h2' }],
      mean: { pga_g: 0.3, spectra: [{ damping: 0.05, psa_g: [0.4, 0.5, 0.2] }] },
      envelope: { pga_g: 0.35, spectra: [{ damping: 0.05, psa_g: [0.5, 0.8, 0.3] }] },
    };
    const read = readSpectrumFile(file('floor-set.json', floorSet), at(0.1));
    expect(read.value.psaG).toBe(0.8);
    expect(read.isFloor).toBe(true);
    expect(read.floorNote).toMatch(
      /^Floor envelope of 2 records \(h1, h2\); the envelope is used, not the mean nor one record: building T_b = 0\.5 s, .*peaks broadened ±0\.15 \(each record before the envelope\)/,
    );
    const rigid = readSpectrumFile(file('floor-set.json', floorSet), at('rigid'));
    expect(rigid.value).toMatchObject({
      psaG: 0.35,
      how: '"envelope.pga_g" of the spectrum file, rigid component',
    });
    expect(() =>
      readSpectrumFile(
        file('bad-set.json', { ...floorSet, envelope: { spectra: [{ damping: 0.05, psa_g: [1] }] } }),
        at(0.1),
      ),
    ).toThrow(/"envelope\.spectra\[0\]\.psa_g" must be a list of 3 numbers/);
    expect(() =>
      readSpectrumFile(file('no-records.json', { ...floorSet, records: undefined }), at(0.1)),
    ).toThrow(/"envelope" must be an object beside "records"/);
  });

  it('refuses files that are not a spectrum, naming the file and the field', () => {
    const refuse = (name: string, content: unknown, message: RegExp) =>
      expect(() => readSpectrumFile(file(name, content), at(0.1))).toThrow(message);
    refuse(
      'text.json',
      'not json',
      /^not valid JSON; expected the output of `quakesweep spectrum --format json`/,
    );
    refuse('periods.json', { spectra: [] }, /"periods_s" must be a list of periods/);
    refuse('spectra.json', { periods_s: [0] }, /"spectra" must be a non-empty list/);
    refuse(
      'damping.json',
      { ...spectrum, spectra: [spectrum.spectra[0]] },
      /has no curve at the component's damping 0\.05 \(it has 0\.02\); compute one with --damping 5%/,
    );
    refuse(
      'short.json',
      { ...spectrum, spectra: [{ damping: 0.05, psa_g: [1] }] },
      /"spectra\[0\]\.psa_g" must be a list of 3 numbers/,
    );
    expect(() => readSpectrumFile(file('far.json', spectrum), at(4))).toThrow(
      /outside .*far\.json's periods/,
    );
    let thrown: unknown;
    try {
      readSpectrumFile(join(folder, 'text.json'), at(0.1));
    } catch (error) {
      thrown = error;
    }
    expect((thrown as { file?: string } | undefined)?.file).toBe(join(folder, 'text.json'));
  });
});

describe('readSpectrumFile refuses spectra that cannot be', () => {
  // Invented edited files: a PSA is ≥ 0 and finite, a period grid ascends from T ≥ 0 (definitions).
  const edited = (name: string, change: Partial<typeof spectrum>) => file(name, { ...spectrum, ...change });
  it('refuses a negative or huge (1e999 reads as Infinity) PSA, naming the curve, index and period', () => {
    const negative = edited('neg.json', {
      spectra: [{ damping: 0.05, psa_g: [0.3, -0.7, 0.3] }] as typeof spectrum.spectra,
    });
    expect(() => readSpectrumFile(negative, at(0.1))).toThrow(
      '"spectra[0].psa_g"[1] = -0.7 at T = 0.1 s: a PSA must be a finite number ≥ 0',
    );
    const huge = file('huge.json', JSON.stringify(spectrum).replace('0.7', '1e999'));
    expect(() => readSpectrumFile(huge, at(1))).toThrow(/= Infinity at T = 0\.1 s/);
  });

  it('refuses unsorted, repeated or negative periods', () => {
    expect(() => readSpectrumFile(edited('unsorted.json', { periods_s: [0, 1, 0.1] }), at(0.5))).toThrow(
      '"periods_s"[2] = 0.1 does not follow 1 upwards',
    );
    expect(() => readSpectrumFile(edited('twice.json', { periods_s: [0, 0.1, 0.1] }), at(0.5))).toThrow(
      /does not follow 0\.1 upwards/,
    );
    expect(() => readSpectrumFile(edited('negative.json', { periods_s: [-1, 0.1, 1] }), at(0.5))).toThrow(
      '"periods_s"[0] = -1 is not a finite period ≥ 0 s',
    );
  });
});

import { readFileSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { describe, expect, it } from 'vitest';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { expectOneLineFailure } from '../../helpers/run-cli.js';

/**
 * An invented ground motion: a 1 Hz sine of 0.2 g, 20 s at 0.005 s, brought in over the first 8 s
 * by a cosine ramp so that the building's start-up transient is negligible.
 */
function writeRampedSine(path: string): void {
  const values = Array.from({ length: 4001 }, (_, i) => {
    const t = i * 0.005;
    const ramp = 0.5 * (1 - Math.cos((Math.PI * Math.min(t, 8)) / 8));
    return (0.2 * ramp * Math.sin(2 * Math.PI * t)).toFixed(8);
  });
  writeFileSync(path, `${values.join('\n')}\n`);
}

const folder = useCliFolder('quakesweep-floor-', (f) => writeRampedSine(join(f.path, 'sine.txt')));
const record = ['sine.txt', '--units', 'g', '--dt', '0.005', '--periods', '0,0.2,0.5,1'];
const building = (modalFactor: string) => [
  '--building-period',
  '0.5',
  '--building-damping',
  '5%',
  '--modal-factor',
  modalFactor,
];

describe('quakesweep floor', () => {
  it('Γφ = 1: the floor moves as the building oscillator, PGA = a_g × transmissibility (hand calculation)', async () => {
    const out = await folder.json('floor', ...record, ...building('1'));
    // With Γφ = 1 the floor's absolute acceleration is the one-mode building's own (Chopra, Dynamics
    // of Structures, §13.1). In steady state under a_g = A sin Ωt it has the amplitude A·TR with
    // TR = √(1 + (2ζr)²) / √((1 − r²)² + (2ζr)²) (Chopra §3.6). Here r = 1 Hz / 2 Hz = 0.5 and
    // ζ = 0.05: TR = √1.0025 / √0.565 = 1.3320, so the floor PGA (PSA at T = 0) is 0.2664 g.
    const r = 0.5;
    const zeta = 0.05;
    const tr = Math.sqrt(1 + (2 * zeta * r) ** 2) / Math.sqrt((1 - r * r) ** 2 + (2 * zeta * r) ** 2);
    expect(tr).toBeCloseTo(1.332, 3);
    expect(out.periods_s[0]).toBe(0);
    expect(out.spectra[0].psa_g[0] / (0.2 * tr)).toBeCloseTo(1, 2);
    expect(out.ground.pga_g).toBeCloseTo(0.2, 6);
    expect(out.building).toEqual({
      period_s: 0.5,
      damping: 0.05,
      modal_factor: 1,
      method: 'piecewise-exact',
    });
    expect(out.broadening).toBeNull();
  });

  it('Γφ = 0: the floor is the ground, so its spectrum is the ground spectrum (a_floor = a_g + 0·q″)', async () => {
    // The floor spectrum is the cascade's, exact at its sub-steps; the ground spectrum beside it is
    // the sweep's: the same numbers to the peak search's rounding with piecewise-exact, and to the
    // accuracy rule (0.5%) with the default method.
    for (const [method, within] of [
      ['piecewise-exact', 1e-4],
      ['newmark-average', 5e-3],
    ] as const) {
      const out = await folder.json('floor', ...record, ...building('0'), '--method', method);
      const floorPsa: number[] = out.spectra[0].psa_g;
      const groundPsa: number[] = out.ground.spectra[0].psa_g;
      for (const [i, value] of floorPsa.entries())
        expect(Math.abs(value / groundPsa[i] - 1)).toBeLessThan(within);
      expect(out.method_description).toMatch(/cascade/);
    }
  });

  it('--broaden: ±15% by default (US NRC Regulatory Guide 1.122, from memory), never below the unbroadened spectrum', async () => {
    const out = await folder.json('floor', ...record, ...building('1.3'), '--broaden');
    expect(out.broadening.fraction).toBe(0.15);
    const broadened: number[] = out.spectra[0].psa_g;
    const plain: number[] = out.unbroadened_psa_g[0].psa_g;
    expect(broadened[2]).toBeGreaterThan(plain[2]); // 0.5 s sits on the resonance's flank
    for (const [i, value] of broadened.entries()) expect(value).toBeGreaterThanOrEqual(plain[i] - 1e-12);
  });

  it.each([
    [[], /--building-period <seconds> is required/],
    [['--building-period', '0.5'], /--modal-factor <Γφ> is required/],
    [[...building('1.3'), '--building-damping', '120%'], /--building-damping/],
    [[...building('x')], /--modal-factor must be a number, got 'x'/],
    [[...building('1.3'), '--broaden', '1.5'], /--broaden must be a fraction/],
    [[...building('1.3'), '--format', 'svg'], /--format 'svg': use table, json or csv/],
  ])('refuses %j with exit 2 and one line naming the option', async (args, message) => {
    expect(expectOneLineFailure(await folder.run('floor', ...record, ...args))).toMatch(message);
  });

  describe('several records', () => {
    const several = ['sine.txt', 'half.txt', '--units', 'g', '--dt', '0.005', '--periods', '0,0.2,0.5,1'];
    const writeHalf = () => {
      // Another invented motion: every other sample of sine.txt, halved.
      const lines = readFileSync(join(folder.path, 'sine.txt'), 'utf8').trim().split('\n');
      const half = lines.filter((_, i) => i % 2 === 0).map((v) => String(Number(v) / 2));
      writeFileSync(join(folder.path, 'half.txt'), `${half.join('\n')}\n`);
    };

    it('JSON: each record labelled, their mean and their envelope (the larger and the average, by definition)', async () => {
      writeHalf();
      const run = await folder.run(
        'floor',
        'sine.txt',
        'half.txt',
        '--units',
        'g',
        '--dt',
        '0.005',
        '--periods',
        '0,0.2,0.5,1',
        ...building('1.3'),
        '--format',
        'json',
      );
      // half.txt is read with the same --dt 0.005 as sine.txt (the same options apply to each),
      // so it is simply a second, different record here.
      expect(run.code).toBe(0);
      const out = JSON.parse(run.stdout);
      expect(out.records.map((r: { label: string }) => r.label)).toEqual(['sine', 'half']);
      const [a, b] = out.records.map((r: { spectra: { psa_g: number[] }[] }) => r.spectra[0].psa_g);
      for (let p = 0; p < 4; p++) {
        expect(out.envelope.spectra[0].psa_g[p]).toBe(Math.max(a[p], b[p]));
        expect(out.mean.spectra[0].psa_g[p]).toBeCloseTo((a[p] + b[p]) / 2, 12);
      }
      expect(out.spectra).toBeUndefined(); // no single-record curves at the top: readers must choose
    });

    it('CSV: a row per period, a PSA column per record, the mean and the envelope; the table and the figure', async () => {
      writeHalf();
      const csv = await folder.run('floor', ...several, ...building('1.3'), '--format', 'csv');
      expect(csv.code).toBe(0);
      expect(csv.stdout.split('\n').find((l) => l.startsWith('period_s'))).toBe(
        'period_s,frequency_hz,psa_g@5%:sine,psa_g@5%:half,psa_g@5%:mean,psa_g@5%:envelope',
      );
      const table = await folder.run('floor', ...several, ...building('1.3'), '--svg', 'figs');
      expect(table.code).toBe(0);
      expect(table.stdout).toMatch(/^envelope +\S+ +\S+ {2}\(from (sine|half)\)$/m);
      const svg = readFileSync(join(folder.path, 'figs', 'floor.svg'), 'utf8');
      expect(svg).toContain('class="envelope"');
      expect(svg).toContain('Preliminary engineering aid only.');
    });

    it.each([
      [['sine.txt', 'sine.txt'], /^quakesweep: sine\.txt: given twice; give each record once/],
      [['sine.txt', './sine.txt'], /^quakesweep: \.\/sine\.txt: given twice \(as sine\.txt\)/],
      [['-', 'sine.txt', '-'], /standard input \(-\) can be given only once/],
      [['sine.txt', 'half.txt', '--name', 'x'], /--name names one record/],
      [['sine.txt', 'absent.txt'], /absent\.txt/],
    ])('refuses %j with exit 2 and one line', async (args, message) => {
      writeHalf();
      const result = await folder.run('floor', ...args, '--units', 'g', '--dt', '0.005', ...building('1.3'));
      expect(expectOneLineFailure(result)).toMatch(message);
    });
  });

  it('takes the processing options on the ground record, stated in the assumptions', async () => {
    const plain = await folder.json('floor', ...record, ...building('1'));
    const filtered = await folder.json('floor', ...record, ...building('1'), '--filter', 'highpass:6');
    expect(filtered.record.processing.map((s: { operation: string }) => s.operation)).toContain('filter');
    expect(filtered.assumptions.join(' ')).toMatch(/Ground record sine processed: high-pass Butterworth/);
    // An order-4 high-pass at 6 Hz keeps (1/6)^4 ≈ 0.08% of the 1 Hz sine in each pass (closed
    // form); the record's abrupt end keeps some higher frequencies, so only well under a tenth is asked.
    expect(filtered.ground.pga_g).toBeLessThan(0.1 * plain.ground.pga_g);
    expect(filtered.spectra[0].psa_g[0]).toBeLessThan(0.1 * plain.spectra[0].psa_g[0]);
  });
});

import { writeFileSync } from 'node:fs';
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
      method: 'newmark-average',
    });
    expect(out.broadening).toBeNull();
  });

  it('Γφ = 0: the floor is the ground, so its spectrum is the ground spectrum (a_floor = a_g + 0·q″)', async () => {
    const out = await folder.json('floor', ...record, ...building('0'));
    const floorPsa: number[] = out.spectra[0].psa_g;
    const groundPsa: number[] = out.ground.spectra[0].psa_g;
    for (const [i, value] of floorPsa.entries()) expect(value).toBeCloseTo(groundPsa[i], 12);
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
    [[...building('1.3'), '--format', 'svg'], /--format 'svg': use json or csv/],
  ])('refuses %j with exit 2 and one line naming the option', async (args, message) => {
    expect(expectOneLineFailure(await folder.run('floor', ...record, ...args))).toMatch(message);
  });
});

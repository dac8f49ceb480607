import { describe, expect, it } from 'vitest';
import { useCliFolder } from '../../helpers/cli-folder.js';
import { runMain } from '../../helpers/run-cli.js';

const folder = useCliFolder('quakesweep-damping-', (f) => f.writeWindowedSine('h1.txt', 1.6));
const { json } = folder;

describe('quakesweep damping', () => {
  it('--help states the damping ratios used when --damping is not given', async () => {
    const help = await runMain(['damping', '--help']);
    expect(help.stdout.replace(/\s+/g, ' ')).toContain('(default: "2%,5%,10%,20%")');
  });

  it('--damping 2%,5%,10%,20%: ratios to 5% and published factors', async () => {
    const out = await json(
      'damping',
      'h1.txt',
      '--units',
      'g',
      '--dt',
      '0.01',
      '--damping',
      '2%,5%,10%,20%',
      '--periods',
      '0,0.3,1',
    );
    expect(out.spectra.map((s: { damping: number }) => s.damping)).toEqual([0.02, 0.05, 0.1, 0.2]);
    expect(out.spectra[1].ratio_to_reference).toEqual([1, 1, 1]);
    expect(out.spectra[3].published.ec8_eta_ratio).toBeCloseTo(Math.sqrt(10 / 25), 12); // EN 1998-1 Eq. 3.6
    const added = await json(
      'damping',
      'h1.txt',
      '--units',
      'g',
      '--dt',
      '0.01',
      '--damping',
      '10%',
      '--periods',
      '0.3',
    );
    expect(added.reference_added).toBe(true);
  });
});

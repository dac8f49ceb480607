import { describe, expect, it } from 'vitest';
import { analyseSuite } from '../../src/batch/suite.js';
import { suiteFigures } from '../../src/report/suite-outputs.js';
import { asce716Spectrum, ec8Spectrum } from '../../src/spectrum/design.js';

// Two invented records with PSA 0.4 g and 0.1 g flat, at three damping ratios.
const periodsS = [0, 0.2, 0.5, 1];
const dampings = [0.02, 0.05, 0.1];
const records = [0.4, 0.1].map((a, i) => ({
  name: `rec${i}`,
  file: `in/rec${i}.csv`,
  psaG: dampings.map(() => periodsS.map(() => a)),
}));
const settings = { periodsS, dampings };
const input = (analysis: ReturnType<typeof analyseSuite>) => ({
  analysis,
  settings,
  failed: [],
  methodDescription: 'test',
  commandLine: ['batch'],
  written: ['suite.json'],
});

describe('suiteFigures', () => {
  it('writes suite.svg and suite.html, the figure inlined in the page', async () => {
    const files = await suiteFigures(input(analyseSuite(records, settings)));
    expect(files.map(([name]) => name)).toEqual(['suite.svg', 'suite.html']);
    expect(files[1][1]).toContain('<svg');
  });

  it("draws the target's damping, else 5%", async () => {
    const damped = (svg: string) => /damping ζ = ([\d.]+%)/.exec(svg)?.[1];
    const [[, plain]] = await suiteFigures(input(analyseSuite(records, settings)));
    expect(damped(plain)).toBe('5%');
    const ec8 = ec8Spectrum({ type: 1, ground: 'B', agG: 0.2, damping: 0.1 });
    const [[, ten]] = await suiteFigures(input(analyseSuite(records, settings, { target: ec8 })));
    expect(damped(ten)).toBe('10%');
    const asce = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
    const [[, five]] = await suiteFigures(input(analyseSuite(records, settings, { target: asce })));
    expect(damped(five)).toBe('5%');
  });
});

import { describe, expect, it } from 'vitest';
import { summaryTable } from '../../src/formats/spectrum-table.js';
import { logSpaced } from '../../src/oscillator/grid.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { fitTarget } from '../../src/spectrum/target.js';
import { block, decayingSine, expectAligned, expectCaution } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const record = decayingSine();
const periods = Float64Array.of(0, 0.1, 0.5, 1, 2);
const spectrum = responseSpectrum(record, { periodsS: periods, dampings: [0.02, 0.05] });

describe('summaryTable', () => {
  const text = summaryTable(spectrum, 'cm');
  const lines = text.split('\n');

  it('opens with the caution, then the record with its PGA in g and the method', () => {
    expectCaution(text, '! ');
    const pgaG = Math.max(...Array.from(record.accelMS2, Math.abs)) / G;
    expect(text).toContain(
      `record  ${record.name} (${record.source}), 301 samples at 0.01 s, PGA ${pgaG.toFixed(4)} g`,
    );
    expect(lines.some((line) => line.startsWith('method  Newmark-β'))).toBe(true);
  });

  it('shows SD in the length unit asked and PSA in g for each damping, aligned, one row a period', () => {
    const [heading, ...rows] = block(text, '   T (s)');
    expect(heading.trim().split(/ {2,}/)).toEqual([
      'T (s)',
      'SD cm @2%',
      'PSA g @2%',
      'SD cm @5%',
      'PSA g @5%',
    ]);
    expectAligned(heading, rows);
    expect(rows).toHaveLength(periods.length);
    const cells = rows[2].trim().split(/ +/).map(Number);
    expect(cells[0]).toBe(0.5);
    // SD in cm = SD in m × 100; PSA in g = PSA in m/s² / g (definitions), to 4 significant digits.
    expect(cells[3]).toBeCloseTo(spectrum.curves[1].sdM[2] * 100, 4 - Math.ceil(Math.log10(cells[3])));
    expect(cells[4]).toBe(Number((spectrum.curves[1].psaMS2[2] / G).toPrecision(4)));
    // At T = 0 the oscillator is rigid: PSA equals the PGA (closed form).
    expect(Number(rows[0].trim().split(/ +/)[2])).toBeCloseTo(record.pgaMS2 / G, 3);
  });

  it('names the peak PSA of each damping and its period, and how many periods there are', () => {
    const psa = Array.from(spectrum.curves[0].psaMS2);
    const peak = psa.indexOf(Math.max(...psa));
    expect(text).toContain(`peak PSA at 2%: ${(psa[peak] / G).toPrecision(4)} g at T = ${periods[peak]} s`);
    expect(text).toContain('(5 periods; --format json or csv for all of them)');
  });

  it('summarises a long grid at round periods, and adds the target lines last', () => {
    const long = responseSpectrum(record, { periodsS: logSpaced(0.05, 3, 60), dampings: [0.05] });
    const { fit } = fitTarget(long, asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 }));
    const table = summaryTable(long, 'm', fit);
    const rows = block(table, '   T (s)').slice(1);
    expect(rows.length).toBeLessThan(16);
    // Each row within half a grid step (a ratio of 1.072 between periods) of a round period.
    const round = [0.05, 0.1, 0.2, 0.3, 0.5, 0.75, 1, 1.5, 2, 3];
    expect(rows).toHaveLength(round.length);
    rows.forEach((row, i) => {
      expect(Math.abs(Number(row.trim().split(/ +/)[0]) / round[i] - 1)).toBeLessThan(0.04);
    });
    expect(table.trimEnd().split('\n').at(-4)).toBe(`target  ${fit.description}`);
  });
});

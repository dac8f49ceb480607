import { describe, expect, it } from 'vitest';
import { CONVENTION_LINE, ductilityDemandTable, ductilityTable } from '../../src/formats/ductility-table.js';
import { constantDuctilitySpectra, ductilityDemandSpectra } from '../../src/inelastic/ductility.js';
import { block, decayingSine, expectAligned, expectCaution } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const record = decayingSine();
const periodsS = [0, 0.2, 0.5];
const spectra = constantDuctilitySpectra(record, {
  periodsS,
  dampings: [0.05],
  ductilities: [1, 1.5, 4],
  model: { kind: 'elastoplastic' },
});

describe('ductilityTable', () => {
  const text = ductilityTable(spectra);

  it('opens with the caution, the record with its PGA, the model and the convention in one line', () => {
    expectCaution(text, '! ');
    expect(text).toContain(`record  ${record.name} (${record.source}), 301 samples at 0.01 s, PGA`);
    expect(text).toContain('\nmodel   elastoplastic\n');
    expect(text).toContain(`\nf_y     ${CONVENTION_LINE}\n`);
    expect(`f_y     ${CONVENTION_LINE}`.length).toBeLessThanOrEqual(92);
  });

  it('shows A_y beside the elastic PSA and R_y, by period, per μ, to 4 significant digits', () => {
    const [ayHeading, ...ayRows] = block(text, '   T (s)   elastic');
    expect(ayHeading.trim().split(/ {2,}/)).toEqual(['T (s)', 'elastic', 'μ = 1', 'μ = 1.5', 'μ = 4']);
    expectAligned(ayHeading, ayRows);
    expect(ayRows).toHaveLength(3);
    const cells = ayRows[2].trim().split(/ +/).map(Number);
    expect(cells[0]).toBe(0.5);
    expect(cells[1]).toBe(Number(spectra.elastic[0].psaG[2].toPrecision(4)));
    expect(cells[4]).toBe(Number(spectra.curves[2].ayG[2].toPrecision(4)));
    // At T = 0 every A_y is the PGA (RIGID_CONVENTION).
    expect(Number(ayRows[0].trim().split(/ +/)[3])).toBeCloseTo(record.pgaMS2 / G, 3);
    const [ryHeading, ...ryRows] = block(text, '   T (s)     μ = 1');
    expectAligned(ryHeading, ryRows);
    expect(Number(ryRows[1].trim().split(/ +/)[3])).toBe(Number(spectra.curves[2].ry[1].toPrecision(4)));
  });

  it('closes with the method and the whole convention; counts cells off their target, T = 0 aside', () => {
    expect(text).toContain('method and assumptions');
    expect(text.replace(/\s+/g, ' ')).toContain(spectra.convention.replace(/\s+/g, ' '));
    expect(text).toContain('(3 periods; --format json or csv for all of them)');
    expect(text).not.toContain('jumps across its target');
    // One cell made to miss its target by 10% (a jump): counted once.
    const achieved = Float64Array.from(spectra.curves[2].achievedDuctility);
    achieved[1] = 4.4;
    const curves = spectra.curves.map((c, i) => (i === 2 ? { ...c, achievedDuctility: achieved } : c));
    expect(ductilityTable({ ...spectra, curves })).toContain('1 of 9 cells: μ jumps across its target');
  });
});

describe('ductilityDemandTable', () => {
  it('shows the demand per given R_y, then A_y beside the elastic PSA', () => {
    const demand = ductilityDemandSpectra(record, {
      periodsS: [0.2, 0.5],
      dampings: [0.05],
      model: { kind: 'elastoplastic' },
      ry: [2, 4],
    });
    const text = ductilityDemandTable(demand);
    expectCaution(text, '! ');
    const [heading, ...rows] = block(text, '   T (s)   R_y = 2');
    expectAligned(heading, rows);
    expect(Number(rows[1].trim().split(/ +/)[2])).toBe(Number(demand.curves[1].ductility[1].toPrecision(4)));
    const [ayHeading] = block(text, '   T (s)   elastic');
    expect(ayHeading.trim().split(/ {2,}/)).toEqual(['T (s)', 'elastic', 'R_y = 2', 'R_y = 4']);
    expect(text).toContain('Demand: ductility = um/uy');
  });

  it('for a given A_y, shows R_y, with columns wide enough for their headings', () => {
    const demand = ductilityDemandSpectra(record, {
      periodsS: [0.5],
      dampings: [0.05],
      model: { kind: 'elastoplastic' },
      ayG: [0.05, 0.125],
    });
    const text = ductilityDemandTable(demand);
    const [heading, ...rows] = block(text, '   T (s)   elastic');
    expect(heading.trim().split(/ {2,}/)).toEqual(['T (s)', 'elastic', 'A_y = 0.05g', 'A_y = 0.125g']);
    expectAligned(heading, rows);
    // R_y = PSA/A_y for a given A_y (definition).
    const ry = Number(rows[0].trim().split(/ +/)[2]);
    expect(ry).toBeCloseTo(demand.elastic[0].psaG[0] / 0.05, 4 - Math.ceil(Math.log10(ry)));
  });
});

import { describe, expect, it } from 'vitest';
import { floorAssumptions, floorTable, floorToJson } from '../../src/formats/floor.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { block, decayingSine, expectAligned, expectCaution } from '../helpers/outputs.js';

const G = 9.80665; // standard gravity, m/s² (CGPM 1901)
const ground = decayingSine('ground (invented)');
const grid = { periodsS: [0, 0.1, 0.3, 1], dampings: [0.02, 0.05] };
const building = { periodS: 0.3, damping: 0.05, modalFactor: 1.3 };
const groundSpectrum = responseSpectrum(ground, grid);
const plain = floorSpectrum(ground, building, grid);
const broadened = floorSpectrum(ground, building, grid, 0.15);

describe('floorAssumptions', () => {
  it('states the one-mode idealisation, and whether and how the peaks are broadened', () => {
    const plainText = floorAssumptions(plain);
    expect(plainText[0]).toMatch(/^Building idealised by its fundamental mode/);
    expect(plainText.at(-1)).toMatch(/^Peaks not broadened/);
    const broad = floorAssumptions(broadened).at(-1);
    expect(broad).toContain('Regulatory Guide 1.122');
    expect(broad).toContain('b = 0.15');
  });

  it('states the cascade, and the internal grid the broadening searched', () => {
    expect(floorAssumptions(plain).join(' ')).toContain('never sampled and re-interpolated');
    const broad = floorAssumptions(broadened).at(-1) ?? '';
    expect(broad).toContain(`internal grid of up to ${broadened.dense?.densePeriods} periods`);
    expect(broadened.dense?.densePeriods).toBeGreaterThan(100);
  });
});

describe('floorToJson', () => {
  const assumptions = floorAssumptions(broadened);
  const json = floorToJson(broadened, groundSpectrum, building, assumptions);

  it('is the floor spectrum JSON with the building, the broadening, the ground and the assumptions', () => {
    expect(Object.keys(json).slice(0, 7)).toEqual([
      'caution',
      'record',
      'method',
      'method_description',
      'periods_s',
      'frequencies_hz',
      'spectra',
    ]);
    expect(Object.keys(json).slice(7)).toEqual([
      'building',
      'broadening',
      'unbroadened_psa_g',
      'ground',
      'assumptions',
    ]);
    expect(json.building).toEqual({
      period_s: 0.3,
      damping: 0.05,
      modal_factor: 1.3,
      method: 'piecewise-exact',
    });
    expect(json.broadening).toMatchObject({ fraction: 0.15 });
    expect(floorToJson(plain, groundSpectrum, building, []).broadening).toBeNull();
    expect(json.assumptions).toBe(assumptions);
  });

  it('gives the PSA in g: the ground PGA, and at T = 0 the PSA equals the PGA (closed form)', () => {
    expect(json.ground.pga_g).toBe(ground.pgaMS2 / G);
    expect(json.ground.spectra[1].psa_g[0]).toBeCloseTo(json.ground.pga_g, 3);
    expect(json.unbroadened_psa_g[1].psa_g[0]).toBeCloseTo(json.record.pga_g, 3);
    // Broadening takes the largest value over a window around each period: never below the original.
    json.spectra[1].psa_g.forEach((value, p) => {
      expect(value).toBeGreaterThanOrEqual(json.unbroadened_psa_g[1].psa_g[p]);
    });
  });
});

describe('floorTable', () => {
  const text = floorTable(plain.spectrum, groundSpectrum, building, floorAssumptions(plain));

  it('opens with the caution, the record, the building and the method', () => {
    expectCaution(text, '! ');
    expect(text).toContain(
      `record    ground (invented) (ground (invented)), PGA ${(ground.pgaMS2 / G).toFixed(4)} g`,
    );
    expect(text).toContain(
      `building  T_b 0.3 s, ζ_b 0.05, Γφ 1.3; floor PGA ${(plain.floor.pgaMS2 / G).toFixed(4)} g`,
    );
  });

  it('gives ground and floor PSA per damping, aligned, ground PGA at T = 0', () => {
    const [heading, ...rows] = block(text, '   T (s)');
    expect(heading.trim().split(/ {2,}/)).toEqual([
      'T (s)',
      'ground PSA g @2%',
      'floor PSA g @2%',
      'ground PSA g @5%',
      'floor PSA g @5%',
    ]);
    expectAligned(heading, rows);
    const [, ground2, floor2] = rows[0].trim().split(/ +/).map(Number);
    expect(ground2).toBeCloseTo(ground.pgaMS2 / G, 3);
    expect(floor2).toBeCloseTo(plain.floor.pgaMS2 / G, 3);
  });

  it('closes with the assumptions as a list', () => {
    const lines = text.trimEnd().split('\n');
    const start = lines.indexOf('method and assumptions');
    expect(lines[start + 1]).toMatch(/^ {2}- Building idealised/);
    expect(text).toContain('(4 periods; --format json for all of them)');
  });
});

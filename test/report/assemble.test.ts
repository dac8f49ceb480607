/** A report from library calls alone (no CLI, no files): what a library user gets. */
import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { formatJson, spectrumToJson } from '../../src/formats/spectrum-json.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { assembleReport, figureAxisStatement } from '../../src/report/assemble.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';

const record = synthesizeRecord({ seed: 3, dtS: 0.01, durationS: 10, name: 'invented test record' });
const grid = {
  periodsS: Float64Array.from([0, 0.1, 0.3, 1, 3]),
  dampings: Float64Array.from([0.02, 0.05]),
  method: 'newmark-average' as const,
};

describe('assembleReport', () => {
  it('gives the spectra, the figures and report.html, the spectra those of responseSpectrum', async () => {
    const files = await assembleReport({
      read: record,
      processed: record,
      grid,
      generatedAt: '2026-01-01T00:00:00Z',
    });
    expect([...files.keys()]).toEqual([
      'spectra.json',
      'spectra.csv',
      'psa.svg',
      'sd.svg',
      'psv.svg',
      'tripartite.svg',
      'histories.svg',
      'damping.svg',
      'report.html',
    ]);
    expect(files.get('spectra.json')).toBe(formatJson(spectrumToJson(responseSpectrum(record, grid))));
    const html = files.get('report.html') ?? '';
    expect(html).toContain(CAUTION);
    expect(html).toContain('2026-01-01T00:00:00Z');
  });

  it('fits a target and applies it when asked, in the JSON it writes', async () => {
    const target = { spectrum: asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 }), apply: true };
    const files = await assembleReport({ read: record, processed: record, grid, target, generatedAt: 'now' });
    const json = JSON.parse(files.get('spectra.json') ?? '{}');
    expect(json.scaling.applied).toBe(true);
    const unscaled = responseSpectrum(record, grid).curves[1].psaMS2[3] / 9.80665; // standard g
    expect(json.spectra[1].psa_g[3]).toBeCloseTo(unscaled * json.scaling.factor, 9);
  });
});

describe('figureAxisStatement', () => {
  it('says which figures are against frequency, and nothing when all are against period', () => {
    expect(figureAxisStatement(undefined, false)).toBeUndefined();
    expect(figureAxisStatement('period', true)).toBeUndefined();
    expect(figureAxisStatement(undefined, true)).toMatch(
      /^Figures: spectra against period T; the floor spectra of equipment against frequency f = 1\/T \(Hz\)/,
    );
    expect(figureAxisStatement('frequency', false)).toMatch(/^Figures: spectra drawn against frequency/);
  });
});

describe('assembleReport --axis', () => {
  it('frequency: every spectrum figure is drawn against frequency, and the report says so', async () => {
    const files = await assembleReport({
      read: record,
      processed: record,
      grid,
      axis: 'frequency',
      generatedAt: '2026-01-01T00:00:00Z',
    });
    for (const name of ['psa.svg', 'sd.svg', 'psv.svg', 'tripartite.svg', 'damping.svg'])
      expect(files.get(name)).toContain('Frequency f = 1/T (Hz)');
    expect(files.get('histories.svg')).not.toContain('Frequency f = 1/T (Hz)');
    expect(files.get('report.html')).toContain('Figures: spectra drawn against frequency f = 1/T (Hz)');
  });

  it('unset: the spectra against period, and no word on axes without floor figures', async () => {
    const files = await assembleReport({ read: record, processed: record, grid, generatedAt: 'now' });
    expect(files.get('psa.svg')).toContain('Period T (s)');
    expect(files.get('psa.svg')).not.toContain('(Hz)');
    expect(files.get('report.html')).not.toContain('Figures: spectra');
  });
});

describe('assembleReport with ductility', () => {
  it('adds the inelastic section and its two figures, at 5% on its own periods', async () => {
    const files = await assembleReport({
      read: record,
      processed: record,
      grid,
      generatedAt: 'now',
      ductility: {
        ductilities: [1, 4],
        model: { kind: 'bilinear', alpha: 0.05 },
        periodsS: Float64Array.of(0.3, 1),
      },
    });
    const names = [...files.keys()];
    expect(names.slice(-3)).toEqual(['ductility-ay.svg', 'ductility-ry.svg', 'report.html']);
    const html = files.get('report.html') ?? '';
    expect(html).toContain('<a href="#inelastic">');
    expect(html).toContain('Inelastic response: bilinear:0.05 oscillators at ζ = 5%');
    // Nassar–Krawinkler between the table's α = 0.02 and 0.10, said so.
    expect(html).toContain('the coefficients linear in α');
  });
});

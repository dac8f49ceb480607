import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { CAUTION } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { groundMotionMeasures } from '../../src/record/measures.js';
import { applyProcessingPlan } from '../../src/record/process.js';
import { warningStep } from '../../src/record/reading.js';
import { createRecord } from '../../src/record/record.js';
import { assembleReport } from '../../src/report/assemble.js';
import {
  dampingSection,
  measuresSection,
  peaksSection,
  processingSection,
  recordSection,
  rotdSection,
  targetSection,
} from '../../src/report/sections.js';
import { compareDamping } from '../../src/spectrum/damping.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';
import { rotDSpectra } from '../../src/spectrum/rotd.js';
import { fitTarget } from '../../src/spectrum/target.js';
import { sineRecord } from '../helpers/records.js';
import { handSpectrum } from '../plot/helpers.js';

const g = STANDARD_GRAVITY_MS2;
const HOSTILE = `<script>alert("x")</script> & 'y'`;

function page(html: string): Document {
  return new JSDOM(`<!DOCTYPE html><body>${html}</body>`).window.document;
}

/** The cells of every body row of the first table whose caption matches. */
function rows(doc: Document, caption: RegExp): string[][] {
  const table = [...doc.querySelectorAll('table')].find((t) => caption.test(t.caption?.textContent ?? ''));
  if (!table) throw new Error(`no table ${caption}`);
  return [...table.querySelectorAll('tbody tr')].map((tr) =>
    [...tr.querySelectorAll('th, td')].map((cell) => cell.textContent ?? ''),
  );
}

// Invented record: 10 cycles of a 0.25 s sine, 2 m/s² peak, 20 samples a cycle (Δt = 0.0125 s).
const sine = createRecord({ name: HOSTILE, source: 'invented.txt', ...sineRecord(2, 0.25, 10, 20) });

describe('recordSection', () => {
  it('states the record as read, its name escaped; length (201 − 1)·0.0125 = 2.5 s (hand)', () => {
    const doc = page(recordSection(sine, { dtS: sine.dtS, npts: 201 }));
    const cells = rows(doc, /^Table 1\. The record$/);
    expect(cells[0]).toEqual(['Name', HOSTILE]);
    expect(cells.find((r) => r[0] === 'Length as read')?.[1]).toBe('2.5 s');
    expect(cells.find((r) => r[0] === 'Samples as read')?.[1]).toBe('201');
    expect(doc.querySelector('script')).toBeNull();
    expect(cells.some((r) => r[0].includes('after processing'))).toBe(false);
  });

  it('adds the time step and samples after processing only when they changed', () => {
    const cells = rows(page(recordSection(sine, { dtS: 0.025, npts: 101 })), /The record/);
    expect(cells.slice(-2)).toEqual([
      ['Time step after processing', '0.025 s'],
      ['Samples after processing', '101'],
    ]);
  });
});

describe('processingSection', () => {
  it('says none when the record is used as read', () => {
    expect(page(processingSection([])).body.textContent).toMatch(/^None: the record is used as read/);
  });

  it('lists the steps in the order applied, escaped', () => {
    const steps = [
      ...applyProcessingPlan(sine, { taperFraction: 0.05 }).processing,
      { operation: HOSTILE, description: HOSTILE },
    ];
    const items = [...page(processingSection(steps)).querySelectorAll('ol > li')];
    expect(items).toHaveLength(2);
    expect(items[0].querySelector('strong')?.textContent).toBe('taper');
    expect(items[1].textContent).toBe(`${HOSTILE}: ${HOSTILE}`);
  });

  it('says how the record was read apart from the steps, and sets warnings in a block of their own', () => {
    const steps = [
      { operation: 'read', description: 'as read: Δt 0.01 s from the time column' },
      ...applyProcessingPlan(sine, { taperFraction: 0.05 }).processing,
      warningStep(`damping 2000% is above 1000% ${HOSTILE}`),
    ];
    const doc = page(processingSection(steps));
    expect(doc.body.textContent).toMatch(/^How it was read: Δt 0\.01 s from the time column\./);
    expect([...doc.querySelectorAll('ol > li')].map((li) => li.querySelector('strong')?.textContent)).toEqual(
      ['taper'],
    );
    const warnings = [...doc.querySelectorAll('div.warnings li')].map((li) => li.textContent);
    expect(warnings).toEqual([`damping 2000% is above 1000% ${HOSTILE}`]);
    // Nothing but the read entry and a warning: the record is used as read, and says so.
    const asRead = page(processingSection([steps[0], steps[2]]));
    expect(asRead.body.textContent).toMatch(/None: the record is used as read/);
    expect(asRead.querySelectorAll('div.warnings li')).toHaveLength(1);
  });

  it('states the usable period band after filtering and its rule, or that no filter limits it', () => {
    const filtered = [
      {
        operation: 'filter',
        description: 'band-pass',
        parameters: { low_corner_hz: 0.2, high_corner_hz: 20 },
      },
    ];
    // 1/20 = 0.05 s to 0.8/0.2 = 4 s (common practice, by hand).
    const band = page(processingSection(filtered)).querySelector('p.usable-band')?.textContent ?? '';
    expect(band).toMatch(/^Usable period band after filtering: 0\.05–4 s, by the rule periods from 1\/f_lp/);
    expect(page(processingSection([])).querySelector('p.usable-band')?.textContent).toMatch(
      /not limited by a filter/,
    );
  });
});

describe('measuresSection', () => {
  it('gives PGA in g: 2 m/s² / 9.80665 m/s² = 0.2039 g (hand), at t = 5·0.0125 = 0.0625 s', () => {
    const cells = rows(page(measuresSection(groundMotionMeasures(sine))), /^Table 2\./);
    const pga = cells.find((r) => r[0] === 'Peak ground acceleration PGA');
    expect(pga?.slice(1)).toEqual(['0.2039', 'g', 'at t = 0.0625 s']);
    expect(cells).toHaveLength(9);
  });
});

describe('peaksSection', () => {
  const spectrum = handSpectrum();
  const cells = rows(page(peaksSection(spectrum, 'mm', 3)), /^Table 3\. Peak spectral values/);

  it('one row a damping ratio, peaks over T > 0 found independently here', () => {
    expect(cells.map((r) => r[0])).toEqual(['2%', '5%', '10%']);
    spectrum.curves.forEach((curve, d) => {
      let peak = -1;
      for (let p = 1; p < spectrum.periodsS.length; p++)
        if (peak < 0 || curve.psaMS2[p] > curve.psaMS2[peak]) peak = p;
      expect(Number(cells[d][1])).toBeCloseTo(curve.psaMS2[peak] / g, 3);
      expect(Number(cells[d][2])).toBe(spectrum.periodsS[peak]);
      // PSA at the grid periods 0.2 s and 1 s (columns 4 and 5), and SD in mm (× 1000).
      expect(Number(cells[d][3])).toBeCloseTo(curve.psaMS2[3] / g, 3);
      expect(Number(cells[d][4])).toBeCloseTo(curve.psaMS2[5] / g, 3);
      expect(Number(cells[d][5]) / (Math.max(...curve.sdM) * 1000)).toBeCloseTo(1, 3);
    });
  });
});

describe('dampingSection', () => {
  it('puts the EC8 factor beside the record: η(2%)/η(5%) = √(10/7) = 1.195, η(10%) = √(10/15) = 0.8165', () => {
    // EN 1998-1:2004 §3.2.2.2, Eq. 3.6: η = √(10/(5 + ξ)) ≥ 0.55, ξ in percent; η(5%) = 1.
    const cells = rows(
      page(dampingSection(compareDamping(handSpectrum()), 5)),
      /^Table 5\. PSA\(ζ\)\/PSA\(5%\)/,
    );
    expect(cells.map((r) => [r[0], r[2]])).toEqual([
      ['2%', '1.195'],
      ['5%', '1'],
      ['10%', '0.8165'],
    ]);
  });
});

describe('rotdSection', () => {
  it('names both components, escaped, and RotD100 ≥ RotD50 at every period shown (max ≥ median)', () => {
    const second = createRecord({ name: 'invented second', ...sineRecord(1, 0.4, 8, 32) });
    const first = createRecord({ name: HOSTILE, ...sineRecord(2, 0.4, 8, 32) });
    const spectra = rotDSpectra(first, second, {
      periodsS: [0, 0.2, 0.5, 1],
      dampings: [0.05],
      angleStepDeg: 1,
    });
    const doc = page(rotdSection(spectra, 6));
    expect(doc.querySelector('script')).toBeNull();
    expect(rows(doc, /^Components$/)[0][1]).toBe(`${HOSTILE} (${HOSTILE})`);
    const cells = rows(doc, /^Table 6\. Two-component PSA/);
    // The selected periods 0, 0.2, 0.5, 1 s lie in the grid; 2 s does not.
    expect(cells.map((r) => r[1])).toEqual(['0', '0.2', '0.5', '1']);
    for (const r of cells) expect(Number(r[3])).toBeGreaterThanOrEqual(Number(r[2]));
  });
});

describe('targetSection', () => {
  it('states the target, the factor and whether it was applied', () => {
    const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
    const { fit } = fitTarget(handSpectrum(), target);
    const cells = rows(page(targetSection(fit, 4)), /^Table 4\. Target and amplitude scaling$/);
    expect(cells[0]).toEqual(['Target', target.description]);
    expect(cells.find((r) => r[0] === 'Damping compared')?.[1]).toBe('5%');
    // Four significant figures (src/base/numbers.ts): within 5e-4 of the factor, relatively.
    expect(Math.abs(Number(cells.find((r) => r[0] === 'Scale factor')?.[1]) / fit.factor - 1)).toBeLessThan(
      5e-4,
    );
    expect(cells.find((r) => r[0].startsWith('Applied'))?.[1]).toMatch(/^no:/);
  });
});

describe('the sections of a whole report', () => {
  it('every section in order, each in the contents, with the caution at the top, over the anchorage and at the foot', async () => {
    const record = createRecord({ name: HOSTILE, ...sineRecord(2, 0.4, 10, 40) });
    const second = createRecord({ name: 'invented second', ...sineRecord(1, 0.4, 10, 40) });
    const equipment = parseEquipment(
      JSON.stringify({
        name: HOSTILE,
        units: 'SI',
        weight: 10,
        cg_height: 1,
        anchors: [
          [0, 0],
          [1, 0],
          [0, 1],
        ],
        period_s: 'rigid',
        damping: 0.05,
        z: 0,
        h: 10,
        ap: 1,
        rp: 2.5,
        ip: 1,
        sds: 1,
        omega0: null,
      }),
      'invented.json',
    );
    const files = await assembleReport({
      read: record,
      processed: record,
      grid: {
        periodsS: Float64Array.from([0, 0.2, 0.5, 1]),
        dampings: Float64Array.from([0.02, 0.05]),
        method: 'piecewise-exact',
      },
      target: { spectrum: asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 }) },
      pair: { record: second, angleStepDeg: 1 },
      equipment: [{ file: 'invented.json', value: equipment }],
      generatedAt: '2026-01-01T00:00:00Z',
    });
    const doc = new JSDOM(files.get('report.html')).window.document;
    const ids = [...doc.querySelectorAll('section')].map((s) => s.id);
    expect(ids).toEqual([
      'record',
      'processing',
      'measures',
      'spectra',
      'target',
      'damping',
      'rotd',
      'anchorage',
      'method',
      'limits',
      'reproduce',
    ]);
    const contents = [...doc.querySelectorAll('nav.contents a')].map((a) => a.getAttribute('href'));
    expect(contents).toEqual(ids.map((id) => `#${id}`));
    expect(doc.querySelector('script')).toBeNull();
    // The caution defers to a licensed structural engineer and the local code (the house rule).
    expect(CAUTION).toMatch(/licensed structural engineer/);
    expect(CAUTION).toMatch(/local\s+building code/);
    expect(doc.querySelector('#caution')?.textContent).toBe(`Caution${CAUTION}`);
    expect(doc.querySelector('#anchorage .caution-inline')?.textContent).toBe(CAUTION);
    expect(doc.querySelector('footer')?.textContent).toBe(CAUTION);
    expect(doc.querySelector('#anchorage h3')?.textContent).toBe(`8.1 ${HOSTILE}`);
  });
});

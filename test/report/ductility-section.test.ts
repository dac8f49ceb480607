import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import { DUCTILITY_LIMIT, ductilitySection, reportDuctility } from '../../src/report/ductility-section.js';

// A short invented record (600 samples) and four periods: the yielding search is slow.
const record = synthesizeRecord({ seed: 5, dtS: 0.01, durationS: 6, name: 'invented test record' });
const grid = { periodsS: Float64Array.from([0.2, 0.5, 1, 2]), damping: 0.05 };
const model = { kind: 'elastoplastic' } as const;
const ductility = reportDuctility(record, { ductilities: [1, 2, 4], model }, grid, undefined);
const html = ductilitySection(ductility, 'mm', 7);

/** The cells of the rows of the table whose caption starts with `caption`. */
function rows(caption: string): string[][] {
  const at = html.indexOf(`<caption>${caption}`);
  const body = html.slice(at, html.indexOf('</table>', at));
  return [...body.matchAll(/<tr>(.*?)<\/tr>/g)]
    .slice(1)
    .map((m) => [...m[1].matchAll(/<td[^>]*>(.*?)<\/td>/g)].map((c) => c[1]));
}

describe('reportDuctility', () => {
  it('computes at the one damping ratio and the given grid, and draws the A_y and R_y figures', () => {
    expect(ductility.spectra.elastic.map((e) => e.damping)).toEqual([0.05]);
    expect(Array.from(ductility.spectra.periodsS)).toEqual([0.2, 0.5, 1, 2]);
    expect(ductility.figures.map((f) => f.file)).toEqual(['ductility-ay.svg', 'ductility-ry.svg']);
    expect(ductility.figures[1].svg).toContain('Nassar–Krawinkler (1991)');
  });

  it('takes its own period grid when one is given', () => {
    const own = reportDuctility(
      record,
      { ductilities: [2], model, periodsS: Float64Array.of(0.5, 1) },
      grid,
      'frequency',
    );
    expect(Array.from(own.spectra.periodsS)).toEqual([0.5, 1]);
    expect(own.figures[0].svg).toContain('Frequency f = 1/T (Hz)');
  });
});

describe('ductilitySection', () => {
  it('states the caution, the model, the method, the convention and the sources', () => {
    expect(html).toContain(CAUTION);
    expect(html).toContain('Table 7. Yielding oscillators and the strength search');
    expect(html).toContain('<td>elastoplastic</td>');
    expect(html).toContain('Newton–Raphson');
    expect(html).toContain('largest strength');
    expect(html).toContain('Newmark and Hall (1982)');
    expect(html).toContain('Nassar and Krawinkler (1991)');
    expect(DUCTILITY_LIMIT).toContain('not design strengths');
  });

  it('tabulates each μ at 0.2, 0.5, 1 and 2 s with the published R beside the record’s', () => {
    const table = rows('Table 8.');
    expect(table).toHaveLength(3 * 4);
    // μ = 1: no reduction (closed form); both relations give 1.
    for (const row of table.slice(0, 4)) {
      expect(row[3]).toBe('1');
      expect(row.slice(7)).toEqual(['1', '1']);
    }
    // μ = 4 at T = 1 s: Nassar–Krawinkler 3.76^(1/0.92) = 4.219 (hand arithmetic, a and b from memory).
    const mu4at1 = table.find((row) => row[0] === '4' && row[1] === '1');
    expect(mu4at1?.[8]).toBe('4.219');
    // Newmark–Hall past T_c is μ (equal displacement, closed form), where T_c < 2 s.
    const tc = ductility.references.cornerPeriodsS[0].tcS;
    expect(tc).toBeLessThan(2);
    expect(table.find((row) => row[0] === '4' && row[1] === '2')?.[7]).toBe('4');
    // u_m/u_y is the achieved ductility (definition), in mm as asked.
    for (const row of table) expect(Number(row[5]) / Number(row[4])).toBeCloseTo(Number(row[6]), 2);
  });
});

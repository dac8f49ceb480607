import { readFileSync } from 'node:fs';
import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { analyseAnchorage } from '../../src/anchorage/anchorage.js';
import { parseEquipment } from '../../src/anchorage/equipment.js';
import { anchorageToJson } from '../../src/formats/anchorage-json.js';
import { anchorageSection } from '../../src/report/anchorage-section.js';

const HOSTILE = `Invented <script>alert("x")</script> & 'pump'`;
const file = JSON.parse(readFileSync('records/equipment-generator.json', 'utf8'));
const generator = parseEquipment(JSON.stringify({ ...file, name: HOSTILE }), 'gen.json');

function render(elastic: { psaG: number; how: string; source: string } | null) {
  const analysis = analyseAnchorage(generator, { elastic, demand: elastic === null ? 'code' : 'max' });
  const item = {
    json: anchorageToJson(analysis),
    file: 'gen <1>.json',
    motion: 'ground record <r>',
    figures: [],
  };
  return new JSDOM(`<!DOCTYPE html><body>${anchorageSection(item, '8.1', 7)}</body>`).window.document;
}

function cells(doc: Document, index: number): string[][] {
  const table = doc.querySelectorAll('table')[index];
  return [...table.querySelectorAll('tbody tr')].map((tr) =>
    [...tr.querySelectorAll('th, td')].map((cell) => cell.textContent ?? ''),
  );
}

describe('anchorageSection', () => {
  const doc = render(null);

  it('three tables numbered from the one given, for the item numbered as given, names escaped', () => {
    const captions = [...doc.querySelectorAll('table > caption')].map((c) => c.textContent);
    expect(captions).toEqual([
      'Table 7. Equipment 8.1: inputs (file gen <1>.json)',
      'Table 8. Equipment 8.1: horizontal and vertical forces',
      'Table 9. Equipment 8.1: worst anchor forces over every direction of shaking',
    ]);
    expect(cells(doc, 0)[0]).toEqual(['Name', HOSTILE]);
    expect(cells(doc, 0).at(-1)).toEqual(['Motion for the elastic demand', 'ground record <r>']);
    expect(doc.querySelector('script')).toBeNull();
  });

  it('the code force of the invented generator: 0.4·2.5·1.0·45·(1 + 0)/(2/1.5) = 33.75 kN (ASCE/SEI 7-16 Eq. 13.3-1)', () => {
    const forces = cells(doc, 1);
    expect(forces[0][0]).toBe('F_p by ASCE/SEI 7-16 Eq. 13.3-1');
    expect(forces[0][1]).toBe('33.75');
    // Bounds 0.3·1·1.5·45 = 20.25 and 1.6·1·1.5·45 = 108 (Eqs. 13.3-3 and 13.3-2).
    expect(forces[0][2]).toBe('bounds 20.25 to 108 kN');
    // E_v = 0.2·S_DS·W_p = 0.2·1·45 = 9 kN (§13.3.1.2); dead load factor 0.9 − 0.2·1 = 0.7 (§2.3.6).
    expect(forces.at(-1)?.slice(1)).toEqual(['9', 'dead load factor 0.7']);
    expect(forces.find((r) => r[0] === 'Elastic record demand PSA·W_p')?.slice(1)).toEqual([
      '—',
      'no motion used',
    ]);
  });

  it('one row an anchor, the governing one marked, the largest tension stated below', () => {
    const anchors = cells(doc, 2);
    expect(anchors).toHaveLength(4);
    expect(anchors.filter((r) => r[0].endsWith('(governs)'))).toHaveLength(1);
    const largest = Math.max(...anchors.map((r) => Number(r[3])));
    expect(doc.body.textContent).toContain(`Largest tension ${largest} kN`);
  });

  it('ends with the method, the assumptions and the scope, which defers to a licensed engineer and the local code', () => {
    expect(doc.querySelector('h4')?.textContent).toBe('Method and assumptions of this anchorage');
    // The anchor method is stated once, in the assumptions (it was a bullet of its own too).
    const items = [...doc.querySelectorAll('ul > li')].map((li) => li.textContent ?? '');
    expect(items.filter((t) => /rigid base, elastic bolt group/.test(t))).toHaveLength(1);
    expect(items.some((t) => t.startsWith('Anchors: rigid base'))).toBe(true);
    const scope = doc.querySelector('p.note')?.textContent ?? '';
    expect(scope).toMatch(/licensed structural engineer/);
    expect(scope).toMatch(/local code/);
    expect(scope).toMatch(/capacities .* not checked/);
  });

  it('with a motion: PSA·W_p = 1.2 g · 45 kN = 54 kN > 33.75 kN governs (hand)', () => {
    const withMotion = render({ psaG: 1.2, how: 'invented <how>', source: 'r' });
    const row = cells(withMotion, 1).find((r) => r[0] === 'Elastic record demand PSA·W_p');
    expect(row?.slice(1)).toEqual(['54', 'PSA 1.2 g: invented <how>']);
    const chosen = cells(withMotion, 1).find((r) => r[0] === 'Horizontal force for the anchors');
    expect(chosen?.slice(1)).toEqual(['54', 'choice "max", governing: record']);
  });
});

describe('anchorageSection of an ASCE/SEI 7-22 item', () => {
  const pumpFile = 'records/equipment-pump-roof-7-22.json';
  const pump = parseEquipment(readFileSync(pumpFile, 'utf8'), pumpFile);
  const json = anchorageToJson(analyseAnchorage(pump, { elastic: null, demand: 'code' }));
  const doc = new JSDOM(
    `<!DOCTYPE html><body>${anchorageSection({ json, file: pumpFile, motion: 'none', figures: [] }, '8.3', 13)}</body>`,
  ).window.document;

  it('states the edition, the building and H_f and R_μ with their clauses', () => {
    const inputs = Object.fromEntries(cells(doc, 0).map(([k, v]) => [k, v]));
    expect(inputs['Code edition']).toBe('ASCE/SEI 7-22 (§13.3.1)');
    expect(inputs['C_AR, R_po, I_p']).toBe('1.4, 1.5, 1');
    expect(inputs['Building R, Ω₀, I_e; T_a']).toBe('8, 3, 1; 0.7');
    expect(inputs['Height factor H_f']).toMatch(/^3\.102: ASCE\/SEI 7-22 §13\.3\.1\.1, Eq\. 13\.3-4/);
    expect(inputs['Structure ductility reduction factor R_μ']).toMatch(
      /^1\.713: ASCE\/SEI 7-22 §13\.3\.1\.2, Eq\. 13\.3-6/,
    );
    expect(inputs['Ω₀ of the anchorage']).toBe('2');
  });

  it('names Eq. 13.3-1 to 13.3-3 on the force row, and shows the vertical spectral demand for information', () => {
    const forces = cells(doc, 1);
    expect(forces[0][0]).toBe('F_p by ASCE/SEI 7-22 §13.3.1, Eq. 13.3-1');
    expect(forces[0][2]).toMatch(/Eq\. 13\.3-3.*Eq\. 13\.3-2/);
    const vertical = forces.find((row) => row[0].startsWith('Vertical spectral demand'));
    expect(vertical?.[2]).toMatch(/governs nothing/);
  });
});

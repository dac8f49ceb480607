import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { analyseSuite } from '../../src/batch/suite.js';
import { escapeHtml } from '../../src/report/html.js';
import { renderSuiteReport } from '../../src/report/suite-report.js';
import { asce716Spectrum } from '../../src/spectrum/design.js';

// Two invented records at 0.5 and 2 times an invented ASCE 7-16 target; one named with markup.
const NASTY = `yard <b>7</b> & "east" (invented)`;
const target = asce716Spectrum({ sdsG: 1, sd1G: 0.6, tlS: 8 });
const periodsS = [0, 0.2, 0.5, 1, 2];
const records = [
  { name: NASTY, file: 'in/a.csv', psaG: [periodsS.map((t) => 0.5 * target.psaG(t))], pgaG: 0.2 },
  { name: 'rec2', file: 'in/b.csv', psaG: [periodsS.map((t) => 2 * target.psaG(t))], pgaG: 0.8 },
];
const settings = { periodsS, dampings: [0.05] };
const svg = '<?xml version="1.0"?><svg xmlns="http://www.w3.org/2000/svg" id="x"><title>fig</title></svg>';

function render(options: Parameters<typeof analyseSuite>[2]) {
  return renderSuiteReport({
    title: 'Invented suite',
    analysis: analyseSuite(records, settings, options),
    periodsS,
    figureSvg: svg,
    failed: [{ file: 'in/c.csv', error: 'in/c.csv:2: <not a number>' }],
    methodDescription: 'test method',
    commandLine: ['batch', 'in/*.csv', '--target', 'asce7-16:sds=1,sd1=0.6,tl=8'],
    files: ['suite.json', 'suite.csv', 'suite.svg'],
  });
}

describe('renderSuiteReport', () => {
  const html = render({
    target,
    scaleEach: true,
    check: { fraction: 0.9, rangeS: [0.2, 2], rangeSource: '0.2T to 2T (test)' },
  });

  it('is one page: the caution first and last, the check result, the figure inline, no script', () => {
    expect(html.startsWith('<!DOCTYPE html>')).toBe(true);
    expect(html.indexOf(escapeHtml(CAUTION))).toBeLessThan(html.indexOf('<figure'));
    expect(html.trimEnd().endsWith('</html>')).toBe(true);
    expect(html).toContain(`<footer>${escapeHtml(CAUTION)}</footer>`);
    expect(html).toContain('<th scope="row">Suite check (preliminary)</th><td>PASS</td>');
    expect(html).toContain('Preliminary: a screening of the suite mean');
    expect(html).toContain('<svg id="suite-1-x">'); // inlined: no XML declaration, no namespace
    expect(html).not.toMatch(/<script/i);
  });

  it('lists each record with its PGA, its factor and its scaled PGA (factors 2 and 0.5, closed form)', () => {
    expect(html).toContain(
      `<td>${escapeHtml(NASTY)}</td><td>in/a.csv</td><td class="num">0.2</td><td class="num">2</td><td class="num">0.4</td>`,
    );
    expect(html).toContain(
      '<td>rec2</td><td>in/b.csv</td><td class="num">0.8</td><td class="num">0.5</td><td class="num">0.4</td>',
    );
    expect(html).not.toContain('<b>7</b>');
    expect(html).toContain(escapeHtml('in/c.csv:2: <not a number>'));
  });

  it('without scaling says so and leaves the factor cells empty', () => {
    const plain = render({ target, check: { fraction: 0.9, rangeS: [0.2, 2], rangeSource: 'test' } });
    expect(plain).toContain('Table 2. Records of the suite (not scaled)');
    expect(plain).toContain('<td>rec2</td><td>in/b.csv</td><td class="num">0.8</td><td>—</td>');
    // Mean of 0.5 and 2 times the target is 1.25 times it everywhere (by hand).
    expect(plain).toContain('<td>1.25 at T = 0.2 s</td>');
  });
});

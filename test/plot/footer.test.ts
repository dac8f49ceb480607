import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { finishPage } from '../../src/plot/footer.js';
import { startPage } from '../../src/plot/header.js';
import { parseSvg } from './helpers.js';

describe('finishPage', () => {
  const note = Array.from({ length: 20 }, () => 'abcdefghi').join(' '); // 199 characters
  const { page } = startPage('Invented figure');
  const svg = finishPage(page, [note, 'short note'], 300);
  const doc = parseSvg(svg);
  const caution = [...doc.querySelectorAll('g.caution text')].map((t) => t.textContent ?? '');

  it('ends with the standing caution, whole, in lines that fill the page greedily', () => {
    expect(caution.join(' ')).toBe(CAUTION);
    // 8 px type at 0.5 em a character over 612 px: 153 characters a line, no line could take the next word.
    for (const [i, line] of caution.entries()) {
      expect(line.length).toBeLessThanOrEqual(153);
      const next = caution[i + 1]?.split(' ')[0];
      if (next !== undefined) expect(`${line} ${next}`.length).toBeGreaterThan(153);
    }
  });

  it('puts the notes above the rule and makes the page as tall as a hand layout of its lines', () => {
    // Notes: 8.5 px type, 144 characters a line: the long note takes 2 lines (14 words, 6), the short one 1.
    const notes = [...doc.querySelectorAll('g.notes text')];
    expect(notes.map((t) => t.textContent?.split(' ').length)).toEqual([14, 6, 2]);
    expect(notes.map((t) => Number(t.getAttribute('y')))).toEqual([
      300 + 11.5 - 2,
      300 + 23 - 2,
      300 + 34.5 - 2,
    ]);
    const ruleY = 300 + 3 * 11.5 + 6;
    const rule = doc.querySelector('g.caution line')!;
    expect([rule.getAttribute('x1'), rule.getAttribute('x2')]).toEqual(['14', '626']);
    expect(Number(rule.getAttribute('y1'))).toBe(ruleY);
    // Under the rule: 6 px, the caution's lines of 8 + 3 px, 6 px; rounded up to a whole pixel.
    const heightPx = Math.ceil(ruleY + 6 + caution.length * 11 + 6);
    expect(doc.documentElement.getAttribute('height')).toBe(String(heightPx));
    expect(doc.documentElement.getAttribute('viewBox')).toBe(`0 0 640 ${heightPx}`);
    expect(page.background.getAttribute('height')).toBe(String(heightPx));
    for (const t of doc.querySelectorAll('text')) expect(Number(t.getAttribute('y'))).toBeLessThan(heightPx);
  });

  it('keeps the root attributes in their place when it sets the height', () => {
    expect(svg).toMatch(
      /<svg xmlns="http:\/\/www.w3.org\/2000\/svg" width="640" height="\d+" viewBox="0 0 640 \d+"/,
    );
  });
});

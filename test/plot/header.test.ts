import { describe, expect, it } from 'vitest';
import { startPage } from '../../src/plot/header.js';
import { parseSvg } from './helpers.js';

/** `count` words of nine letters: a line of k of them is 10k − 1 characters long. */
const words = (count: number) => Array.from({ length: count }, () => 'abcdefghi').join(' ');

describe('startPage', () => {
  it('wraps the subtitle to the page and ends where a hand layout of its lines ends', () => {
    // The page is 640 px, 14 px margins: 612 px of text. Subtitles are 10 px at 0.5 em a
    // character, 122 characters a line: 12 words (119 characters), so 30 words make 12 + 12 + 6.
    const { page, bottom } = startPage('Invented figure', ['one line', words(30)]);
    // 10 px from the top, 13 + 4 px for the title line, 10 + 3 px for each of the 4 subtitle lines.
    expect(bottom).toBe(10 + 17 + 4 * 13);
    const doc = parseSvg(page.doc.serialize());
    const subtitles = [...doc.querySelectorAll('text.subtitle')];
    expect(subtitles.map((t) => t.textContent?.split(' ').length)).toEqual([2, 12, 12, 6]);
    // Baselines: the title at 10 + 15, then each subtitle 13 px lower, 1 px above its line's foot.
    expect(Number(doc.querySelector('text.title')?.getAttribute('y'))).toBe(25);
    expect(subtitles.map((t) => Number(t.getAttribute('y')))).toEqual([39, 52, 65, 78]);
    for (const t of subtitles) expect(t.getAttribute('x')).toBe('14');
  });

  it('wraps a long title in bold lines of at most 94 characters (13 px type)', () => {
    // 612 px / 6.5 px a character = 94 characters: 9 words (89 characters) a line, 30 words → 9, 9, 9, 3.
    const { page, bottom } = startPage(words(30));
    const titles = [...parseSvg(page.doc.serialize()).querySelectorAll('text.title')];
    expect(titles.map((t) => t.textContent?.split(' ').length)).toEqual([9, 9, 9, 3]);
    for (const t of titles) expect(t.getAttribute('font-weight')).toBe('bold');
    expect(bottom).toBe(10 + 4 * 17);
  });

  it('names the page in its title element, on a white background the width of the page', () => {
    const { page } = startPage('Pump <P-7> & "co" (invented)');
    const svg = page.doc.serialize();
    expect(svg).toContain('Pump &lt;P-7&gt; &amp; "co" (invented)');
    const doc = parseSvg(svg);
    expect(doc.querySelector('title')?.textContent).toBe('Pump <P-7> & "co" (invented)');
    expect(doc.documentElement.getAttribute('width')).toBe('640');
    expect(page.background.getAttribute('fill')).toBe('#ffffff');
    expect(page.background.getAttribute('width')).toBe('640');
  });
});

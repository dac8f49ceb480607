import { describe, expect, it } from 'vitest';
import { CAUTION, cautionLines, wrapText } from '../../src/base/caution.js';

describe('the standing caution', () => {
  it('says the results are preliminary and must be reviewed by a licensed engineer', () => {
    expect(CAUTION.startsWith('Preliminary engineering aid only.')).toBe(true);
    expect(CAUTION).toContain('licensed structural engineer');
    expect(CAUTION).not.toMatch(/\s{2}/);
  });

  it('wraps into lines of at most the width asked that join back to the caution', () => {
    for (const width of [96, 60, 30]) {
      const lines = cautionLines(width);
      expect(lines.join(' ')).toBe(CAUTION);
      for (const line of lines) expect(line.length).toBeLessThanOrEqual(width);
      // Greedy wrapping: the next line's first word would not have fitted on this one.
      for (let i = 0; i + 1 < lines.length; i++) {
        expect(lines[i].length + 1 + lines[i + 1].split(' ')[0].length).toBeGreaterThan(width);
      }
    }
    expect(cautionLines()).toEqual(cautionLines(96));
  });

  it('keeps a word longer than the width whole, on a line of its own', () => {
    const lines = cautionLines(5);
    expect(lines.join(' ')).toBe(CAUTION);
    expect(lines).toContain('Preliminary');
  });
});

describe('wrapText', () => {
  it('wraps greedily at the width, the first line after its prefix, the rest after theirs', () => {
    const lines = wrapText('one two three four five six', 14, 'Note: ', '      ');
    expect(lines).toEqual(['Note: one two', '      three', '      four', '      five six']);
    for (const line of lines) expect(line.length).toBeLessThanOrEqual(14);
  });

  it('keeps a word longer than the width whole, and one short text on one line', () => {
    expect(wrapText('a extraordinarily b', 6)).toEqual(['a', 'extraordinarily', 'b']);
    expect(wrapText('short', 80, '- ', '  ')).toEqual(['- short']);
  });
});

import { describe, expect, it } from 'vitest';
import { wrapText } from '../../src/formats/wrap.js';

describe('wrapText', () => {
  it('wraps greedily at the width, the first line after its prefix, the rest after theirs', () => {
    const lines = wrapText('one two three four five six', 14, 'Note: ', '      ');
    expect(lines).toEqual(['Note: one two', '      three', '      four', '      five six']);
    for (const line of lines) expect(line.length).toBeLessThanOrEqual(14);
  });

  it('keeps a word longer than the width whole, and one short text on one line', () => {
    expect(wrapText('a extraordinarily b', 6, '', '')).toEqual(['a', 'extraordinarily', 'b']);
    expect(wrapText('short', 80, '- ', '  ')).toEqual(['- short']);
  });
});

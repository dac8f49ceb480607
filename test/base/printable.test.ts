/**
 * Names reach terminals (ECMA-48 control sequences: CSI `ESC [`, OSC `ESC ]`, C1 controls) and XML
 * (XML 1.0 §2.2 Char: no C0 controls but tab, LF and CR, no lone surrogates, no U+FFFE/U+FFFF).
 * The names below are invented.
 */
import { describe, expect, it } from 'vitest';
import { printable } from '../../src/base/printable.js';

describe('printable', () => {
  it.each([
    ['site\u001b[31mred\u001b[0m', 'sitered'],
    ['a\u001b]0;new title\u0007b', 'ab'],
    ['a\u001b]8;;http://example.invalid\u001b\\link\u001b]8;;\u001b\\', 'alink'],
    ['a\u009b2Jb', 'ab'],
    ['bell\u0007 nul\u0000 del\u007f', 'bell nul del'],
    ['lone \ud800 surrogate \udc00', 'lone  surrogate '],
    ['\ufffe\uffff', ''],
    ['tab\tand\nbreak\r', 'tab and break '],
  ])('cleans %j', (text, clean) => {
    expect(printable(text)).toBe(clean);
  });

  it('keeps letters of every script and pairs of surrogates', () => {
    for (const text of ['Marrowby Flats H1', 'é ü ß', '東西', '😀 🏗', 'a-b_c (1) [2] #3'])
      expect(printable(text)).toBe(text);
  });
});

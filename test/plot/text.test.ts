import { describe, expect, it } from 'vitest';
import { wrapText } from '../../src/plot/text.js';

describe('wrapText', () => {
  it('breaks at spaces and keeps every word', () => {
    const text = 'one two three four five six seven';
    const lines = wrapText(text, 50, 10);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe(text);
  });
});

import { describe, expect, it } from 'vitest';
import { wrapText, zeroPeriodNotes } from '../../src/plot/text.js';

describe('wrapText', () => {
  it('breaks at spaces and keeps every word', () => {
    const text = 'one two three four five six seven';
    const lines = wrapText(text, 50, 10);
    expect(lines.length).toBeGreaterThan(1);
    expect(lines.join(' ')).toBe(text);
  });
});

describe('zeroPeriodNotes', () => {
  it('says T = 0 is left off a log period axis, or a frequency axis (f = ∞), with its value', () => {
    const periods = [0, 0.1, 1];
    expect(zeroPeriodNotes(periods, ' (there PSA = 0.3 g)')).toEqual([
      'T = 0 s is in the period grid but cannot be drawn on a logarithmic axis; it is left off (there PSA = 0.3 g).',
    ]);
    expect(zeroPeriodNotes(periods, (zero) => ` (index ${zero})`, 'frequency')).toEqual([
      'T = 0 s (f = ∞) is in the period grid but cannot be drawn on a frequency axis; it is left off (index 0).',
    ]);
    expect(zeroPeriodNotes([0.1, 1], '', 'frequency')).toEqual([]);
  });
});

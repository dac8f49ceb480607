import { describe, expect, it } from 'vitest';
import { processingLines, wrapText, zeroPeriodNotes } from '../../src/plot/text.js';

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

describe('processingLines', () => {
  it('says how the record was read, each step applied and each warning, each on its own label', () => {
    const steps = [
      { operation: 'read', description: 'as read: Δt 0.01 s from the header' },
      { operation: 'taper', description: 'cosine taper, 5% at each end' },
      { operation: 'warning', description: 'warning: PGA 9 g is above 5 g' },
    ];
    expect(processingLines(steps, 'Processed: nothing (as read)')).toEqual([
      'Read: Δt 0.01 s from the header',
      'Processed: cosine taper, 5% at each end',
      'Warning: PGA 9 g is above 5 g',
    ]);
    // Read but not processed: the `none` line follows the reading.
    expect(processingLines(steps.slice(0, 1), 'Processed: nothing (as read)')).toEqual([
      'Read: Δt 0.01 s from the header',
      'Processed: nothing (as read)',
    ]);
    expect(processingLines([], 'none')).toEqual(['none']);
  });
});

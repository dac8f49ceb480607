import { describe, expect, it } from 'vitest';
import { readingStep, readingWarnings, warningStep } from '../../src/record/reading.js';

describe('the reading step', () => {
  it('states where the step and the unit came from, the layout and the header', () => {
    const step = readingStep({
      dtS: 0.01,
      dtFrom: '--dt',
      units: 'g',
      unitsFrom: 'the header (line 2)',
      layout: 'wrapped',
      headerLines: 3,
      headerPoints: 12,
      overrides: ['--dt 0.01 s overrides the header (line 2), which says 0.02 s'],
    });
    expect(step.operation).toBe('read');
    expect(step.description).toBe(
      'as read: Δt 0.01 s from --dt; values in g from the header (line 2); --dt 0.01 s overrides the header (line 2), which says 0.02 s; wrapped layout after 3 header lines; 12 points, as the header states',
    );
    expect(Object.values(step.parameters)).not.toContain(null); // no nulls in outputs
  });

  it('keeps warnings as steps of their own, found again from the record', () => {
    const record = {
      processing: [warningStep('PGA is odd'), { operation: 'baseline', description: '', parameters: {} }],
    };
    expect(readingWarnings(record)).toEqual(['PGA is odd']);
    expect(record.processing[0].description).toBe('warning: PGA is odd');
  });
});

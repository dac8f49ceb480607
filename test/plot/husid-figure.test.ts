import { describe, expect, it } from 'vitest';
import { EVERY_FIGURE, parseSvg } from './helpers.js';

describe('husidFigure', () => {
  it('marks 5, 75 and 95% at their times', () => {
    const doc = parseSvg(EVERY_FIGURE.husid().svg);
    const levels = [...doc.querySelectorAll('g.level')].map((g) => Number(g.getAttribute('data-level')));
    expect(levels).toEqual([0.05, 0.75, 0.95]);
  });
});

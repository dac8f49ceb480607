import { describe, expect, it } from 'vitest';
import { EVERY_FIGURE, parseSvg } from './helpers.js';

describe('floorFigure', () => {
  it('marks the building period', () => {
    const doc = parseSvg(EVERY_FIGURE.floor().svg);
    expect(doc.querySelector('g.building-period')?.getAttribute('data-period-s')).toBe('0.5');
    const legend = doc.querySelector('g.legend')?.textContent ?? '';
    expect(legend).toContain('floor, broadened');
    expect(legend).toContain('not broadened');
    expect(legend).toContain('ground');
  });
});

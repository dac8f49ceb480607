import { describe, expect, it } from 'vitest';
import { textWidthPx } from '../../src/plot/ticks.js';
import { axisFromTicks, EVERY_FIGURE, parseSvg } from './helpers.js';

describe('husidFigure', () => {
  it('marks 5, 75 and 95% at their times', () => {
    const doc = parseSvg(EVERY_FIGURE.husid().svg);
    const levels = [...doc.querySelectorAll('g.level')].map((g) => Number(g.getAttribute('data-level')));
    expect(levels).toEqual([0.05, 0.75, 0.95]);
  });

  it("keeps each level label off the other levels' lines, and headroom above 1", () => {
    const doc = parseSvg(EVERY_FIGURE.husid().svg);
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const frameTop = Number(doc.querySelector('rect.frame')?.getAttribute('y'));
    expect(y(1)).toBeGreaterThan(frameTop + 5); // the curve ends at 1, below the frame
    const marks = [...doc.querySelectorAll('g.level')];
    const verticals = marks.map((g) => {
      const d = g.querySelector('path')?.getAttribute('d') ?? '';
      return Number(/H([-\d.]+)/.exec(d)?.[1]);
    });
    marks.forEach((g, i) => {
      const t = g.querySelector('text') as Element;
      const left =
        Number(t.getAttribute('x')) -
        (t.getAttribute('text-anchor') === 'end' ? textWidthPx(t.textContent ?? '', 9) : 0);
      const right = left + textWidthPx(t.textContent ?? '', 9);
      const ty = Number(t.getAttribute('y'));
      verticals.forEach((vx, j) => {
        // Another level's vertical line runs from its level down: it must not pass through this label.
        const vTop = Number(marks[j].getAttribute('data-level'));
        if (j === i || !(vx > left && vx < right)) return;
        expect(ty + 2).toBeLessThan(y(vTop)); // clear only above where that line starts
      });
    });
  });
});

import { describe, expect, it } from 'vitest';
import { clearLabelSpot, segmentMeetsBox, spotsBesideMark } from '../../src/plot/label-spot.js';
import type { PanelContext } from '../../src/plot/panel.js';

/** A panel 100 × 100 px at (0, 0) with linear axes 0…100 in both directions (y downward), invented. */
function context(series: { x: number[]; y: number[] }[]): PanelContext {
  return {
    spec: {
      heightPx: 100,
      x: { title: 'x', scale: 'linear' },
      y: { title: 'y', scale: 'linear' },
      series: series.map((s, i) => ({ label: `s${i}`, ...s })),
    },
    x: (v: number) => v,
    y: (v: number) => v,
    plot: { left: 0, top: 0, width: 100, height: 100 },
  } as unknown as PanelContext;
}

describe('segmentMeetsBox', () => {
  it('finds segments through, into and past a box (by hand)', () => {
    const box: [number, number, number, number] = [10, 10, 20, 20];
    expect(segmentMeetsBox([0, 15, 30, 15], box)).toBe(true); // straight through
    expect(segmentMeetsBox([15, 15, 40, 40], box)).toBe(true); // starts inside
    expect(segmentMeetsBox([0, 0, 30, 5], box)).toBe(false); // passes above
    expect(segmentMeetsBox([0, 30, 30, 0], box)).toBe(true); // the diagonal crosses it
    expect(segmentMeetsBox([0, 40, 40, 20], box)).toBe(false); // passes below the corner
  });
});

describe('clearLabelSpot', () => {
  it('moves a mark label down when a curve runs across the top, and keeps the top when it is free', () => {
    const size = { widthPx: 30, heightPx: 10 };
    const free = clearLabelSpot(context([]), spotsBesideMark(context([]), 50, 12), size);
    expect(free).toEqual({ x: 54, y: 14, anchor: 'start' });
    // A flat curve at y = 12 px fills the top line on both sides of the mark.
    const busy = context([{ x: [0, 100], y: [12, 12] }]);
    const moved = clearLabelSpot(busy, spotsBesideMark(busy, 50, 12), size);
    expect(moved.y).toBeGreaterThan(12 + 2 + 8);
  });
  it('takes the left side of the mark when a curve fills the right', () => {
    const size = { widthPx: 30, heightPx: 10 };
    const right = context([
      { x: [50, 100], y: [0, 100] },
      { x: [52, 100], y: [100, 0] },
    ]);
    const spot = clearLabelSpot(right, spotsBesideMark(right, 50, 12), size);
    expect(spot.anchor).toBe('end');
  });
});

import { describe, expect, it } from 'vitest';
import { axisTicks, drawable, layoutPanel, makeScale } from '../../src/plot/layout.js';
import { seriesStyle } from '../../src/plot/styles.js';

describe('layoutPanel', () => {
  it('a log y axis spans the drawable points widened to 1-2-5 values; points ≤ 0 are left out', () => {
    // Drawable on log–log: (0.1, 0.13) and (1, 3.7); (0, 7) and (5, −1) cannot sit on a log axis.
    // y: 0.13 → 0.1 below, 3.7 → 5 above (the 1-2-5 values around them, common practice).
    const layout = layoutPanel({
      heightPx: 200,
      x: { title: 'x' },
      y: { title: 'y' },
      series: [{ label: 'a', x: [0, 0.1, 1, 5], y: [7, 0.13, 3.7, -1] }],
    });
    expect(layout.xDomain).toEqual([0.1, 1]);
    expect(layout.yDomain).toEqual([0.1, 5]);
  });

  it('a reciprocal x axis spans 1/x of the drawable points, ascending; x = 0 (f = ∞) is left out', () => {
    // Periods 0, 0.02, 0.5 and 4 s: T = 0 cannot be drawn at f = ∞; the others are 50, 2 and 0.25 Hz (by hand).
    const layout = layoutPanel({
      heightPx: 200,
      x: { title: 'f', reciprocal: true },
      y: { title: 'y' },
      series: [{ label: 'a', x: [0, 0.02, 0.5, 4], y: [9, 0.3, 0.7, 0.2] }],
    });
    expect(layout.xDomain).toEqual([0.02, 4]);
    expect(layout.xAxisDomain).toEqual([0.25, 50]);
    expect(layout.toXAxis(0.5)).toBe(2);
    // y = 9 belongs to T = 0, which is not drawn: the y axis spans 0.2 to 0.7 → 0.2 to 1 (1-2-5 values).
    expect(layout.yDomain).toEqual([0.2, 1]);
    const plain = layoutPanel({ heightPx: 200, x: { title: 'T' }, y: { title: 'y' }, series: [] });
    expect(plain.xAxisDomain).toBe(plain.xDomain);
    expect(plain.toXAxis(0.5)).toBe(0.5);
  });

  it('a linear y axis starts at 0 with 4% headroom, or is symmetric with 8%, then rounded to whole steps', () => {
    // 7.3 × 1.04 = 7.59 → 8 with steps of 1; ±2.3 × 1.08 = ±2.48 → ±2.5 with steps of 0.5 (d3's 1-2-5 rule).
    const linear = (y: number[], symmetric: boolean) =>
      layoutPanel({
        heightPx: 200,
        x: { title: 'x', scale: 'linear' },
        y: { title: 'y', scale: 'linear', symmetric },
        series: [{ label: 'a', x: y.map((_, i) => i), y }],
      });
    expect(linear([0.2, 7.3], false).yDomain).toEqual([0, 8]);
    const symmetric = linear([-2.3, 1, 0.5], true);
    expect(symmetric.yDomain).toEqual([-2.5, 2.5]);
    // 200 px / 50 px = 4 steps wanted: −2 … 2 by 1; the widest label "−2" is 2 × 0.6 em of 10 px.
    expect(symmetric.yTicks.labels.map((l) => l.value)).toEqual([2, 1, 0, -1, -2]);
    expect(symmetric.yLabelWidthPx).toBeCloseTo(12, 9);
  });

  it('a log y axis keeps headroom above the highest curve: a 1 g plateau is not drawn on the frame', () => {
    // 1.0 × 1.1 = 1.1 → 1.5; 1.8 × 1.1 = 1.98 → 2; 8.7 × 1.1 = 9.57 → 10 (1, 1.5, 2, 3, 5, 7 × 10ᵏ).
    const top = (high: number) =>
      layoutPanel({
        heightPx: 200,
        x: { title: 'T' },
        y: { title: 'PSA' },
        series: [{ label: 'a', x: [0.1, 1], y: [0.2, high] }],
      }).yDomain[1];
    expect(top(1)).toBe(1.5);
    expect(top(1.8)).toBe(2);
    expect(top(8.7)).toBe(10);
    expect(top(0.5)).toBe(0.7);
  });

  it('a fixed domain is kept; no data gives a default decade', () => {
    const fixed = layoutPanel({
      heightPx: 100,
      x: { title: 'x', domain: [0.5, 20] },
      y: { title: 'y', domain: [3, 4] },
      series: [],
    });
    expect(fixed.xDomain).toEqual([0.5, 20]);
    expect(fixed.yDomain).toEqual([3, 4]);
    const empty = layoutPanel({ heightPx: 100, x: { title: 'x' }, y: { title: 'y' }, series: [] });
    expect(empty.xDomain).toEqual([0.1, 1]);
  });

  it('each series takes the next data style unless it sets its own, part by part', () => {
    const layout = layoutPanel({
      heightPx: 100,
      x: { title: 'x' },
      y: { title: 'y' },
      series: [
        { label: 'a', x: [1, 2], y: [1, 2] },
        { label: 'b', x: [1, 2], y: [1, 2], style: { widthPx: 3 } },
      ],
    });
    expect(layout.series[0].style).toEqual(seriesStyle(0));
    expect(layout.series[1].style).toEqual({ ...seriesStyle(1), widthPx: 3 });
  });
});

describe('drawable and makeScale', () => {
  it('only finite points, and positive ones on a log axis, can be drawn', () => {
    expect(drawable(1, 1, 'log', 'log')).toBe(true);
    expect(drawable(0, 1, 'log', 'linear')).toBe(false);
    expect(drawable(0, -1, 'linear', 'linear')).toBe(true);
    expect(drawable(1, Number.NaN, 'linear', 'linear')).toBe(false);
    expect(drawable(1, -1, 'linear', 'log')).toBe(false);
  });

  it('a log scale puts each decade the same distance apart, a linear one each unit', () => {
    const log = makeScale('log', [0.01, 10], [0, 300]);
    expect(log(0.1) - log(0.01)).toBeCloseTo(100, 9);
    expect(log(10) - log(1)).toBeCloseTo(100, 9);
    const linear = makeScale('linear', [0, 4], [200, 0]);
    expect(linear(1)).toBeCloseTo(150, 9);
  });
});

describe('axisTicks', () => {
  it('a log axis has majors at the decades and minors at 2…9 × 10ᵏ (common practice)', () => {
    const ticks = axisTicks('log', [0.01, 10], 500, 'x');
    expect(ticks.major).toEqual([0.01, 0.1, 1, 10]);
    expect(ticks.minor).toHaveLength(3 * 8);
  });

  // From 120 px up (the shortest panel is 126 px high); below that a linear axis may hold no fewer
  // labels than d3's 1-2-5 rule gives for two steps, and those can touch.
  it('no two labels of an axis come within 4 px on any axis a figure draws (property)', () => {
    for (const lengthPx of [120, 150, 260, 480]) {
      for (const [kind, domain] of [
        ['log', [1e-4, 1e4]],
        ['log', [0.3, 2]],
        ['linear', [-123.4, 5678]],
        ['linear', [0, 0.07]],
      ] as const) {
        for (const axis of ['x', 'y'] as const) {
          const ticks = axisTicks(kind, domain, lengthPx, axis);
          const scale = makeScale(kind, domain, [0, lengthPx]);
          // x labels take 0.6 em a character, y labels 1.3 em of height; 10 px type.
          const spans = ticks.labels
            .map(({ value, text }) => {
              const half = (axis === 'x' ? text.length * 6 : 13) / 2;
              return [scale(value) - half, scale(value) + half];
            })
            .sort((a, b) => a[0] - b[0]);
          for (let i = 1; i < spans.length; i++)
            expect(spans[i][0]).toBeGreaterThanOrEqual(spans[i - 1][1] + 4 - 1e-9);
          expect(ticks.labels.length).toBeGreaterThan(0);
        }
      }
    }
  });
});

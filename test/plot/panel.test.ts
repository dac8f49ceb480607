import { describe, expect, it } from 'vitest';
import { decimatedIndices } from '../../src/plot/panel.js';

describe('decimatedIndices', () => {
  it('keeps the first, lowest, highest and last point of each pixel column, in order (common practice)', () => {
    // 1000 samples of a sine over 10 columns: each column holds 100 samples.
    const values = Float64Array.from({ length: 1000 }, (_, i) => Math.sin(i / 7) + (i === 537 ? 5 : 0));
    const kept = decimatedIndices(
      1000,
      (i) => i / 100,
      (i) => values[i],
      () => true,
    );
    expect(kept.length).toBeLessThanOrEqual(40);
    expect(kept).toEqual([...kept].sort((a, b) => a - b));
    expect(kept).toContain(537); // the spike survives
    for (let column = 0; column < 10; column++) {
      const slice = Array.from(values.subarray(column * 100, column * 100 + 100));
      const inColumn = kept.filter((i) => Math.floor(i / 100) === column).map((i) => values[i]);
      expect(Math.max(...inColumn)).toBe(Math.max(...slice));
      expect(Math.min(...inColumn)).toBe(Math.min(...slice));
      expect(kept).toContain(column * 100);
      expect(kept).toContain(column * 100 + 99);
    }
  });
});

import { describe, expect, it } from 'vitest';
import { suiteStatistics } from '../../src/batch/statistics.js';

const e = Math.E;

describe('suite statistics (log-normal fit, sample standard deviation with n − 1)', () => {
  it('gives exp(m), exp(m ∓ s) for ln PSA = 0, 1, 2 (closed form: m = 1, s = 1)', () => {
    const records = [
      { name: 'c', psaG: [[e * e]] },
      { name: 'a', psaG: [[1]] },
      { name: 'b', psaG: [[e]] },
    ];
    const [curve] = suiteStatistics(records, [0.05], 1);
    expect(curve.mean_psa_g[0]).toBeCloseTo((1 + e + e * e) / 3, 14);
    expect(curve.median_psa_g[0]).toBeCloseTo(e, 14);
    expect(curve.p16_psa_g[0]).toBeCloseTo(1, 14);
    expect(curve.p84_psa_g[0]).toBeCloseTo(e * e, 13);
  });

  it('is the same to the last digit whatever order the records come in', () => {
    const records = Array.from({ length: 7 }, (_, i) => ({
      name: `r${i}`,
      psaG: [[0.1 + i * 0.137, 1 / (i + 1.3)]],
    }));
    const one = suiteStatistics(records, [0.05, 0.1].slice(0, 1), 2);
    const two = suiteStatistics([...records].reverse(), [0.05], 2);
    expect(JSON.stringify(two)).toBe(JSON.stringify(one));
  });

  it('leaves the log statistics undefined at a zero PSA, and the spread with one record', () => {
    const [zero] = suiteStatistics(
      [
        { name: 'a', psaG: [[0]] },
        { name: 'b', psaG: [[1]] },
      ],
      [0.05],
      1,
    );
    expect(zero.median_psa_g[0]).toBeNull();
    expect(zero.mean_psa_g[0]).toBe(0.5);
    const [single] = suiteStatistics([{ name: 'a', psaG: [[0.4]] }], [0.05], 1);
    expect(single.median_psa_g[0]).toBeCloseTo(0.4, 15);
    expect(single.p16_psa_g[0]).toBeNull();
  });
});

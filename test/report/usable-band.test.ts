import { describe, expect, it } from 'vitest';
import { USABLE_BAND_RULE, usableBand, usableBandText } from '../../src/report/usable-band.js';

const filter = (low: number | null, high: number | null) => ({
  operation: 'filter',
  parameters: { kind: 'bandpass', order: 4, low_corner_hz: low, high_corner_hz: high },
});

describe('usableBand', () => {
  it('band-pass 0.1–25 Hz: 1/25 = 0.04 s to 0.8/0.1 = 8 s (common practice, stated in the rule)', () => {
    const band = usableBand([{ operation: 'taper', parameters: {} }, filter(0.1, 25)]);
    expect(band?.fromS).toBeCloseTo(0.04, 12);
    expect(band?.toS).toBeCloseTo(8, 12);
    expect(usableBandText(band as NonNullable<typeof band>)).toBe('0.04–8 s');
    expect(USABLE_BAND_RULE).toMatch(/0\.8\/f_hp = 1\/\(1\.25 f_hp\)/);
  });
  it('a high-pass alone bounds the long periods only; a resampling anti-alias bounds the short ones', () => {
    const highPass = usableBand([filter(0.05, null)]);
    expect(highPass).toEqual({ fromS: null, toS: 16 }); // 0.8/0.05 s (hand)
    expect(usableBandText(highPass as NonNullable<typeof highPass>)).toBe('up to 16 s');
    const resampled = usableBand([
      filter(0.05, null),
      { operation: 'resample', parameters: { anti_alias_hz: 20 } },
    ]);
    expect(resampled).toEqual({ fromS: 0.05, toS: 16 }); // 1/20 s (hand)
  });
  it('nothing filtered: no band', () => {
    expect(usableBand([])).toBeNull();
    expect(usableBand([{ operation: 'baseline', parameters: { order: 1 } }])).toBeNull();
  });
});

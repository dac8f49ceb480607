import { describe, expect, it } from 'vitest';
import {
  type Biquad,
  butterworthSections,
  filterSections,
  zeroPhaseFilter,
} from '../../src/record/filter.js';

const dtS = 0.005; // 200 samples/s, Nyquist 100 Hz

/** |H(e^{iω})| of the cascade, one pass: each section's numerator over its denominator at z = e^{iω}, ω = 2πfΔt. */
function sectionsResponse(sections: readonly Biquad[], frequencyHz: number) {
  const w = 2 * Math.PI * frequencyHz * dtS;
  let magnitude = 1;
  for (const { b0, b1, b2, a1, a2 } of sections) {
    const numerator = Math.hypot(
      b0 + b1 * Math.cos(w) + b2 * Math.cos(2 * w),
      b1 * Math.sin(w) + b2 * Math.sin(2 * w),
    );
    const denominator = Math.hypot(
      1 + a1 * Math.cos(w) + a2 * Math.cos(2 * w),
      a1 * Math.sin(w) + a2 * Math.sin(2 * w),
    );
    magnitude *= numerator / denominator;
  }
  return { magnitude };
}

/** Butterworth (1930): |H(f)| = 1/√(1 + (f/f_c)^{2n}) of the analog prototype, one pass. */
const analog = (f: number, fc: number, n: number, kind: 'lowpass' | 'highpass') =>
  1 / Math.sqrt(1 + (kind === 'lowpass' ? f / fc : fc / f) ** (2 * n));

/** Oppenheim and Schafer §7.2.2: the bilinear transform with prewarping maps Ω = tan(πfΔt)/tan(πf_cΔt). */
const warped = (f: number, fc: number, n: number, kind: 'lowpass' | 'highpass') => {
  const omega = Math.tan(Math.PI * f * dtS) / Math.tan(Math.PI * fc * dtS);
  return 1 / Math.sqrt(1 + (kind === 'lowpass' ? omega : 1 / omega) ** (2 * n));
};

describe('butterworthSections (bilinear transform with prewarping)', () => {
  for (const kind of ['lowpass', 'highpass'] as const) {
    for (const order of [1, 2, 3, 4, 7]) {
      it(`${kind} order ${order}: the digital magnitude is the prewarped Butterworth magnitude (closed form)`, () => {
        const fc = kind === 'lowpass' ? 10 : 0.2;
        const sections = butterworthSections(kind, order, fc, dtS);
        expect(sections.length).toBe(Math.ceil(order / 2));
        for (const f of [0.01, 0.05, 0.1, 0.2, 0.5, 1, 5, 10, 20, 50, 90]) {
          expect(sectionsResponse(sections, f).magnitude).toBeCloseTo(warped(f, fc, order, kind), 10);
        }
        // −3 dB (1/√2) at the corner, one pass.
        expect(sectionsResponse(sections, fc).magnitude).toBeCloseTo(Math.SQRT1_2, 10);
      });
    }
  }

  it('matches the analog prototype well below the Nyquist frequency (Butterworth 1930)', () => {
    const sections = butterworthSections('lowpass', 4, 2, dtS);
    for (const f of [0.5, 1, 2, 3, 4]) {
      const digital = sectionsResponse(sections, f).magnitude;
      expect(Math.abs(digital - analog(f, 2, 4, 'lowpass'))).toBeLessThan(2e-3);
    }
  });
});

describe('zeroPhaseFilter (forward and backward)', () => {
  /** A long sine and its filtered version, compared in the middle where the ends' transients are gone. */
  function throughFilter(frequencyHz: number, spec: Parameters<typeof zeroPhaseFilter>[2]) {
    const n = 24000; // 120 s
    const input = Float64Array.from({ length: n }, (_, i) =>
      Math.sin(2 * Math.PI * frequencyHz * i * dtS + 0.3),
    );
    return { input, output: zeroPhaseFilter(input, dtS, spec), middle: [8000, 16000] as const };
  }

  for (const [label, spec, fc] of [
    ['high-pass 0.5 Hz order 4', { kind: 'highpass', order: 4, lowCornerHz: 0.5 }, 0.5],
    ['low-pass 5 Hz order 4', { kind: 'lowpass', order: 4, highCornerHz: 5 }, 5],
    ['low-pass 5 Hz order 3', { kind: 'lowpass', order: 3, highCornerHz: 5 }, 5],
  ] as const) {
    it(`${label}: −6 dB at the corner with zero phase (|H|² after two passes; Butterworth 1930)`, () => {
      const { input, output, middle } = throughFilter(fc, spec);
      for (let i = middle[0]; i < middle[1]; i++) expect(output[i]).toBeCloseTo(0.5 * input[i], 4);
    });
  }

  it('passes a sine far inside the pass band unchanged and in phase', () => {
    const { input, output, middle } = throughFilter(2, {
      kind: 'bandpass',
      order: 4,
      lowCornerHz: 0.1,
      highCornerHz: 25,
    });
    const expected = analog(2, 0.1, 4, 'highpass') ** 2 * warped(2, 25, 4, 'lowpass') ** 2;
    for (let i = middle[0]; i < middle[1]; i++) expect(output[i]).toBeCloseTo(expected * input[i], 5);
  });

  it('a sine at twice the low-pass corner falls by 1/(1 + Ω^{2n}) (closed form of |H|²)', () => {
    const { input, output, middle } = throughFilter(10, { kind: 'lowpass', order: 2, highCornerHz: 5 });
    const gain = warped(10, 5, 2, 'lowpass') ** 2;
    for (let i = middle[0]; i < middle[1]; i++) expect(output[i]).toBeCloseTo(gain * input[i], 4);
  });

  it('keeps the length and time base of the record', () => {
    const input = new Float64Array(1000).fill(1);
    expect(zeroPhaseFilter(input, dtS, { kind: 'highpass', order: 2, lowCornerHz: 1 }).length).toBe(1000);
  });
});

describe('filterSections refuses what would be silently wrong', () => {
  it('a corner at or above the Nyquist frequency', () => {
    expect(() => filterSections({ kind: 'lowpass', order: 4, highCornerHz: 100 }, dtS)).toThrow(/Nyquist/);
    expect(() => filterSections({ kind: 'highpass', order: 4, lowCornerHz: 150 }, dtS)).toThrow(/Nyquist/);
  });
  it('a non-positive or fractional order', () => {
    expect(() => filterSections({ kind: 'lowpass', order: 0, highCornerHz: 5 }, dtS)).toThrow(/order/);
    expect(() => filterSections({ kind: 'lowpass', order: 2.5, highCornerHz: 5 }, dtS)).toThrow(/order/);
  });
  it('a band with low ≥ high', () => {
    expect(() =>
      filterSections({ kind: 'bandpass', order: 4, lowCornerHz: 5, highCornerHz: 5 }, dtS),
    ).toThrow(/below its high corner/);
  });
  it('a missing or non-positive corner', () => {
    expect(() => filterSections({ kind: 'highpass', order: 4 }, dtS)).toThrow(/positive frequency/);
    expect(() => filterSections({ kind: 'highpass', order: 4, lowCornerHz: -1 }, dtS)).toThrow(
      /positive frequency/,
    );
  });
});

describe('corners the record can resolve', () => {
  // A corner below a tenth of 1/duration cannot act on the record, and its zero pads grow past a
  // hundred record lengths (highpass:2e-6 on a 40 s record once asked for 4.7 GB).
  it('refuses a high-pass far below 1/duration, in one line, and takes one at a tenth of it', () => {
    const values = new Float64Array(4001).map((_, i) => Math.sin(i / 10)); // invented: 40 s at 0.01 s
    expect(() => zeroPhaseFilter(values, 0.01, { kind: 'highpass', order: 4, lowCornerHz: 2e-6 })).toThrow(
      /^the high-pass corner 0\.000002 Hz is below 0\.0025 Hz, a tenth of 1\/duration of this 40 s record/,
    );
    expect(zeroPhaseFilter(values, 0.01, { kind: 'highpass', order: 4, lowCornerHz: 0.0025 }).length).toBe(
      4001,
    );
  });
});

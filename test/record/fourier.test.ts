import { describe, expect, it } from 'vitest';
import {
  fourierAmplitudeSpectrum,
  konnoOhmachiSmooth,
  konnoOhmachiWeight,
} from '../../src/record/fourier.js';

describe('fourierAmplitudeSpectrum (DFT × Δt; Brigham 1988 §6.1)', () => {
  it('recovers the amplitudes of a sum of on-bin sines (closed form: |A(f_k)| = A_k·T/2)', () => {
    const n = 4096;
    const dtS = 0.01;
    const durationS = n * dtS;
    const components = [
      { bin: 41, amplitude: 1.5, phase: 0.2 },
      { bin: 200, amplitude: 0.4, phase: 1.1 },
      { bin: 1000, amplitude: 0.05, phase: -0.7 },
    ];
    const values = Float64Array.from({ length: n }, (_, j) =>
      components.reduce((sum, c) => sum + c.amplitude * Math.sin((2 * Math.PI * c.bin * j) / n + c.phase), 0),
    );
    const { frequenciesHz, amplitudeMS, transformLength } = fourierAmplitudeSpectrum(values, dtS);
    expect(transformLength).toBe(n);
    for (const c of components) {
      expect(frequenciesHz[c.bin]).toBeCloseTo(c.bin / durationS, 12);
      expect((2 * amplitudeMS[c.bin]) / durationS).toBeCloseTo(c.amplitude, 10);
    }
    // Every other line is empty (no leakage for on-bin sines).
    for (let k = 0; k < amplitudeMS.length; k++) {
      if (!components.some((c) => c.bin === k)) expect(amplitudeMS[k]).toBeLessThan(1e-9);
    }
  });

  it('the zero-frequency line is the area under the record (closed form: A(0) = ∫a dt)', () => {
    const values = new Float64Array(1000).fill(2); // padded to 1024
    const { amplitudeMS, transformLength } = fourierAmplitudeSpectrum(values, 0.02);
    expect(transformLength).toBe(1024);
    expect(amplitudeMS[0]).toBeCloseTo(2 * 1000 * 0.02, 10);
  });
});

describe('Konno–Ohmachi window (Konno and Ohmachi 1998, eq. 4)', () => {
  it('equals 1 at the centre', () => {
    for (const fc of [0.1, 1, 7.3]) expect(konnoOhmachiWeight(fc, fc, 40)).toBe(1);
  });

  it('is symmetric in log frequency: W(r·f_c) = W(f_c/r)', () => {
    for (const r of [1.001, 1.01, 1.05, 1.2, 2]) {
      expect(konnoOhmachiWeight(3 * r, 3, 40)).toBeCloseTo(konnoOhmachiWeight(3 / r, 3, 40), 14);
    }
  });

  it('has its first zero where b·log10(f/f_c) = π (closed form)', () => {
    const f = 2 * 10 ** (Math.PI / 40);
    expect(konnoOhmachiWeight(f, 2, 40)).toBeLessThan(1e-25);
    expect(konnoOhmachiWeight(2 * 10 ** (Math.PI / 80), 2, 40)).toBeCloseTo((2 / Math.PI) ** 4, 12);
  });

  it('smoothing leaves a constant spectrum constant and flattens a spike (normalised weights)', () => {
    const frequenciesHz = Float64Array.from({ length: 2049 }, (_, k) => k * 0.05);
    const flat = new Float64Array(2049).fill(3);
    const smoothedFlat = konnoOhmachiSmooth(frequenciesHz, flat, { bandwidth: 40 });
    for (const value of smoothedFlat) expect(value).toBeCloseTo(3, 12);
    const spike = new Float64Array(2049);
    spike[1000] = 1;
    const smoothed = konnoOhmachiSmooth(frequenciesHz, spike, { centresHz: Float64Array.from([50]) });
    expect(smoothed[0]).toBeGreaterThan(0);
    expect(smoothed[0]).toBeLessThan(0.1);
  });
});

import { describe, expect, it } from 'vitest';
import { fourierFigure } from '../../src/plot/fourier-figure.js';
import { fourierAmplitudeSpectrum } from '../../src/record/fourier.js';
import { axisFromTicks, parseSvg, pathVertices } from './helpers.js';

// A sine of amplitude A = 2 m/s² at f₀ = 20/(N·Δt): exactly 20 cycles in N = 1024 samples of
// Δt = 0.01 s, so its transform is one line, |A(f₀)| = A·N·Δt/2 = 10.24 m/s (the DFT of a whole
// number of cycles, Brigham 1988, §6.1), and nothing elsewhere.
const dtS = 0.01;
const n = 1024;
const f0 = 20 / (n * dtS);
const accelMS2 = Float64Array.from({ length: n }, (_, i) => 2 * Math.sin(2 * Math.PI * f0 * i * dtS));
const fas = fourierAmplitudeSpectrum(accelMS2, dtS);
const peakMS = (2 * n * dtS) / 2;

function frameOf(doc: Document) {
  const frame = doc.querySelector('rect.frame')!;
  const [x, y, width, height] = ['x', 'y', 'width', 'height'].map((a) => Number(frame.getAttribute(a)));
  return { left: x, right: x + width, top: y, bottom: y + height };
}

describe('fourierFigure', () => {
  const doc = parseSvg(
    fourierFigure({
      name: 'invented <sine>',
      frequenciesHz: fas.frequenciesHz,
      amplitudeMS: fas.amplitudeMS,
    }),
  );
  const x = axisFromTicks(doc, 0, 'x', 'log');
  const y = axisFromTicks(doc, 0, 'y', 'log');
  const frame = frameOf(doc);

  it('the amplitude axis runs from the 1-2-5 value under 10⁻⁵ of the peak to the one over 1.2 × the peak', () => {
    expect(Math.max(...fas.amplitudeMS)).toBeCloseTo(peakMS, 9);
    // 1.2 × 10.24 = 12.3 → 20 at the top; 10.24 × 10⁻⁵ = 1.02 × 10⁻⁴ → 10⁻⁴ at the bottom.
    expect(y(20)).toBeCloseTo(frame.top, 1);
    expect(y(1e-4)).toBeCloseTo(frame.bottom, 1);
  });

  it('the frequency axis runs from the first line above 0, 1/(N·Δt), to the Nyquist frequency 1/(2Δt)', () => {
    expect(x(1 / (n * dtS))).toBeCloseTo(frame.left, 1);
    expect(x(1 / (2 * dtS))).toBeCloseTo(frame.right, 1);
  });

  it('draws the spectral line at f₀ and its amplitude exactly, thinned to the pixel columns', () => {
    const vertices = pathVertices(doc.querySelector('path.curve')?.getAttribute('d') ?? '');
    expect(vertices.length).toBeLessThan(fas.frequenciesHz.length);
    const top = vertices.reduce((best, v) => (v[1] < best[1] ? v : best));
    expect(top[0]).toBeCloseTo(x(f0), 1);
    expect(top[1]).toBeCloseTo(y(peakMS), 1);
  });

  it('states what was done to the record, and that nothing was', () => {
    const header = doc.querySelector('g.header')?.textContent ?? '';
    expect(header).toContain('Record: invented <sine>');
    expect(header).toContain('Processed: nothing (as read)');
    expect(doc.querySelector('g.notes')?.textContent).toContain('5 decades below the largest');
  });

  it('adds the smoothed curve over the raw one, with its label in the legend, and the method line', () => {
    const smoothed = parseSvg(
      fourierFigure({
        name: 'invented',
        source: 'invented.csv',
        frequenciesHz: fas.frequenciesHz,
        amplitudeMS: fas.amplitudeMS,
        smoothedHz: fas.frequenciesHz.slice(1),
        smoothedMS: fas.amplitudeMS.slice(1),
        smoothingLabel: 'Konno–Ohmachi 1998, b = 40',
        methodDescription: 'FFT of the record padded to 1024 samples',
        processing: [{ description: 'baseline removed' }],
      }),
    );
    expect(smoothed.querySelectorAll('path.curve')).toHaveLength(2);
    expect(smoothed.querySelector('g.legend')?.textContent).toContain(
      'smoothed (Konno–Ohmachi 1998, b = 40)',
    );
    const header = smoothed.querySelector('g.header')?.textContent ?? '';
    expect(header).toContain('Record: invented (invented.csv)');
    expect(header).toContain('Processed: baseline removed');
    expect(header).toContain('Method: FFT of the record padded to 1024 samples');
    expect(doc.querySelectorAll('path.curve')).toHaveLength(1);
  });
});

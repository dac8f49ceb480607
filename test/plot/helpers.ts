import { JSDOM } from 'jsdom';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import type { Spectrum } from '../../src/spectrum/spectrum.js';

/** Parse SVG text as XML; jsdom's XML parser throws on anything that is not well formed. */
export function parseSvg(text: string): Document {
  return new JSDOM(text, { contentType: 'image/svg+xml' }).window.document;
}

/**
 * The pixel mapping of one axis, read back from the figure's own labelled ticks (their data-value
 * and position), so the checks do not reuse the code under test.
 */
export function axisFromTicks(
  doc: Document,
  panel: number,
  axis: 'x' | 'y',
  scale: 'log' | 'linear',
): (value: number) => number {
  const group = doc.querySelector(`g.panel[data-panel="${panel}"] g.${axis}-ticks`);
  const ticks = [...(group?.querySelectorAll('text') ?? [])].map((t) => ({
    value: Number(t.getAttribute('data-value')),
    px: Number(t.getAttribute(axis)),
  }));
  if (ticks.length < 2) throw new Error(`fewer than 2 labelled ${axis} ticks`);
  const a = ticks[0];
  const b = ticks[ticks.length - 1];
  // The y label sits 0.35 em below its tick; both labels carry the same offset, so the slope is exact.
  const offset = axis === 'y' ? Number(group?.closest('g.tick-labels')?.getAttribute('font-size')) * 0.35 : 0;
  const f = scale === 'log' ? Math.log10 : (v: number) => v;
  return (value) => a.px - offset + ((f(value) - f(a.value)) / (f(b.value) - f(a.value))) * (b.px - a.px);
}

/** The vertices of an SVG path made of M and L commands. */
export function pathVertices(d: string): [number, number][] {
  return [...d.matchAll(/[ML]\s*(-?[\d.]+)[ ,](-?[\d.]+)/g)].map((m) => [Number(m[1]), Number(m[2])]);
}

/**
 * A spectrum built by hand: SD(T) = c·T² at short periods, as for a rigid-ish range, with the pseudo
 * quantities from their definitions PSV = ωSD, PSA = ω²SD (Chopra, Dynamics of Structures, §6.6).
 */
export function handSpectrum(name = 'invented test record'): Spectrum {
  const periodsS = Float64Array.from([0, 0.05, 0.1, 0.2, 0.5, 1, 2, 4]);
  const dampings = [0.02, 0.05, 0.1];
  const curves = dampings.map((damping, d) => {
    const sdM = periodsS.map((t) => (0.02 * t * t) / (1 + t * t) / (1 + 2 * d));
    const psvMS = sdM.map((sd, i) => (periodsS[i] === 0 ? 0 : ((2 * Math.PI) / periodsS[i]) * sd));
    const psaMS2 = sdM.map((sd, i) =>
      periodsS[i] === 0 ? 0.3 * STANDARD_GRAVITY_MS2 : ((2 * Math.PI) / periodsS[i]) ** 2 * sd,
    );
    return { damping, sdM, psvMS, psaMS2, svMS: psvMS, saMS2: psaMS2 };
  });
  return {
    record: {
      name,
      source: 'hand-made',
      npts: 1000,
      dtS: 0.01,
      pgaMS2: 0.3 * STANDARD_GRAVITY_MS2,
      processing: [],
    },
    method: 'newmark-average',
    periodsS,
    curves,
    oscillatorSteps: 0,
  };
}

import { COEFFICIENT as C } from '../layout.js';
import { hermiteFold } from '../peak.js';

/**
 * The TypeScript kernel: the fallback where WebAssembly SIMD does not run, and the oracle of the
 * SIMD kernel (assembly/sweep.ts). It steps one oscillator (`row`: its packed coefficients,
 * layout.ts) from rest with `substeps` steps of `stepS` per sample interval over the record's
 * linear interpolation, and writes its peaks |u|, |v| and |s| (s = −(c·v + k·u), the absolute
 * acceleration) to peaks[at..at + 2]. The record is stepped twice with the same arithmetic: pass
 * 1 finds the sample peaks P; pass 2 folds into P the cubic Hermite peak inside every step whose
 * new end passes P·r − d (refinementThresholds, peak.ts), below which no step holds a higher peak.
 */
export function referencePeaks(
  accelMS2: Float64Array,
  substeps: number,
  stepS: number,
  row: Float64Array,
  peaks: Float64Array,
  at: number,
): void {
  const uu = row[C.uu];
  const uv = row[C.uv];
  const up0 = row[C.up0];
  const up1 = row[C.up1];
  const vu = row[C.vu];
  const vv = row[C.vv];
  const vp0 = row[C.vp0];
  const vp1 = row[C.vp1];
  const c = row[C.c];
  const k = row[C.k];
  const total = (accelMS2.length - 1) * substeps;
  const fraction = 1 / substeps;
  const h = stepS;
  let peakU = 0;
  let peakV = 0;
  let peakS = 0;
  let limitU = Infinity;
  let limitV = Infinity;
  let limitS = Infinity;
  for (let pass = 1; pass <= 2; pass++) {
    let u = 0;
    let v = 0;
    let sample = 0;
    let w = 0;
    let pa = accelMS2[0];
    for (let n = 0; n < total; n++) {
      if (++w === substeps) {
        w = 0;
        sample++;
      }
      const a = accelMS2[sample];
      const pb = w === 0 ? a : a + (accelMS2[sample + 1] - a) * (w * fraction);
      const uo = u;
      const vo = v;
      u = uu * uo + uv * vo + up0 * pa + up1 * pb;
      v = vu * uo + vv * vo + vp0 * pa + vp1 * pb;
      const s = -(c * v + k * u);
      peakU = Math.max(peakU, Math.abs(u));
      peakV = Math.max(peakV, Math.abs(v));
      peakS = Math.max(peakS, Math.abs(s));
      if (Math.abs(u) > limitU) peakU = hermiteFold(peakU, uo, u, vo, v, h);
      if (Math.abs(v) > limitV) {
        const so = -(c * vo + k * uo);
        peakV = hermiteFold(peakV, vo, v, so - pa, s - pb, h);
      }
      if (Math.abs(s) > limitS) {
        const so = -(c * vo + k * uo);
        peakS = hermiteFold(peakS, so, s, -c * (so - pa) - k * vo, -c * (s - pb) - k * v, h);
      }
      pa = pb;
    }
    limitU = peakU * row[C.ratio] - row[C.du];
    limitV = peakV * row[C.ratio] - row[C.dv];
    limitS = peakS * row[C.ratio] - row[C.ds];
  }
  peaks[at] = peakU;
  peaks[at + 1] = peakV;
  peaks[at + 2] = peakS;
}

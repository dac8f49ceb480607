import { it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { createRecord } from '../../src/record/record.js';
import { floorSpectrum } from '../../src/spectrum/floor.js';
import { broadbandFamily, sineRecord } from './families.js';
it('s', () => {
  const recs = [...broadbandFamily(0.01, [71, 72], [2.5, 8]), sineRecord(3.5, 0.02, { rampS: 2, durationS: 6 })];
  const buildings = [
    { periodS: 0.08, damping: 0.05, modalFactor: 1.4 },
    { periodS: 0.37, damping: 0.02, modalFactor: 1.6 },
    { periodS: 1.3, damping: 0.05, modalFactor: 1.3 },
  ];
  const coarse = Array.from(logSpaced(0.02, 5, 12));
  const dampings = [0.01, 0.05];
  let worst = 0; let worstHigh = 0; let time = 0;
  for (const r of recs) for (const building of buildings) {
    const ground = createRecord({ name: 'x', dtS: r.dtS, accelMS2: r.accelMS2 });
    const t0 = performance.now();
    const res = floorSpectrum(ground, building, { periodsS: coarse, dampings }, 0.15);
    time += performance.now() - t0;
    coarse.forEach((t, p) => {
      const window = Array.from(logSpaced(t * 0.85, t / 0.85, 400));
      const dense = floorSpectrum(ground, building, { periodsS: window, dampings }).spectrum;
      dense.curves.forEach((curve, d) => {
        for (const key of ['psaMS2', 'svMS', 'saMS2'] as const) {
          const truth = Math.max(...curve[key]);
          const e = res.spectrum.curves[d][key][p] / truth - 1;
          if (e < worst) { worst = e; console.log('low', r.label, building.periodS, t, curve.damping, key, e); }
          if (e > worstHigh) { worstHigh = e; }
        }
      });
    });
    console.log(r.label, building.periodS, res.dense);
  }
  console.log('worst low', worst, 'worst high', worstHigh, 'ms per broadened spectrum', time / 12);
}, 1200000);

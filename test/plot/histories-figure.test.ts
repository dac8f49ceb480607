import { describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { STANDARD_GRAVITY_MS2 } from '../../src/base/units.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { createRecord } from '../../src/record/record.js';
import { axisFromTicks, parseSvg, pathVertices } from './helpers.js';

describe('time histories', () => {
  it('marks the peaks of acceleration, velocity and displacement of a known motion', () => {
    // a = A sin ωt from rest: v = A(1 − cos ωt)/ω, u = A(t − sin ωt / ω)/ω (closed form).
    const dtS = 0.005;
    const omega = 2 * Math.PI;
    const amplitude = 0.5 * STANDARD_GRAVITY_MS2;
    const n = 801;
    const accelMS2 = Float64Array.from({ length: n }, (_, i) => amplitude * Math.sin(omega * i * dtS));
    // The histories are given by the caller, integrated by the shared rule (src/record/integrate.ts).
    const doc = parseSvg(
      historiesFigure({ name: 'invented <sine> & "test"', dtS, ...integrateRecord({ accelMS2, dtS }) }),
    );
    const peaks = [...doc.querySelectorAll('g.peak')].map((g) => Number(g.getAttribute('data-value')));
    expect(peaks).toHaveLength(3);
    expect(peaks[0]).toBeCloseTo(0.5, 3);
    expect(peaks[1]).toBeCloseTo((2 * amplitude) / omega, 3);
    const tEnd = (n - 1) * dtS;
    expect(peaks[2]).toBeCloseTo((amplitude * tEnd) / omega, 2);
    expect(doc.querySelectorAll('path.history')).toHaveLength(3);
    expect([...doc.querySelectorAll('g.caution text')].map((t) => t.textContent).join(' ')).toBe(CAUTION);
    expect(doc.querySelector('g.header')?.textContent).toContain('invented <sine> & "test"');
    expect(doc.querySelector('g.header')?.textContent).toContain('trapezoidal');
    // Only the bottom panel carries time labels.
    expect(doc.querySelectorAll('g.x-ticks')).toHaveLength(1);
  });

  it('a 40,000-sample record draws under 200 kB and keeps its peak exactly', () => {
    const n = 40000;
    const accelMS2 = Float64Array.from({ length: n }, (_, i) => Math.sin(i / 9) * (i === 23456 ? 3 : 1));
    const record = createRecord({ name: 'invented long record', dtS: 0.005, accelMS2 });
    const svg = historiesFigure({ ...record, ...integrateRecord(record) });
    expect(svg.length).toBeLessThan(200_000);
    const doc = parseSvg(svg);
    const peak = Number(doc.querySelector('g.peak')?.getAttribute('data-value'));
    expect(peak).toBeCloseTo((3 * Math.sin(23456 / 9)) / STANDARD_GRAVITY_MS2, 12);
    // The drawn acceleration path reaches the pixel of the peak (axis read back from the ticks).
    const y = axisFromTicks(doc, 0, 'y', 'linear');
    const ys = pathVertices(doc.querySelector('path.history')?.getAttribute('d') ?? '').map(([, py]) => py);
    const extreme = peak > 0 ? Math.min(...ys) : Math.max(...ys);
    expect(extreme).toBeCloseTo(y(peak), 1);
    expect(doc.querySelector('g.notes')?.textContent).toContain('pixel column');
  });
});

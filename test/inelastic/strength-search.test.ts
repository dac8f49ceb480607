import { describe, expect, it } from 'vitest';
import {
  DUCTILITY_TOLERANCE,
  SCAN_RATIO,
  STRENGTH_RESOLUTION,
  strengthCell,
  strengthsForDuctilities,
} from '../../src/inelastic/strength-search.js';
import { yieldingPeak } from '../../src/inelastic/yielding.js';
import { recordRoughness } from '../../src/oscillator/record-statistics.js';
import { testRecord } from '../helpers/records.js';

describe('the strength search', () => {
  const record = testRecord(47, 0.01, 15);
  const roughness = recordRoughness(record.accelMS2);
  const targets = [1, 1.5, 2, 4, 6, 8];

  it.each([0.1, 0.4, 1.2, 3])(
    'finds strengths whose ductility is the target, or a jump across it (T = %s s)',
    (periodS) => {
      const cell = strengthCell(periodS, 0.05, { kind: 'elastoplastic' }, record.dtS, roughness);
      const found = strengthsForDuctilities(record.accelMS2, record.dtS, cell, targets);
      targets.forEach((target, d) => {
        const strength = found.strengthRatio[d];
        expect(strength).toBeLessThanOrEqual(1);
        // Rerun the oscillator at the reported strength: it has the reported peak.
        const run = (ratio: number) =>
          yieldingPeak(record.accelMS2, record.dtS, {
            periodS,
            damping: 0.05,
            model: { kind: 'elastoplastic' },
            yieldDisplacementM: ratio * found.elasticPeakM,
            substeps: cell.substeps,
          });
        if (target === 1) {
          expect(strength).toBe(1);
          return;
        }
        const again = run(strength);
        expect(again.ductility).toBeCloseTo(found.achieved[d], 10);
        expect(again.peakDisplacementM).toBeCloseTo(found.peakM[d], 12);
        if (Math.abs(found.achieved[d] / target - 1) > DUCTILITY_TOLERANCE) {
          // A jump: just below the reported strength the ductility passes the target.
          expect(found.achieved[d]).toBeLessThan(target);
          expect(run(strength / (1 + 1.01 * STRENGTH_RESOLUTION)).ductility).toBeGreaterThanOrEqual(target);
        }
        // The largest strength: no scan grid point above it reaches the target (to the tolerance).
        for (let k = 1; SCAN_RATIO ** k > strength * (1 + 1e-12); k++) {
          expect(run(SCAN_RATIO ** k).ductility).toBeLessThan(target * (1 - DUCTILITY_TOLERANCE));
        }
      });
      expect(found.runs).toBeGreaterThan(targets.length);
    },
  );
});

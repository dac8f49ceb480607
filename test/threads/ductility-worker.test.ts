import { describe, expect, it } from 'vitest';
import { demandCellLength, ductilityCellLength } from '../../src/inelastic/cells.js';
import {
  assembleDemandSpectra,
  assembleDuctilitySpectra,
  constantDuctilitySpectra,
  ductilityDemandSpectra,
  planDemandSpectra,
  planDuctilitySpectra,
} from '../../src/inelastic/ductility.js';
import { synthesizeRecord } from '../../src/record/synth.js';
import type { DuctilityJob } from '../../src/threads/ductility-job.js';
import { shared, ThreadTeam, workerScript } from '../../src/threads/team.js';

// The worker script of DuctilityPool (dist/, and its CLI bundle in dist/cli/workers/, both built
// by the global setup), sent both kinds of job by a team whose own thread takes no share: the
// worker alone must compute every cell, as one thread computes them (the same bits; common
// practice for a deterministic parallel computation without sums across threads).
const record = synthesizeRecord({ seed: 19, dtS: 0.01, durationS: 2.99 }); // invented, 300 samples
const model = { kind: 'elastoplastic' } as const;
const grid = { periodsS: [0.08, 0.4, 2], dampings: [0.05], model };

/** One shared 32-bit integer. */
function shared32(value: number): Int32Array {
  const array = new Int32Array(new SharedArrayBuffer(4));
  array[0] = value;
  return array;
}

/** A job of every cell of `work`, claimed from the last cell down. */
function job(work: Pick<DuctilityJob, 'kind' | 'plan'>, length: number): DuctilityJob {
  const cells = work.plan.periodsS.length * work.plan.dampings.length;
  const order = new Int32Array(new SharedArrayBuffer(4 * cells));
  order.set(Array.from({ length: cells }, (_, cell) => cells - 1 - cell)); // any order will do
  return {
    ...work,
    accelMS2: shared(record.accelMS2),
    dtS: record.dtS,
    order,
    counter: shared32(0),
    failed: shared32(cells),
    results: shared(new Float64Array(cells * length)),
  } as DuctilityJob;
}

describe.each([
  ['dist/threads/ductility-worker.js', workerScript('ductility-worker.js')],
  ['the CLI bundle’s worker', new URL('../../dist/cli/workers/ductility-worker.cjs', import.meta.url)],
])('the ductility worker (%s)', (_, script) => {
  it('computes every cell of both kinds of job alone, with the single-thread bits', async () => {
    const team = new ThreadTeam(2, script);
    try {
      const options = { ...grid, ductilities: [1, 3, 6] };
      const plan = planDuctilitySpectra(record, options);
      const spectra = job({ kind: 'ductility', plan }, ductilityCellLength(plan));
      await team.run(spectra, () => {});
      expect(assembleDuctilitySpectra(record, plan, spectra.results)).toEqual(
        constantDuctilitySpectra(record, options),
      );
      const demandOptions = { ...grid, ayG: [0.05, 0.2] };
      const demandPlan = planDemandSpectra(record, demandOptions);
      const demand = job({ kind: 'demand', plan: demandPlan }, demandCellLength(demandPlan));
      await team.run(demand, () => {});
      expect(assembleDemandSpectra(record, demandPlan, demand.results)).toEqual(
        ductilityDemandSpectra(record, demandOptions),
      );
      expect(demand.failed[0]).toBe(3);
    } finally {
      await team.close();
    }
  });
});

/** Small invented inputs for the CLI and output tests, written into a fresh temporary folder. */
import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';

export interface Fixtures {
  dir: string;
  /** Two-column CSV in g, 6 s at 0.01 s (an invented decaying two-sine motion). */
  h1: string;
  /** The second horizontal component, same step. */
  h2: string;
  /** One value a line (needs --dt 0.01). */
  single: string;
  /** Equipment at grade (rigid), SI. */
  equipment: string;
  /** A two-column design table: period (s), PSA (g). */
  table: string;
  empty: string;
}

export function writeFixtures(prefix = 'quakesweep-hardening-'): Fixtures {
  const dir = mkdtempSync(join(tmpdir(), prefix));
  const motion = (phase: number) =>
    Array.from({ length: 600 }, (_, i) => {
      const t = i * 0.01;
      return (
        Math.exp(-t / 2) *
        (0.3 * Math.sin(2 * Math.PI * 1.5 * t + phase) + 0.1 * Math.sin(2 * Math.PI * 7 * t))
      );
    });
  const csv = (values: number[]) =>
    `time_s,accel_g\n${values.map((v, i) => `${(i * 0.01).toFixed(2)},${v.toFixed(6)}`).join('\n')}\n`;
  const f: Fixtures = {
    dir,
    h1: join(dir, 'h1.csv'),
    h2: join(dir, 'h2.csv'),
    single: join(dir, 'single.txt'),
    equipment: join(dir, 'equipment.json'),
    table: join(dir, 'table.csv'),
    empty: join(dir, 'empty.txt'),
  };
  writeFileSync(f.h1, csv(motion(0)));
  writeFileSync(f.h2, csv(motion(1)));
  writeFileSync(
    f.single,
    `${motion(0.5)
      .map((v) => v.toFixed(6))
      .join('\n')}\n`,
  );
  writeFileSync(
    f.equipment,
    JSON.stringify({
      name: 'Pump P-7 (invented)',
      units: 'SI',
      weight: 12,
      cg_height: 0.8,
      anchors: [
        [-0.4, -0.3],
        [0.4, -0.3],
        [0.4, 0.3],
        [-0.4, 0.3],
      ],
      period_s: 0.1,
      damping: 0.05,
      z: 0,
      h: 10,
      ap: 1,
      rp: 2.5,
      ip: 1,
      sds: 1,
      omega0: null,
    }),
  );
  writeFileSync(f.table, 'period_s,psa_g\n0,0.4\n0.2,1.0\n0.6,1.0\n2,0.3\n4,0.15\n');
  writeFileSync(f.empty, '');
  return f;
}

import { mkdtempSync, rmSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join, resolve } from 'node:path';
import { afterAll, describe, expect, it } from 'vitest';
import { expectOneLineFailure, runMainIn } from '../../helpers/run-cli.js';

const root = resolve(import.meta.dirname, '../../..');
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-report-'));
afterAll(() => rmSync(folder, { recursive: true, force: true }));

describe('quakesweep report', () => {
  it('refuses an output folder whose parent does not exist, in one line, exit 2', async () => {
    const record = join(root, 'records', 'marrowby-h1.csv');
    const result = await runMainIn(folder, ['report', record, '--units', 'g', '--out', 'no/such/dir']);
    expect(expectOneLineFailure(result)).toMatch(/parent folder does not exist/);
  });

  it('refuses --model without --ductility and a ductility below 1, in one line, exit 2', async () => {
    const record = join(root, 'records', 'marrowby-h1.csv');
    const base = ['report', record, '--units', 'g', '--out', 'out'];
    const model = await runMainIn(folder, [...base, '--model', 'bilinear:0.05']);
    expect(expectOneLineFailure(model)).toMatch(/--model and --ductility-periods apply with --ductility/);
    const low = await runMainIn(folder, [...base, '--ductility', '0.8,2']);
    expect(expectOneLineFailure(low)).toMatch(/--ductility: 0.8 is below 1/);
  });
});

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
});

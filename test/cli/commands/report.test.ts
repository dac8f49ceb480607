import { mkdtempSync, readFileSync, rmSync } from 'node:fs';
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

  it('takes --project, --prepared-by and --checked-by into the title block', async () => {
    const record = join(root, 'records', 'marrowby-h1.csv');
    const names = ['--project', 'Invented yard', '--prepared-by', 'A. Person', '--checked-by', 'B. Person'];
    const grid = ['--periods', '0,0.1,1', '--damping', '5%'];
    const result = await runMainIn(folder, [
      'report',
      record,
      '--units',
      'g',
      ...grid,
      ...names,
      '--out',
      'titled',
    ]);
    expect(result.code).toBe(0);
    const html = readFileSync(join(folder, 'titled', 'report.html'), 'utf8');
    const block = html.slice(html.indexOf('<table class="title-block">'), html.indexOf('</table>'));
    for (const name of ['Invented yard', 'A. Person', 'B. Person'])
      expect(block).toContain(`<td>${name}</td>`);
  });
});

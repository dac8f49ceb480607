import { spawnSync } from 'node:child_process';
import { mkdtempSync, readdirSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { fileURLToPath } from 'node:url';
import { describe, expect, it } from 'vitest';
import { createSvgDocument, formatCoordinate } from '../../src/plot/svg.js';
import { BIN } from '../helpers/run-cli.js';
import { parseSvg } from './helpers.js';

const RECORD = fileURLToPath(new URL('../../records/marrowby-h1.csv', import.meta.url));

describe('createSvgDocument', () => {
  it('escapes text and attribute values through the DOM (XML 1.0 §2.4) and rounds coordinates to 0.01', () => {
    const doc = createSvgDocument(100, 50);
    doc.text(doc.root, 'a <b> & "c"', { x: 1.23456, 'data-value': 1.23456, class: 'x"y' });
    const text = doc.serialize();
    expect(text.startsWith('<?xml version="1.0" encoding="UTF-8"?>\n')).toBe(true);
    const node = parseSvg(text).querySelector('text');
    expect(node?.textContent).toBe('a <b> & "c"');
    expect(node?.getAttribute('x')).toBe('1.23');
    expect(node?.getAttribute('data-value')).toBe('1.23456');
    expect(node?.getAttribute('class')).toBe('x"y');
    expect(formatCoordinate(2.5)).toBe('2.5');
  });
});

describe('jsdom is loaded only when a figure is drawn', () => {
  // A preload that records whether the CLI bundle asked for jsdom by the end of the run.
  const dir = mkdtempSync(join(tmpdir(), 'quakesweep-svg-'));
  const preload = join(dir, 'watch-jsdom.cjs');
  writeFileSync(
    preload,
    `const Module = require('node:module');
const load = Module._load;
let asked = false;
Module._load = function (request, ...rest) { if (request === 'jsdom') asked = true; return load.call(this, request, ...rest); };
process.on('exit', () => process.stderr.write('jsdom: ' + asked + '\\n'));
`,
  );
  const run = (...argv: string[]) =>
    spawnSync(process.execPath, ['--require', preload, BIN, 'spectrum', RECORD, '--units', 'g', ...argv], {
      encoding: 'utf8',
    });

  it('a spectrum run without --svg does not load it', () => {
    const result = run();
    expect(result.status).toBe(0);
    expect(result.stderr).toContain('jsdom: false');
  });

  it('a spectrum run with --svg loads it and writes the figures', () => {
    const out = mkdtempSync(join(dir, 'figures-'));
    const result = run('--svg', out);
    expect(result.status).toBe(0);
    expect(result.stderr).toContain('jsdom: true');
    expect(readdirSync(out).sort()).toEqual(['psa.svg', 'psv.svg', 'sd.svg', 'tripartite.svg']);
  });
});

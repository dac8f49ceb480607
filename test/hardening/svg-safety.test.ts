/**
 * Anything from a file or an option is escaped in the SVG figures (the project's rule; OWASP's
 * output-encoding practice): records named with script payloads, via --name and via the file
 * name, with a header holding `]]>` and quotes, are drawn by `spectrum --svg` and `info --svg`;
 * the figures open in headless Chromium without running anything, and the name shows as text.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium, openInert, PAYLOADS } from './browser-safety.js';
import { writeFixtures } from './fixtures.js';
import { runMain } from './run-cli.js';

const f = writeFixtures();
let browser: Browser;
beforeAll(async () => {
  browser = await launchChromium();
});
afterAll(async () => {
  await browser?.close();
  rmSync(f.dir, { recursive: true, force: true });
});

/** The record with a hostile header: `]]>`, quotes and markup in comment and name rows. */
function hostileRecord(path: string): void {
  const body = readFileSync(f.h1, 'utf8').split('\n').slice(1).join('\n');
  writeFileSync(path, `# ]]> "double" 'single' <b>bold</b> &amp;\ntime]]>"s",accel'g'<x>\n${body}`);
}

async function figuresOf(argv: string[], folder: string): Promise<string[]> {
  mkdirSync(folder, { recursive: true });
  const result = await runMain([...argv, '--svg', folder]);
  if (result.code !== 0) throw new Error(result.stderr);
  return readdirSync(folder)
    .filter((name) => name.endsWith('.svg'))
    .map((name) => join(folder, name));
}

describe('hostile names and headers in SVG figures', () => {
  PAYLOADS.forEach((payload, i) => {
    it(`--name ${JSON.stringify(payload)}: nothing runs, the name is text`, async () => {
      const file = join(f.dir, `hostile-${i}.csv`);
      hostileRecord(file);
      const figures = [
        ...(await figuresOf(
          ['spectrum', file, '--units', 'g', '--name', payload, '--periods', '0,0.1,0.5,2', '--histories'],
          join(f.dir, `spectrum-${i}`),
        )),
        ...(await figuresOf(['info', file, '--units', 'g', '--name', payload], join(f.dir, `info-${i}`))),
      ];
      expect(figures.length).toBeGreaterThanOrEqual(6);
      for (const figure of figures) {
        const seen = await openInert(browser, figure);
        expect(seen.dialogs, figure).toEqual([]);
        expect(seen.flagSet, figure).toBe(false);
        expect(seen.text, figure).toContain(payload);
      }
    });
  });

  it('a file named like markup: nothing runs, the name is text', async () => {
    // A file name cannot hold '/', so the payload here is the one without a closing tag.
    const name = '<img src=x onerror="window.__quakesweepPayloadRan=1;alert(1)">';
    const file = join(f.dir, `${name}.csv`);
    hostileRecord(file);
    for (const figure of await figuresOf(
      ['spectrum', file, '--units', 'g', '--periods', '0,0.1,0.5,2'],
      join(f.dir, 'by-file-name'),
    )) {
      const seen = await openInert(browser, figure);
      expect(seen.dialogs).toEqual([]);
      expect(seen.flagSet).toBe(false);
      expect(seen.text).toContain(name);
    }
  });

  it('the HTML report: hostile names and headers run nothing and show as text', async () => {
    for (const [i, payload] of PAYLOADS.entries()) {
      const file = join(f.dir, `report-${i}.csv`);
      hostileRecord(file);
      const folder = join(f.dir, `report-${i}`);
      const result = await runMain([
        'report',
        file,
        '--units',
        'g',
        '--name',
        payload,
        '--note',
        payload,
        '--periods',
        '0,0.1,0.5,2',
        '--out',
        folder,
      ]);
      expect(result.code, result.stderr).toBe(0);
      const seen = await openInert(browser, join(folder, 'report.html'));
      expect(seen.dialogs).toEqual([]);
      expect(seen.flagSet).toBe(false);
      expect(seen.text).toContain(payload);
    }
  });

  it('the checker itself notices a payload that is not escaped (so it can fail)', async () => {
    const seen = await openInert(browser, {
      type: 'svg',
      markup: `<svg xmlns="http://www.w3.org/2000/svg"><script>window.__quakesweepPayloadRan=1</script></svg>`,
    });
    expect(seen.flagSet).toBe(true);
  });
});

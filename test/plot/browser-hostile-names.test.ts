/**
 * Anything from a file or an option is escaped in the SVG figures and the HTML report (the
 * project's rule; OWASP's output-encoding practice). Records named with script payloads, via
 * --name and via the file name, with a header holding `]]>` and quotes, are drawn by
 * `spectrum --svg`, `info --svg` and `report`; every output is then opened as a frame of one page
 * in headless Chromium, which must run nothing while showing each name as text. A control frame
 * holding an unescaped payload proves on the same page that the check sees script that runs.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, Frame, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { launchChromium } from '../helpers/chromium.js';
import { writeFixtures } from '../helpers/fixtures.js';
import { runMain } from '../helpers/run-cli.js';

const FLAG = '__quakesweepPayloadRan';
/** Names that would run script if they reached the markup unescaped. */
const PAYLOADS = [
  `<script>window.${FLAG}=1;alert(1)</script>`,
  `<img src=x onerror="window.${FLAG}=1;alert(1)">`,
  `]]><script>window.${FLAG}=1</script><![CDATA[`,
  `"' onload="window.${FLAG}=1" x='`,
];
/** A file name cannot hold '/', so the payload in a file name is the one without a closing tag. */
const FILE_NAME = PAYLOADS[1];
const PERIODS = ['--periods', '0,0.1,0.5,2'];

const f = writeFixtures('quakesweep-hostile-');
let browser: Browser;
let page: Page;
const dialogs: string[] = [];
/** Output files of each case, by case name. */
const outputs = new Map<string, string[]>();

/** The record with a hostile header: `]]>`, quotes and markup in comment and name rows. */
function hostileRecord(path: string): string {
  const body = readFileSync(f.h1, 'utf8').split('\n').slice(1).join('\n');
  writeFileSync(path, `# ]]> "double" 'single' <b>bold</b> &amp;\ntime]]>"s",accel'g'<x>\n${body}`);
  return path;
}

async function run(argv: string[]): Promise<void> {
  const result = await runMain(argv);
  if (result.code !== 0) throw new Error(result.stderr);
}

async function figuresOf(argv: string[], folder: string): Promise<string[]> {
  mkdirSync(folder, { recursive: true });
  await run([...argv, '--svg', folder]);
  return readdirSync(folder)
    .filter((name) => name.endsWith('.svg'))
    .map((name) => join(folder, name));
}

async function writeOutputs(): Promise<void> {
  for (const [i, payload] of PAYLOADS.entries()) {
    const file = hostileRecord(join(f.dir, `hostile-${i}.csv`));
    const record = [file, '--units', 'g', '--name', payload];
    outputs.set(`figures ${i}`, [
      ...(await figuresOf(['spectrum', ...record, ...PERIODS, '--histories'], join(f.dir, `spectrum-${i}`))),
      ...(await figuresOf(['info', ...record], join(f.dir, `info-${i}`))),
    ]);
    const report = join(f.dir, `report-${i}`);
    await run(['report', ...record, '--note', payload, ...PERIODS, '--out', report]);
    outputs.set(`report ${i}`, [join(report, 'report.html')]);
  }
  const named = hostileRecord(join(f.dir, `${FILE_NAME}.csv`));
  outputs.set(
    'file name',
    await figuresOf(['spectrum', named, '--units', 'g', ...PERIODS], join(f.dir, 'named')),
  );
  const control = join(f.dir, 'control.svg');
  writeFileSync(
    control,
    `<svg xmlns="http://www.w3.org/2000/svg"><script>window.${FLAG}=1;alert('control')</script></svg>`,
  );
  outputs.set('control', [control]);
}

beforeAll(async () => {
  await writeOutputs();
  const frames = [...outputs.values()].flat();
  const pageFile = join(f.dir, 'every-output.html');
  writeFileSync(
    pageFile,
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>every output</title></head><body>
${frames.map((file) => `<iframe width="640" height="400" src="${pathToFileURL(file).href}"></iframe>`).join('\n')}
</body></html>`,
  );
  browser = await launchChromium();
  page = await browser.newPage();
  page.on('dialog', async (dialog) => {
    dialogs.push(dialog.message());
    await dialog.dismiss();
  });
  await page.goto(pathToFileURL(pageFile).href, { waitUntil: 'load' });
  await page.waitForTimeout(200); // let any onerror or timer fire
});

afterAll(async () => {
  await browser?.close();
  rmSync(f.dir, { recursive: true, force: true });
});

/** The frame showing `file`, whether script ran in it, and its whole text as a person reads it. */
async function seen(file: string): Promise<{ ran: boolean; text: string }> {
  const url = pathToFileURL(file).href;
  const frame: Frame | undefined = page.frames().find((candidate) => candidate.url() === url);
  if (frame === undefined) throw new Error(`no frame shows ${file}`);
  return frame.evaluate(
    (flag) => ({
      ran: (window as unknown as Record<string, unknown>)[flag] !== undefined,
      text: document.documentElement.textContent ?? '',
    }),
    FLAG,
  );
}

describe('hostile names and headers, every output on one page in headless Chromium', () => {
  it('the control frame ran its script and raised its dialog, and nothing else did (so the check can fail)', async () => {
    expect((await seen(outputs.get('control')![0])).ran).toBe(true);
    expect(dialogs).toEqual(['control']);
  });

  PAYLOADS.forEach((payload, i) => {
    it(`--name ${JSON.stringify(payload)}: nothing runs in the figures or the report, the name is text`, async () => {
      const figures = outputs.get(`figures ${i}`)!;
      expect(figures.length).toBeGreaterThanOrEqual(6);
      for (const file of [...figures, ...outputs.get(`report ${i}`)!]) {
        const { ran, text } = await seen(file);
        expect(ran, file).toBe(false);
        expect(text, file).toContain(payload);
      }
    });
  });

  it('a file named like markup: nothing runs, the name is text', async () => {
    const figures = outputs.get('file name')!;
    expect(figures.length).toBeGreaterThanOrEqual(4);
    for (const file of figures) {
      const { ran, text } = await seen(file);
      expect(ran, file).toBe(false);
      expect(text, file).toContain(FILE_NAME);
    }
  });
});

/**
 * The one browser suite: a single page, opened once in headless Chromium, holding
 * - every kind of figure drawn from invented data, inlined as the report inlines them (ids prefixed
 *   per figure); each must render a non-blank picture of its declared size with every text inside
 *   it and no two tick labels of an axis overlapping, as laid out by the browser;
 * - in frames, every output of `spectrum --svg --histories`, `info --svg` and `report` for records
 *   named with script payloads (via --name and via the file name, with a header holding `]]>` and
 *   quotes). Anything from a file or an option is escaped (the project's rule; OWASP's
 *   output-encoding practice): nothing may run, and each name must show as text. A control frame
 *   holding an unescaped payload proves on the same page that the check sees script that runs.
 */
import { mkdirSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { join } from 'node:path';
import { pathToFileURL } from 'node:url';
import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inlineSvg } from '../../src/report/inline-svg.js';
import { launchChromium } from '../helpers/chromium.js';
import { writeFixtures } from '../helpers/fixtures.js';
import { runMain } from '../helpers/run-cli.js';
import { EVERY_FIGURE } from './helpers.js';

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

const figures = Object.entries(EVERY_FIGURE).map(([name, draw]) => ({ name, svg: draw().svg }));
const f = writeFixtures('quakesweep-browser-');
/** Output files of each hostile case, by case name. */
const outputs = new Map<string, string[]>();
let browser: Browser;
let page: Page;
const consoleErrors: string[] = [];
const dialogs: string[] = [];

/** What the browser shows of one inlined figure. */
interface Seen {
  box: { width: number; height: number };
  /** Pixels that are not white, and pixels of a clear colour (not grey), in its part of the screenshot. */
  ink: number;
  coloured: number;
  total: number;
  texts: number;
  /** Texts that reach outside the figure; pairs of overlapping tick labels of one axis. */
  outside: string[];
  overlapping: string[];
}
let seenFigures: Record<string, Seen>;

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

async function writeHostileOutputs(): Promise<void> {
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

/** Screenshot the whole page once and measure, in the page, every inlined figure. */
async function seeFigures(): Promise<Record<string, Seen>> {
  const png = await page.screenshot({ fullPage: true });
  return page.evaluate(async (base64) => {
    const image = new Image();
    image.src = `data:image/png;base64,${base64}`;
    await image.decode();
    const canvas = document.createElement('canvas');
    canvas.width = image.width;
    canvas.height = image.height;
    const context = canvas.getContext('2d')!;
    context.drawImage(image, 0, 0);
    const overlaps = (a: DOMRect, b: DOMRect) =>
      a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom;
    const seen: Record<string, unknown> = {};
    for (const svg of document.querySelectorAll<SVGSVGElement>('div[data-figure] > svg')) {
      const frame = svg.getBoundingClientRect();
      const data = context.getImageData(
        frame.left + window.scrollX,
        frame.top + window.scrollY,
        frame.width,
        frame.height,
      ).data;
      let ink = 0;
      let coloured = 0;
      for (let i = 0; i < data.length; i += 4) {
        const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
        if (r < 240 || g < 240 || b < 240) ink++;
        if (Math.max(r, g, b) - Math.min(r, g, b) > 60) coloured++;
      }
      const texts = [...svg.querySelectorAll('text')];
      const outside = texts
        .filter((t) => {
          const r = t.getBoundingClientRect();
          return (
            r.left < frame.left - 0.5 ||
            r.right > frame.right + 0.5 ||
            r.top < frame.top - 0.5 ||
            r.bottom > frame.bottom + 0.5
          );
        })
        .map((t) => t.textContent ?? '');
      const overlapping: string[] = [];
      for (const group of svg.querySelectorAll('g.x-ticks, g.y-ticks')) {
        const labels = [...group.querySelectorAll('text')].map((t) => ({
          text: t.textContent,
          r: t.getBoundingClientRect(),
        }));
        for (let i = 0; i < labels.length; i++)
          for (let j = i + 1; j < labels.length; j++)
            if (overlaps(labels[i].r, labels[j].r)) overlapping.push(`${labels[i].text}/${labels[j].text}`);
      }
      seen[svg.closest('div')!.dataset.figure!] = {
        box: { width: frame.width, height: frame.height },
        ink,
        coloured,
        total: data.length / 4,
        texts: texts.length,
        outside,
        overlapping,
      };
    }
    return seen as Record<string, Seen>;
  }, png.toString('base64'));
}

beforeAll(async () => {
  await writeHostileOutputs();
  const frames = [...outputs.values()].flat();
  const pageFile = join(f.dir, 'every-figure.html');
  writeFileSync(
    pageFile,
    `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>every figure</title>
<style>body { margin: 0 } svg { display: block } iframe { display: block }</style></head><body>
${figures.map(({ name, svg }) => `<div data-figure="${name}">${inlineSvg(svg, name)}</div>`).join('\n')}
${frames.map((file) => `<iframe width="640" height="60" src="${pathToFileURL(file).href}"></iframe>`).join('\n')}
</body></html>`,
  );
  browser = await launchChromium();
  page = await browser.newPage({ viewport: { width: 640, height: 800 } });
  page.on('console', (message) => {
    if (message.type() === 'error') consoleErrors.push(message.text());
  });
  page.on('pageerror', (error) => consoleErrors.push(error.message));
  page.on('dialog', async (dialog) => {
    dialogs.push(dialog.message());
    await dialog.dismiss();
  });
  await page.goto(pathToFileURL(pageFile).href, { waitUntil: 'load' });
  await page.waitForTimeout(200); // let any onerror or timer fire
  seenFigures = await seeFigures();
});

afterAll(async () => {
  await browser?.close();
  rmSync(f.dir, { recursive: true, force: true });
});

/** The frame showing `file`, whether script ran in it, and its whole text as a person reads it. */
async function seenFrame(file: string): Promise<{ ran: boolean; text: string }> {
  const url = pathToFileURL(file).href;
  const frame = page.frames().find((candidate) => candidate.url() === url);
  if (frame === undefined) throw new Error(`no frame shows ${file}`);
  return frame.evaluate(
    (flag) => ({
      ran: (window as unknown as Record<string, unknown>)[flag] !== undefined,
      text: document.documentElement.textContent ?? '',
    }),
    FLAG,
  );
}

function declaredSize(svg: string): { width: number; height: number } {
  const width = Number(/<svg[^>]* width="(\d+)"/.exec(svg)?.[1]);
  const height = Number(/<svg[^>]* height="(\d+)"/.exec(svg)?.[1]);
  return { width, height };
}

describe('every figure on one page in headless Chromium', () => {
  it('the page holds every figure once and every output frame, and logs no error', async () => {
    expect(await page.locator('div[data-figure] > svg').count()).toBe(figures.length);
    expect(Object.keys(seenFigures).sort()).toEqual(figures.map((figure) => figure.name).sort());
    expect(await page.locator('iframe').count()).toBe([...outputs.values()].flat().length);
    expect(consoleErrors).toEqual([]);
  });

  for (const { name, svg } of figures) {
    it(`${name}: renders a non-blank picture of the declared size, text inside the figure`, () => {
      const seen = seenFigures[name];
      const size = declaredSize(svg);
      expect(size.width).toBe(640);
      expect(seen.box).toEqual(size);
      expect(seen.total).toBe(size.width * size.height);
      expect(seen.ink / seen.total).toBeGreaterThan(0.02);
      expect(seen.ink / seen.total).toBeLessThan(0.6);
      // The curves are drawn in colour; a design spectrum alone is drawn black, as design overlays are.
      if (name !== 'design') expect(seen.coloured).toBeGreaterThan(200);
      expect(seen.texts).toBeGreaterThan(0);
      expect(seen.outside).toEqual([]);
      expect(seen.overlapping).toEqual([]);
    });
  }
});

describe('hostile names and headers, every output on the same page', () => {
  it('the control frame ran its script and raised its dialog, and nothing else did (so the check can fail)', async () => {
    expect((await seenFrame(outputs.get('control')![0])).ran).toBe(true);
    expect(dialogs).toEqual(['control']);
  });

  PAYLOADS.forEach((payload, i) => {
    it(`--name ${JSON.stringify(payload)}: nothing runs in the figures or the report, the name is text`, async () => {
      const files = outputs.get(`figures ${i}`)!;
      expect(files.length).toBeGreaterThanOrEqual(6);
      for (const file of [...files, ...outputs.get(`report ${i}`)!]) {
        const { ran, text } = await seenFrame(file);
        expect(ran, file).toBe(false);
        expect(text, file).toContain(payload);
      }
    });
  });

  it('a file named like markup: nothing runs, the name is text', async () => {
    const files = outputs.get('file name')!;
    expect(files.length).toBeGreaterThanOrEqual(4);
    for (const file of files) {
      const { ran, text } = await seenFrame(file);
      expect(ran, file).toBe(false);
      expect(text, file).toContain(FILE_NAME);
    }
  });
});

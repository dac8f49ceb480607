import { createHash } from 'node:crypto';
import { mkdtempSync, readdirSync, readFileSync, rmSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import { join } from 'node:path';
import { JSDOM } from 'jsdom';
import type { Browser } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { CAUTION } from '../../src/base/caution.js';
import { runReport } from '../../src/cli/commands/report.js';
import { runSpectrum } from '../../src/cli/commands/spectrum.js';
import { escapeHtml } from '../../src/report/html.js';
import { inlineSvg } from '../../src/report/inline-svg.js';
import { titleBlockTable } from '../../src/report/report.js';
import { launchChromium } from '../helpers/chromium.js';

// An invented record (a decaying 2 Hz sine), an invented generator on grade, a coarse grid.
const folder = mkdtempSync(join(tmpdir(), 'quakesweep-report-'));
const recordFile = join(folder, 'invented.txt');
const equipmentFile = join(folder, 'generator.json');
const options = {
  units: 'g',
  dt: '0.01',
  name: 'yard <b>east</b> & "north"',
  periods: '0,0.05,0.1,0.2,0.3,0.5,0.8,1.2,2,3',
  damping: '2%,5%,10%',
  taper: '5%',
  target: 'asce7-16:sds=1.0,sd1=0.6,tl=8',
};
let html = '';
let browser: Browser;

beforeAll(async () => {
  const lines = Array.from({ length: 800 }, (_, i) =>
    (0.3 * Math.exp(-i / 400) * Math.sin(2 * Math.PI * 2 * i * 0.01)).toFixed(6),
  );
  writeFileSync(recordFile, `${lines.join('\n')}\n`);
  writeFileSync(
    equipmentFile,
    JSON.stringify({
      name: 'Invented pump <P-1>',
      units: 'SI',
      weight: 20,
      cg_height: 0.8,
      anchors: [
        [-0.5, -0.4],
        [0.5, -0.4],
        [0.5, 0.4],
        [-0.5, 0.4],
      ],
      period_s: 'rigid',
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
  await runReport(recordFile, { ...options, equipment: [equipmentFile], out: join(folder, 'out') }, [
    'report',
    'x',
  ]);
  html = readFileSync(join(folder, 'out', 'report.html'), 'utf8');
  browser = await launchChromium();
});

afterAll(async () => {
  await browser?.close();
  rmSync(folder, { recursive: true, force: true });
});

describe('the HTML report', () => {
  it('names no network address and loads nothing (the brief: opens offline)', () => {
    expect(html).not.toMatch(/https?:/i);
    expect(html).not.toMatch(/["'(\s=]\/\/[A-Za-z0-9]/); // protocol-relative //host
    expect(html).not.toMatch(/url\((?!#)/); // url( only to fragments of the page itself
    expect(html).not.toMatch(/<script|<link|<img|<iframe|@import/i);
  });

  it('escapes text from files and options', () => {
    expect(html).not.toContain('<b>east</b>');
    expect(html).toContain(escapeHtml('yard <b>east</b> & "north"'));
    expect(html).not.toContain('<P-1>');
  });

  it('writes spectra.json exactly as `quakesweep spectrum --format json` does', async () => {
    const alone = join(folder, 'alone.json');
    await runSpectrum(recordFile, { ...options, format: 'json', out: alone });
    expect(readFileSync(join(folder, 'out', 'spectra.json'), 'utf8')).toBe(readFileSync(alone, 'utf8'));
  });

  it('opens in Chromium without console errors, shows the caution first and every figure', async () => {
    const page = await browser.newPage({ viewport: { width: 900, height: 1200 } });
    const errors: string[] = [];
    const requests: string[] = [];
    page.on('console', (message) => {
      if (message.type() === 'error') errors.push(message.text());
    });
    page.on('pageerror', (error) => errors.push(error.message));
    page.on('request', (request) => {
      if (!request.url().startsWith('file:')) requests.push(request.url());
    });
    await page.goto(`file://${join(folder, 'out', 'report.html')}`);
    expect(errors).toEqual([]);
    expect(requests).toEqual([]);
    const banner = page.locator('#caution');
    await expect(banner.isVisible()).resolves.toBe(true);
    expect(await banner.textContent()).toContain(CAUTION);
    const bannerTop = (await banner.boundingBox())?.y ?? Infinity;
    const firstSection = (await page.locator('section').first().boundingBox())?.y ?? 0;
    expect(bannerTop).toBeLessThan(firstSection);
    const svgFiles = readdirSync(join(folder, 'out')).filter((f) => f.endsWith('.svg'));
    const figures = page.locator('figure svg');
    expect(await figures.count()).toBe(svgFiles.length);
    for (let i = 0; i < svgFiles.length; i++) {
      const box = await figures.nth(i).boundingBox();
      expect(box?.width ?? 0).toBeGreaterThan(300);
      expect(box?.height ?? 0).toBeGreaterThan(200);
    }
    // Curves survive inlining: each figure's clip path resolves to its own element.
    const clipsResolve = await page.evaluate(() =>
      [...document.querySelectorAll('[clip-path]')].every((el) => {
        const id = /url\(#([^)]+)\)/.exec(el.getAttribute('clip-path') ?? '')?.[1];
        return id !== undefined && document.querySelectorAll(`[id="${id}"]`).length === 1;
      }),
    );
    expect(clipsResolve).toBe(true);
    await page.close();
  });

  it('opens with a title block: blank lines to fill in and sign when no names are given, and the date', () => {
    const doc = new JSDOM(html).window.document;
    const rows = [...doc.querySelectorAll('header table.title-block tr')];
    expect(rows.map((r) => r.querySelector('th')?.textContent)).toEqual([
      'Project',
      'Prepared by',
      'Checked by',
      'Date',
    ]);
    expect(rows[0].querySelector('td span.blank')).not.toBeNull();
    expect(rows[1].querySelectorAll('span.blank')).toHaveLength(2); // the name and the signature
    expect(rows[3].querySelector('td')?.textContent).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    const named = titleBlockTable(
      { project: 'Yard <7>', preparedBy: 'A. Person', checkedBy: '' },
      '2026-03-11T10:00:00Z',
    );
    expect(named).toContain('<td>Yard &lt;7&gt;</td>');
    expect(named).toContain('<td>A. Person</td>');
    expect(named).toContain('<td>2026-03-11</td>');
    expect(named.match(/class="blank"/g)).toHaveLength(3); // the checker's name, both signatures
  });

  it('numbers printed pages "Page n of N" with the paged-media counters', () => {
    expect(html).toMatch(/@bottom-right \{ content: "Page " counter\(page\) " of " counter\(pages\)/);
  });

  it('lists every input file with the SHA-256 of its bytes', () => {
    const doc = new JSDOM(html).window.document;
    const caption = [...doc.querySelectorAll('caption')].find((c) => /SHA-256/.test(c.textContent ?? ''));
    const rows = [...(caption?.parentElement?.querySelectorAll('tbody tr') ?? [])].map((r) =>
      [...r.querySelectorAll('td')].map((td) => td.textContent),
    );
    const hash = (file: string) => createHash('sha256').update(readFileSync(file)).digest('hex');
    expect(rows).toEqual([
      ['record', recordFile, hash(recordFile)],
      ['equipment', equipmentFile, hash(equipmentFile)],
    ]);
  });

  it('states the target scaling, anchorage, version, command line and the generation time', () => {
    for (const text of [
      'Scale factor',
      'Invented pump',
      'quakesweep 0.1.0',
      'quakesweep report x',
      'not determined by the inputs',
    ]) {
      expect(html).toContain(escapeHtml(text));
    }
  });
});

describe('inlineSvg', () => {
  it('drops the XML declaration and namespace and prefixes ids and their references', () => {
    const svg =
      '<?xml version="1.0"?>\n<svg xmlns="http://www.w3.org/2000/svg"><clipPath id="c"/><g clip-path="url(#c)"/></svg>';
    expect(inlineSvg(svg, 'f1')).toBe('<svg><clipPath id="f1-c"/><g clip-path="url(#f1-c)"/></svg>');
  });
});

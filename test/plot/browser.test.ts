import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { logSpaced } from '../../src/oscillator/grid.js';
import { historiesFigure } from '../../src/plot/histories-figure.js';
import { psaFigure, psvFigure, sdFigure } from '../../src/plot/spectrum-figure.js';
import { tripartiteFigure } from '../../src/plot/tripartite-figure.js';
import { integrateRecord } from '../../src/record/integrate.js';
import { createRecord } from '../../src/record/record.js';
import { responseSpectrum } from '../../src/spectrum/spectrum.js';
import { launchChromium } from '../helpers/chromium.js';
import { newFigures } from './new-figures.js';

// An invented record: two decaying sines, 15 s at 100 samples a second.
const record = createRecord({
  name: 'invented <yard> & "east" record',
  dtS: 0.01,
  accelMS2: Float64Array.from({ length: 1500 }, (_, i) => {
    const t = i * 0.01;
    return Math.exp(-t / 4) * (2 * Math.sin(2 * Math.PI * 1.2 * t) + 0.8 * Math.sin(2 * Math.PI * 6 * t));
  }),
});
const spectrum = responseSpectrum(record, {
  periodsS: [0, ...logSpaced(0.02, 5, 50)],
  dampings: [0.02, 0.05, 0.1],
});
const figures: Record<string, string> = {
  psa: psaFigure(spectrum),
  sd: sdFigure(spectrum, { lengthUnit: 'cm' }),
  psv: psvFigure(spectrum, { axes: 'linear' }),
  tripartite: tripartiteFigure(spectrum, { lengthUnit: 'cm' }),
  histories: historiesFigure({ ...record, ...integrateRecord(record) }, { lengthUnit: 'cm' }),
  ...Object.fromEntries(Object.entries(newFigures()).map(([name, figure]) => [name, figure.svg])),
};

let browser: Browser;
let page: Page;

beforeAll(async () => {
  browser = await launchChromium();
  page = await browser.newPage();
});

afterAll(async () => {
  await browser?.close();
});

function declaredSize(svg: string): { width: number; height: number } {
  const width = Number(/<svg[^>]* width="(\d+)"/.exec(svg)?.[1]);
  const height = Number(/<svg[^>]* height="(\d+)"/.exec(svg)?.[1]);
  return { width, height };
}

describe('figures in headless Chromium', () => {
  for (const [name, svg] of Object.entries(figures)) {
    it(`${name}: renders a non-blank picture of the declared size, text inside the page`, async () => {
      const size = declaredSize(svg);
      expect(size.width).toBe(640);
      await page.setViewportSize(size);
      await page.setContent(
        `<!doctype html><body style="margin:0">${svg.replace(/^<\?xml[^>]*>/, '')}</body>`,
      );
      const box = await page.locator('svg').first().boundingBox();
      expect(box?.width).toBe(size.width);
      expect(box?.height).toBe(size.height);
      const png = await page.screenshot({ clip: { x: 0, y: 0, ...size } });
      // Decode the screenshot in the page and count pixels that are not white.
      const counts = await page.evaluate(async (base64) => {
        const image = new Image();
        image.src = `data:image/png;base64,${base64}`;
        await image.decode();
        const canvas = document.createElement('canvas');
        canvas.width = image.width;
        canvas.height = image.height;
        const context = canvas.getContext('2d')!;
        context.drawImage(image, 0, 0);
        const data = context.getImageData(0, 0, image.width, image.height).data;
        let ink = 0;
        let coloured = 0;
        for (let i = 0; i < data.length; i += 4) {
          const [r, g, b] = [data[i], data[i + 1], data[i + 2]];
          if (r < 240 || g < 240 || b < 240) ink++;
          if (Math.max(r, g, b) - Math.min(r, g, b) > 60) coloured++;
        }
        return { width: image.width, height: image.height, ink, coloured, total: data.length / 4 };
      }, png.toString('base64'));
      expect(counts.width).toBe(size.width);
      expect(counts.height).toBe(size.height);
      expect(counts.ink / counts.total).toBeGreaterThan(0.02);
      expect(counts.ink / counts.total).toBeLessThan(0.6);
      // The curves are drawn in colour; a design spectrum alone is drawn black, as design overlays are.
      if (name !== 'design') expect(counts.coloured).toBeGreaterThan(200);

      // Every text lies inside the page, and tick labels of one axis do not overlap (as laid out by the browser).
      const layout = await page.evaluate(() => {
        const svgElement = document.querySelector('svg')!;
        const page = svgElement.getBoundingClientRect();
        const outside = [...svgElement.querySelectorAll('text')]
          .map((t) => ({ text: t.textContent, r: t.getBoundingClientRect() }))
          .filter(
            ({ r }) =>
              r.left < page.left - 0.5 ||
              r.right > page.right + 0.5 ||
              r.top < page.top - 0.5 ||
              r.bottom > page.bottom + 0.5,
          )
          .map(({ text }) => text);
        const overlapping: string[] = [];
        for (const group of svgElement.querySelectorAll('g.x-ticks, g.y-ticks')) {
          const boxes = [...group.querySelectorAll('text')].map((t) => ({
            text: t.textContent,
            r: t.getBoundingClientRect(),
          }));
          for (let i = 0; i < boxes.length; i++)
            for (let j = i + 1; j < boxes.length; j++) {
              const a = boxes[i].r;
              const b = boxes[j].r;
              if (a.left < b.right && b.left < a.right && a.top < b.bottom && b.top < a.bottom)
                overlapping.push(`${boxes[i].text}/${boxes[j].text}`);
            }
        }
        return { outside, overlapping };
      });
      expect(layout.outside).toEqual([]);
      expect(layout.overlapping).toEqual([]);
    });
  }
});

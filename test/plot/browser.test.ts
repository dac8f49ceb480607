import type { Browser, Page } from 'playwright-core';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { inlineSvg } from '../../src/report/inline-svg.js';
import { launchChromium } from '../helpers/chromium.js';
import { EVERY_FIGURE } from './every-figure.js';

// Every kind of figure on one page, inlined as the report inlines them (ids prefixed per figure),
// opened once in headless Chromium; each figure is then checked where it stands on that page.
const figures = Object.entries(EVERY_FIGURE).map(([name, draw]) => ({ name, svg: draw().svg }));
const PAGE = `<!doctype html><html lang="en"><head><meta charset="utf-8"><title>every figure</title>
<style>body { margin: 0 } svg { display: block }</style></head><body>
${figures.map(({ name, svg }) => `<div data-figure="${name}">${inlineSvg(svg, name)}</div>`).join('\n')}
</body></html>`;

let browser: Browser;
let page: Page;
const consoleErrors: string[] = [];

beforeAll(async () => {
  browser = await launchChromium();
  page = await browser.newPage({ viewport: { width: 640, height: 800 } });
  page.on('console', (message) => {
    if (message.type() === 'error') consoleErrors.push(message.text());
  });
  page.on('pageerror', (error) => consoleErrors.push(error.message));
  await page.setContent(PAGE);
});

afterAll(async () => {
  await browser?.close();
});

function declaredSize(svg: string): { width: number; height: number } {
  const width = Number(/<svg[^>]* width="(\d+)"/.exec(svg)?.[1]);
  const height = Number(/<svg[^>]* height="(\d+)"/.exec(svg)?.[1]);
  return { width, height };
}

describe('every figure on one page in headless Chromium', () => {
  it('the page holds every figure once and logs no error', async () => {
    expect(await page.locator('div[data-figure] > svg').count()).toBe(figures.length);
    expect(consoleErrors).toEqual([]);
  });

  for (const { name, svg } of figures) {
    it(`${name}: renders a non-blank picture of the declared size, text inside the figure`, async () => {
      const size = declaredSize(svg);
      expect(size.width).toBe(640);
      const figure = page.locator(`div[data-figure="${name}"] > svg`);
      const box = await figure.boundingBox();
      expect(box?.width).toBe(size.width);
      expect(box?.height).toBe(size.height);
      const png = await figure.screenshot();
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

      // Every text lies inside its figure, and tick labels of one axis do not overlap (as laid out by the browser).
      const layout = await figure.evaluate((svgElement) => {
        const frame = svgElement.getBoundingClientRect();
        const outside = [...svgElement.querySelectorAll('text')]
          .map((t) => ({ text: t.textContent, r: t.getBoundingClientRect() }))
          .filter(
            ({ r }) =>
              r.left < frame.left - 0.5 ||
              r.right > frame.right + 0.5 ||
              r.top < frame.top - 0.5 ||
              r.bottom > frame.bottom + 0.5,
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
        return { outside, overlapping, texts: svgElement.querySelectorAll('text').length };
      });
      expect(layout.texts).toBeGreaterThan(0);
      expect(layout.outside).toEqual([]);
      expect(layout.overlapping).toEqual([]);
    });
  }

  it('decoding the screenshots logged no error either', () => {
    expect(consoleErrors).toEqual([]);
  });
});

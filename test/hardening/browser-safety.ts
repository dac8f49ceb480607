/**
 * Open an SVG or HTML output in headless Chromium and report whether anything in it ran: a dialog
 * (alert, confirm, prompt), or a window flag that the test payloads set. Takes a file path or the
 * markup itself, so the HTML report can be checked the same way as the figures.
 */
import { pathToFileURL } from 'node:url';
import type { Browser } from 'playwright-core';

export const PAYLOAD_FLAG = '__quakesweepPayloadRan';

/** Names that would run script if they reached the markup unescaped. */
export const PAYLOADS = [
  `<script>window.${PAYLOAD_FLAG}=1;alert(1)</script>`,
  `<img src=x onerror="window.${PAYLOAD_FLAG}=1;alert(1)">`,
  `]]><script>window.${PAYLOAD_FLAG}=1</script><![CDATA[`,
  `"' onload="window.${PAYLOAD_FLAG}=1" x='`,
];

export { launchChromium } from '../helpers/chromium.js';

export interface InertCheck {
  dialogs: string[];
  flagSet: boolean;
  /** The document's whole text content, as a person would read it. */
  text: string;
}

/** Load `target` (a file path, or `{ markup, type }`) and see whether any script ran. */
export async function openInert(
  browser: Browser,
  target: string | { markup: string; type: 'svg' | 'html' },
): Promise<InertCheck> {
  const page = await browser.newPage();
  const dialogs: string[] = [];
  page.on('dialog', async (dialog) => {
    dialogs.push(dialog.message());
    await dialog.dismiss();
  });
  try {
    if (typeof target === 'string') {
      await page.goto(pathToFileURL(target).href, { waitUntil: 'load' });
    } else if (target.type === 'html') {
      await page.setContent(target.markup, { waitUntil: 'load' });
    } else {
      await page.goto(`data:image/svg+xml;base64,${Buffer.from(target.markup).toString('base64')}`);
    }
    await page.waitForTimeout(100); // let any onerror or timer fire
    const flagSet = await page.evaluate(
      (flag) => (window as unknown as Record<string, unknown>)[flag] !== undefined,
      PAYLOAD_FLAG,
    );
    const text = await page.evaluate(() => document.documentElement.textContent ?? '');
    return { dialogs, flagSet, text };
  } finally {
    await page.close();
  }
}

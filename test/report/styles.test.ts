import { describe, expect, it } from 'vitest';
import { REPORT_CSS } from '../../src/report/styles.js';

// Paper sizes: ISO 216 A4 is 210 × 297 mm; US letter (ANSI A) is 8.5 × 11 in = 215.9 × 279.4 mm
// (1 in = 25.4 mm exactly). The report must print on either.
const A4 = { widthMm: 210, heightMm: 297 };
const LETTER = { widthMm: 8.5 * 25.4, heightMm: 11 * 25.4 };

/** The four page margins of the @page rule, mm (top, right, bottom, left; CSS shorthand order). */
function pageMarginsMm(): [number, number, number, number] {
  const match = /@page\s*\{\s*margin:\s*([^;]+);/.exec(REPORT_CSS);
  if (!match) throw new Error('no @page margin');
  const values = match[1]
    .trim()
    .split(/\s+/)
    .map((v) => {
      expect(v).toMatch(/^\d+(\.\d+)?mm$/);
      return Number.parseFloat(v);
    });
  const [top, right = top, bottom = top, left = right] = values;
  return [top, right, bottom, left];
}

/** The value of a declaration inside the print media block, mm. */
function printValueMm(selector: string, property: string): number {
  const print = REPORT_CSS.slice(REPORT_CSS.indexOf('@media print'));
  const rule = new RegExp(`${selector}\\s*\\{([^}]*)\\}`).exec(print);
  const value = rule && new RegExp(`${property}:\\s*([\\d.]+)mm`).exec(rule[1]);
  if (!value) throw new Error(`no ${property} for ${selector} in print`);
  return Number(value[1]);
}

describe('REPORT_CSS', () => {
  it('prints a figure inside the printable area of both A4 and US letter', () => {
    const [top, right, bottom, left] = pageMarginsMm();
    const printableWidth = Math.min(A4.widthMm, LETTER.widthMm) - left - right;
    const printableHeight = Math.min(A4.heightMm, LETTER.heightMm) - top - bottom;
    // With 16 mm × 14 mm margins (hand): 210 − 28 = 182 mm wide, 279.4 − 32 = 247.4 mm high.
    expect(printableWidth).toBeCloseTo(182, 9);
    expect(printableHeight).toBeCloseTo(247.4, 9);
    expect(printValueMm('figure svg', 'max-width')).toBeLessThanOrEqual(printableWidth);
    expect(printValueMm('figure svg', 'max-height')).toBeLessThanOrEqual(printableHeight);
  });

  it('starts each figure on a new page and keeps tables and figures whole', () => {
    const print = REPORT_CSS.slice(REPORT_CSS.indexOf('@media print'));
    expect(print).toMatch(/figure\s*\{[^}]*break-before:\s*page/);
    expect(print).toMatch(/figure\s*\{[^}]*break-inside:\s*avoid/);
    expect(print).toMatch(/table, tr\s*\{[^}]*break-inside:\s*avoid/);
  });

  it('loads nothing from outside the page (the report opens offline)', () => {
    expect(REPORT_CSS).not.toMatch(/url\(|@import|@font-face|https?:/i);
  });

  it('has balanced braces and sets the caution apart (common practice: a warning stands out)', () => {
    expect(REPORT_CSS.split('{').length).toBe(REPORT_CSS.split('}').length);
    expect(REPORT_CSS).toMatch(/\.caution\s*\{[^}]*border:/);
    expect(REPORT_CSS).toMatch(/\.caution-inline\s*\{[^}]*border-left:/);
  });
});

import { describe, expect, it } from 'vitest';
import {
  DAMPING_DASHES,
  FIGURE_WIDTH_PX,
  FRAME_COLOUR,
  GRID_COLOUR,
  HALO,
  MINOR_GRID_COLOUR,
  overlayStyle,
  seriesStyle,
  TEXT_COLOUR,
} from '../../src/plot/styles.js';

/** Relative luminance of an sRGB colour "#rrggbb" (WCAG 2.1, definition of relative luminance). */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => {
    const c = Number.parseInt(hex.slice(i, i + 2), 16) / 255;
    return c <= 0.03928 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4;
  });
  return 0.2126 * r + 0.7152 * g + 0.0722 * b;
}

/** Contrast ratio against white (WCAG 2.1, definition of contrast ratio). */
const contrastOnWhite = (hex: string) => 1.05 / (luminance(hex) + 0.05);

/** The colour-blind-safe set of Okabe and Ito (2008), from memory; yellow is the last. */
const OKABE_ITO = ['#000000', '#E69F00', '#56B4E9', '#009E73', '#0072B2', '#D55E00', '#CC79A7', '#F0E442'];
const YELLOW = '#F0E442';

describe('seriesStyle', () => {
  const styles = Array.from({ length: 7 }, (_, i) => seriesStyle(i));

  it('gives seven curves seven Okabe–Ito colours, none of them the yellow, then repeats', () => {
    const colours = styles.map((s) => s.color.toUpperCase());
    expect(new Set(colours).size).toBe(7);
    for (const c of colours) expect(OKABE_ITO).toContain(c);
    expect(colours).not.toContain(YELLOW);
    expect(seriesStyle(7)).toEqual(seriesStyle(0));
    expect(seriesStyle(9)).toEqual(seriesStyle(2));
  });

  it('gives each of them its own dash pattern too, so curves stay apart in greyscale', () => {
    expect(new Set(styles.map((s) => s.dash)).size).toBe(7);
  });

  it('keeps every curve colour clearly darker on white than the yellow left out (WCAG 2.1 contrast)', () => {
    expect(contrastOnWhite(YELLOW)).toBeLessThan(1.4);
    for (const s of styles) expect(contrastOnWhite(s.color)).toBeGreaterThan(2);
  });
});

describe('the other styles', () => {
  it('overlays are heavier than any data curve and near black, so they read as the reference', () => {
    for (let i = 0; i < 3; i++) {
      expect(overlayStyle(i).widthPx).toBeGreaterThan(seriesStyle(i).widthPx);
      expect(contrastOnWhite(overlayStyle(i).color)).toBeGreaterThan(10);
    }
    expect(new Set([0, 1, 2].map((i) => overlayStyle(i).dash)).size).toBe(3);
  });

  it('text reaches the 7:1 contrast of WCAG 2.1 §1.4.6; the grid is lighter than the frame', () => {
    expect(contrastOnWhite(TEXT_COLOUR)).toBeGreaterThanOrEqual(7);
    expect(luminance(MINOR_GRID_COLOUR)).toBeGreaterThan(luminance(GRID_COLOUR));
    expect(luminance(GRID_COLOUR)).toBeGreaterThan(luminance(FRAME_COLOUR));
    expect(HALO.stroke).toBe('#ffffff');
  });

  it('damping ratios get distinct dash patterns', () => {
    expect(new Set(DAMPING_DASHES).size).toBe(DAMPING_DASHES.length);
  });

  it('a figure is 169 mm wide at 96 px to the inch (CSS reference pixel), the text width of an A4 page', () => {
    // A4 is 210 mm wide; with 20 mm margins its text is 170 mm.
    const widthMm = (FIGURE_WIDTH_PX / 96) * 25.4;
    expect(widthMm).toBeCloseTo(169.3, 1);
    expect(widthMm).toBeLessThanOrEqual(210 - 2 * 20);
  });
});

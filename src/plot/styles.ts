/** How one curve is drawn. */
export interface SeriesStyle {
  /** Stroke colour, any SVG colour. */
  color: string;
  /** SVG stroke-dasharray, or 'none' for a solid line. */
  dash: string;
  widthPx: number;
  /** Hollow markers along the curve (every MARKER_SPACING_PX or so), for curves a dash cannot part. */
  marker?: 'circle' | 'square';
}

/** Least distance between two markers along a curve, px. */
export const MARKER_SPACING_PX = 26;
/** Half the size of a marker, px. */
export const MARKER_RADIUS_PX = 2.6;

/**
 * Curve colours: the colour-blind-safe set of Okabe and Ito (2008), yellow left out because it is
 * too pale on white. Each colour is paired with its own dash pattern, so curves stay apart in
 * greyscale and for readers who do not tell the colours apart.
 */
const COLOURS = ['#0072B2', '#D55E00', '#009E73', '#CC79A7', '#E69F00', '#56B4E9', '#000000'];
const DASHES = ['none', '7 3', '2 2.5', '9 3 2 3', '4 2 1 2 1 2', '12 3', '1 4'];

/** Dash patterns by damping ratio, for figures that give the colour to something else. */
export const DAMPING_DASHES = DASHES.slice(0, 4);

/** The style of the `index`-th data curve; patterns repeat after seven curves. */
export function seriesStyle(index: number): SeriesStyle {
  return {
    color: COLOURS[index % COLOURS.length],
    dash: DASHES[index % DASHES.length],
    widthPx: 1.6,
  };
}

/**
 * The style of the `index`-th overlay (a target or design curve drawn over the data): black and
 * heavier than any data curve, so it reads as the reference.
 */
export function overlayStyle(index: number): SeriesStyle {
  const dashes = ['none', '10 3 3 3', '14 4'];
  return { color: '#222222', dash: dashes[index % dashes.length], widthPx: 2.4 };
}

export const GRID_COLOUR = '#d9d9d9';
export const MINOR_GRID_COLOUR = '#eeeeee';
export const FRAME_COLOUR = '#333333';
export const TEXT_COLOUR = '#111111';

/** A white outline under a label, so it stays legible over grid lines and curves. */
export const HALO = { stroke: '#ffffff', 'stroke-width': 2.5, 'paint-order': 'stroke' } as const;

/** A mark over a plot (the building period, an Arias level): a thin grey line, a small haloed label. */
export const MARK_LINE = { stroke: '#777777', 'stroke-width': 0.9 } as const;
export const MARK_LABEL = { 'font-size': 9, fill: TEXT_COLOUR, ...HALO } as const;

/** Width of every figure: 640 px, 169 mm at 96 px to the inch, the text width of an A4 or letter page. */
export const FIGURE_WIDTH_PX = 640;

/** Font sizes and side margin shared by every figure, px. */
export const FIGURE_TEXT = {
  titlePx: 13,
  subtitlePx: 10,
  tickPx: 10,
  axisTitlePx: 10.5,
  notePx: 8.5,
  footerPx: 8,
  sidePx: 14,
} as const;

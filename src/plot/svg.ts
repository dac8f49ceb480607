import { createRequire } from 'node:module';
import type { JSDOM as JsdomClass } from 'jsdom';

// jsdom is large: it is loaded with the first figure, not at start-up, so that commands that draw
// nothing do not load it (the CLI bundle keeps it external for the same reason).
const require = createRequire(import.meta.url);
let JSDOM: typeof JsdomClass | undefined;

export const SVG_NS = 'http://www.w3.org/2000/svg';

/**
 * Attribute values. Numbers are written with at most two decimals (0.01 px is finer than any print),
 * except in data-* attributes, which keep the full value for readers of the file.
 */
export type Attributes = Readonly<Record<string, string | number | undefined>>;

/**
 * A standalone SVG document built in jsdom. Text and attribute values are set through the DOM and
 * written by its XML serializer, so everything that came from a file or an option is escaped there.
 */
export interface SvgDocument {
  readonly root: SVGSVGElement;
  /** Set attributes of a node, written as `element` writes them (an attribute set again keeps its place). */
  set(node: Element, attributes: Attributes): void;
  /** Append a child element with attributes. */
  element(parent: Element, name: string, attributes?: Attributes): SVGElement;
  /** Append a text element whose content is `content` (escaped on output). */
  text(parent: Element, content: string, attributes?: Attributes): SVGTextElement;
  /** The document as text, with an XML declaration. */
  serialize(): string;
}

/** A new SVG document `widthPx` × `heightPx`, with a matching viewBox and a generic sans-serif font. */
export function createSvgDocument(widthPx: number, heightPx: number): SvgDocument {
  JSDOM ??= (require('jsdom') as { JSDOM: typeof JsdomClass }).JSDOM;
  const dom = new JSDOM(`<svg xmlns="${SVG_NS}"/>`, { contentType: 'image/svg+xml' });
  const document = dom.window.document;
  const root = document.documentElement as unknown as SVGSVGElement;
  const set = (node: Element, attributes: Attributes) => {
    for (const [key, value] of Object.entries(attributes)) {
      if (value === undefined) continue;
      node.setAttribute(
        key,
        typeof value === 'number' && !key.startsWith('data-') ? formatCoordinate(value) : String(value),
      );
    }
  };
  set(root, {
    width: widthPx,
    height: heightPx,
    viewBox: `0 0 ${widthPx} ${heightPx}`,
    'font-family': 'sans-serif',
    'font-size': 10,
  });
  const element = (parent: Element, name: string, attributes: Attributes = {}) => {
    const node = document.createElementNS(SVG_NS, name) as SVGElement;
    set(node, attributes);
    parent.appendChild(node);
    return node;
  };
  return {
    root,
    set,
    element,
    text(parent, content, attributes = {}) {
      const node = element(parent, 'text', attributes) as SVGTextElement;
      node.textContent = content;
      return node;
    },
    serialize() {
      const body = new dom.window.XMLSerializer().serializeToString(root);
      return `<?xml version="1.0" encoding="UTF-8"?>\n${body}\n`;
    },
  };
}

/** A coordinate rounded to 0.01 with no trailing zeros. */
export function formatCoordinate(value: number): string {
  return String(Math.round(value * 100) / 100);
}

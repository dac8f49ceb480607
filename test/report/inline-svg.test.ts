import { JSDOM } from 'jsdom';
import { describe, expect, it } from 'vitest';
import { psaFigure } from '../../src/plot/index.js';
import { inlineSvg } from '../../src/report/inline-svg.js';
import { handSpectrum } from '../plot/helpers.js';

/** Parse as XML: jsdom's XML parser throws on anything that is not well formed. */
function parseXml(text: string): Document {
  return new JSDOM(text, { contentType: 'application/xml' }).window.document;
}

/** Every id the text defines, and every id it refers to through url(#…) or href="#…". */
function idsOf(text: string) {
  return {
    defined: [...text.matchAll(/\bid="([^"]+)"/g)].map((m) => m[1]),
    referred: [...text.matchAll(/url\(#([^)]+)\)|href="#([^"]+)"/g)].map((m) => m[1] ?? m[2]),
  };
}

const small = `<?xml version="1.0" encoding="UTF-8"?>
<svg xmlns="http://www.w3.org/2000/svg" xmlns:xlink="http://www.w3.org/1999/xlink" viewBox="0 0 10 10">
<defs><clipPath id="clip"><rect width="5" height="5"/></clipPath></defs>
<g clip-path="url(#clip)"><use href="#mark"/><path id="mark" d="M0 0L1 1"/></g>
</svg>`;

describe('inlineSvg', () => {
  it('drops the XML declaration and every namespace attribute, so the page names no address', () => {
    const inlined = inlineSvg(small, 'figure-1');
    expect(inlined.startsWith('<svg')).toBe(true);
    expect(inlined).not.toMatch(/<\?xml|xmlns|http/);
  });

  it('prefixes every id and every reference to it, and each reference still finds its id', () => {
    const { defined, referred } = idsOf(inlineSvg(small, 'figure-1'));
    expect(defined).toEqual(['figure-1-clip', 'figure-1-mark']);
    expect(referred.sort()).toEqual(['figure-1-clip', 'figure-1-mark']);
  });

  it('keeps the prefix to characters an id may hold', () => {
    expect(idsOf(inlineSvg(small, 'a b/c"d')).defined[0]).toBe('a-b-c-d-clip');
  });

  it('a drawn figure stays well-formed XML once the SVG namespace is put back (HTML parsers put it there)', () => {
    const figure = psaFigure(handSpectrum('invented <name> & "quotes"'), { methodDescription: 'test' });
    const inlined = inlineSvg(figure, 'spectra-1');
    const svg = inlined.replace('<svg', '<svg xmlns="http://www.w3.org/2000/svg"');
    const doc = parseXml(svg);
    expect(doc.documentElement.localName).toBe('svg');
    const { defined, referred } = idsOf(inlined);
    expect(defined.length).toBeGreaterThan(0);
    expect(defined.every((id) => id.startsWith('spectra-1-'))).toBe(true);
    for (const id of referred) expect(defined).toContain(id);
  });

  it('two figures on one page share no id', () => {
    const figure = psaFigure(handSpectrum(), { methodDescription: 'test' });
    const first = idsOf(inlineSvg(figure, 'spectra-1')).defined;
    const second = idsOf(inlineSvg(figure, 'spectra-2')).defined;
    expect(first.filter((id) => second.includes(id))).toEqual([]);
    expect(new Set([...first, ...second]).size).toBe(first.length + second.length);
  });

  it('an HTML parser reads the inlined figure as an SVG element of the page', () => {
    const page = new JSDOM(`<!DOCTYPE html><body>${inlineSvg(small, 'f')}</body>`).window.document;
    const svg = page.querySelector('svg');
    expect(svg?.namespaceURI).toBe('http://www.w3.org/2000/svg');
    expect(page.getElementById('f-clip')?.localName).toBe('clipPath');
  });
});

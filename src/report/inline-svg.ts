/**
 * Prepare a standalone SVG document (as the figures write it) for inlining into an HTML page:
 * drop the XML declaration and the namespace attribute (HTML parsers put `<svg>` in the SVG
 * namespace by themselves, and the page then names no address at all), and prefix every `id`
 * and every reference to it, since several figures on one page would otherwise share ids such
 * as their clip paths and clip each other's curves.
 */
export function inlineSvg(svg: string, prefix: string): string {
  const safe = prefix.replace(/[^A-Za-z0-9_-]/g, '-');
  return svg
    .replace(/^\s*<\?xml[^>]*\?>\s*/, '')
    .replace(/\s+xmlns(:[A-Za-z]+)?="[^"]*"/g, '')
    .replace(/\bid="([^"]+)"/g, (_, id: string) => `id="${safe}-${id}"`)
    .replace(/url\(#([^)]+)\)/g, (_, id: string) => `url(#${safe}-${id})`)
    .replace(/href="#([^"]+)"/g, (_, id: string) => `href="#${safe}-${id}"`);
}

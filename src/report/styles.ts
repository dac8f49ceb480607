/**
 * The report's style sheet, inlined into the page. Screen: one column of about the printed width.
 * Print: margins that fit both A4 (210 × 297 mm) and US letter (215.9 × 279.4 mm), so the page
 * prints on whichever paper the printer holds; each figure starts a new page and is scaled to the
 * narrower printable area of the two (182 × 247 mm). Printed pages are numbered "Page n of N" in
 * the bottom margin (CSS paged media: @page margin boxes with the page and pages counters).
 */
export const REPORT_CSS = `
:root { color-scheme: light; }
* { box-sizing: border-box; }
html { font-family: "Helvetica Neue", Arial, "Liberation Sans", "DejaVu Sans", sans-serif; font-size: 10.5pt; color: #111; background: #fff; }
body { margin: 0 auto; padding: 18px 24px 48px; max-width: 860px; line-height: 1.4; }
header.title { border-bottom: 2px solid #111; padding-bottom: 8px; margin-bottom: 12px; }
header.title h1 { font-size: 17pt; margin: 0 0 4px; font-weight: 700; }
header.title p { margin: 2px 0; color: #333; }
.caution { border: 2px solid #8a5a00; background: #fff6e0; padding: 8px 12px; margin: 12px 0 18px; font-weight: 600; }
p.intro { margin: 6px 0; }
.caution-inline { border-left: 4px solid #8a5a00; padding: 4px 10px; font-weight: 600; }
.warnings { border-left: 4px solid #8a5a00; padding: 4px 10px; margin: 8px 0; }
.warnings strong { display: block; font-size: 9pt; text-transform: uppercase; letter-spacing: 0.06em; color: #6b4500; }
.warnings ul { margin: 2px 0; padding-left: 18px; }
.caution strong { display: block; text-transform: uppercase; letter-spacing: 0.06em; font-size: 9pt; color: #6b4500; margin-bottom: 2px; }
nav.contents ol { margin: 4px 0 0; padding-left: 0; list-style: none; columns: 2; }
h2 { font-size: 13pt; margin: 22px 0 6px; border-bottom: 1px solid #999; padding-bottom: 2px; }
h3 { font-size: 11pt; margin: 14px 0 4px; }
table { border-collapse: collapse; margin: 6px 0 12px; font-size: 9.5pt; width: 100%; }
caption { text-align: left; font-weight: 600; padding: 2px 0 4px; }
th, td { border: 1px solid #bbb; padding: 3px 6px; vertical-align: top; text-align: left; }
thead th { background: #eee; }
table.facts th { width: 34%; background: #f6f6f6; font-weight: 600; }
td.num { text-align: right; font-variant-numeric: tabular-nums; white-space: nowrap; }
code, .command { font-family: "DejaVu Sans Mono", "Liberation Mono", Consolas, monospace; font-size: 9pt; }
.command { background: #f4f4f4; border: 1px solid #ccc; padding: 6px 8px; white-space: pre-wrap; overflow-wrap: anywhere; }
figure { margin: 14px 0; }
figure svg { display: block; width: 100%; max-width: 640px; height: auto; margin: 0 auto; }
figcaption { font-size: 9.5pt; margin-top: 4px; }
.note { color: #444; font-size: 9.5pt; }
.nondeterministic { border-left: 3px solid #999; padding-left: 8px; }
footer { margin-top: 24px; border-top: 1px solid #999; padding-top: 6px; font-size: 9pt; color: #333; }
table.title-block { width: auto; min-width: 60%; margin: 8px 0 0; }
table.title-block th { background: #f6f6f6; font-weight: 600; width: 9em; }
table.title-block td { min-width: 14em; }
span.blank { display: inline-block; min-width: 14em; border-bottom: 1px solid #111; height: 1.1em; vertical-align: bottom; }
td.signature span.blank { min-width: 10em; }
.input-hashes td:last-child { font-family: "DejaVu Sans Mono", "Liberation Mono", Consolas, monospace; font-size: 8pt; overflow-wrap: anywhere; }
@page {
  margin: 16mm 14mm 16mm 14mm;
  @bottom-right { content: "Page " counter(page) " of " counter(pages); font-family: sans-serif; font-size: 8pt; color: #333; }
}
@media print {
  html { font-size: 9.5pt; }
  body { max-width: none; padding: 0; }
  nav.contents { break-after: page; }
  h2 { break-after: avoid; }
  table, tr { break-inside: avoid; }
  figure { break-before: page; break-inside: avoid; margin: 0; }
  figure svg { width: 100%; max-width: 182mm; max-height: 225mm; }
  .caution { background: none; }
}
`;

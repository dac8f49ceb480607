/** Rough width of running text: 0.5 em a character, a little over the average of common sans-serif faces. */
function proseWidthPx(text: string, fontSizePx: number): number {
  return text.length * fontSizePx * 0.5;
}

/** Break `text` into lines that fit `widthPx` at `fontSizePx`, at spaces; a longer word stands alone. */
export function wrapText(text: string, widthPx: number, fontSizePx: number): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of text.split(/\s+/).filter((w) => w.length > 0)) {
    const candidate = line.length > 0 ? `${line} ${word}` : word;
    if (line.length > 0 && proseWidthPx(candidate, fontSizePx) > widthPx) {
      lines.push(line);
      line = word;
    } else {
      line = candidate;
    }
  }
  if (line.length > 0) lines.push(line);
  return lines;
}

/** A damping ratio as a percentage, e.g. 0.05 → "5%". */
export function percentLabel(damping: number): string {
  return `${Number((damping * 100).toPrecision(6))}%`;
}

/** A peak value for a label, four significant digits. */
export function formatValue(value: number): string {
  if (value === 0) return '0';
  const magnitude = Math.abs(value);
  const text =
    magnitude >= 1e-3 && magnitude < 1e5 ? String(Number(value.toPrecision(4))) : value.toExponential(3);
  return text.replace('-', '−');
}

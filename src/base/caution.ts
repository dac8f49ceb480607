/** The standing caution, carried by every output (terminal, JSON, CSV, SVG, HTML); written only here. */
export const CAUTION =
  'Preliminary engineering aid only. Results depend on the record, its processing and the ' +
  'assumptions stated with them; they are not a design and not a check of anchor capacity. ' +
  'Have every number reviewed by a licensed structural engineer and follow the governing local ' +
  'building code.';

/** Wrap a paragraph greedily at `width` columns, the first line after `first`, the others after `rest`. */
export function wrapText(text: string, width: number, first = '', rest = ''): string[] {
  const lines: string[] = [];
  const [head, ...words] = text.split(' ');
  let line = first + head;
  for (const word of words) {
    if (line.length + 1 + word.length > width) {
      lines.push(line);
      line = rest + word;
    } else {
      line = `${line} ${word}`;
    }
  }
  lines.push(line);
  return lines;
}

/** The caution as lines of at most `width` characters, for terminal tables and CSV comments. */
export function cautionLines(width = 96): string[] {
  return wrapText(CAUTION, width);
}

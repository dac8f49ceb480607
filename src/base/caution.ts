/**
 * The standing caution. Every output of quakesweep (terminal, JSON, CSV, SVG, HTML) carries this
 * text, and this module is the only place it is written.
 */
export const CAUTION =
  'Preliminary engineering aid only. Results depend on the record, its processing and the ' +
  'assumptions stated with them; they are not a design and not a check of anchor capacity. ' +
  'Have every number reviewed by a licensed structural engineer and follow the governing local ' +
  'building code.';

/** The caution as lines of at most `width` characters, for terminal tables and CSV comments. */
export function cautionLines(width = 96): string[] {
  const lines: string[] = [];
  let line = '';
  for (const word of CAUTION.split(' ')) {
    if (line.length > 0 && line.length + 1 + word.length > width) {
      lines.push(line);
      line = word;
    } else {
      line = line.length > 0 ? `${line} ${word}` : word;
    }
  }
  if (line.length > 0) lines.push(line);
  return lines;
}

/** How the fields of a line are separated; `whitespace` is runs of spaces and tabs. */
export type Separator = ',' | ';' | 'whitespace';

export const LINE_BREAK = /\r\n|\n|\r/;

/** Longest line read, in characters as it stands; a longer one is refused where it is. */
export const MAX_LINE_CHARACTERS = 1_000_000;

/**
 * The separator of the first line of only numbers and separators (so a header cannot mislead it);
 * `partial`: the text is cut mid-stream, its last line unread. It stops before a line too long to read.
 */
export function sniffSeparator(text: string, skip: number, partial = false): Separator {
  return sniffFields(text, skip, partial).separator;
}

/**
 * The separator, and whether decimals are written with commas in a file separated by tabs
 * (`0,0125\t-0,0031`), told by the same first line of numbers; a comma cannot split fields there.
 */
export function sniffFields(
  text: string,
  skip: number,
  partial = false,
): { separator: Separator; tabDecimalCommas: boolean } {
  let lines = text.split(LINE_BREAK, skip + 2000);
  const long = lines.findIndex((l) => l.length > MAX_LINE_CHARACTERS);
  if (long !== -1) lines = lines.slice(0, long);
  else if (partial) lines.pop();
  let firstText: string | undefined;
  for (const raw of lines.slice(skip)) {
    const line = raw.trim(); // a byte-order mark is white space to trim()
    if (line === '' || line.startsWith('#')) continue;
    if (/^[0-9eEdD+\-.,;\s]+$/.test(line) && /\d/.test(line)) {
      const separator = separatorOf(line);
      return { separator, tabDecimalCommas: separator === 'whitespace' && line.includes(',') };
    }
    firstText ??= line;
  }
  return { separator: firstText === undefined ? ',' : separatorOf(firstText), tabDecimalCommas: false };
}

function separatorOf(line: string): Separator {
  if (line.includes(';')) return ';';
  if (line.includes('\t')) return 'whitespace';
  if (line.includes(',')) return ',';
  return 'whitespace';
}

import { inputError } from '../base/errors.js';
import { MAX_LINE_CHARACTERS, type Separator } from './separator.js';

/** Each space and each tab separates for the whitespace separator. */
const BLANK = /[ \t]/;

/**
 * The fields of one line: the text before any `#`, split at each separator, trimmed for `,` and `;`;
 * none for a blank or comment line; a `"` is part of a field. The tests check this against csv-parse
 * (delimiter, trim, comment '#', quote false, skip_empty_lines, max_record_size 1,000,000).
 */
export function lineFields(text: string, separator: Separator, file: string, line: number): string[] {
  const hash = text.indexOf('#');
  const kept = hash === -1 ? text : text.slice(0, hash);
  const trimmed = separator !== 'whitespace';
  const spans = trimmed ? kept.split(separator) : kept.split(BLANK);
  // A character is at most 3 bytes of UTF-8, so only a line this long can pass the limit in bytes.
  if (text.length * 3 > MAX_LINE_CHARACTERS) sizeLimit(spans, trimmed, file, line);
  const fields = trimmed ? spans.map((span) => span.trim()) : spans;
  return fields.length === 1 && fields[0] === '' ? [] : fields;
}

/** csv-parse's size limit as it counts: the fields before as kept, and this one's UTF-8 bytes so far. */
function sizeLimit(spans: string[], trimmed: boolean, file: string, line: number): void {
  let before = 0;
  for (const span of spans) {
    const appended = trimmed ? span.trimStart() : span;
    const bytes = Buffer.byteLength(appended, 'utf8');
    if (span.length > 0 && before + Math.max(0, bytes - 1) > MAX_LINE_CHARACTERS)
      throw longLineError(file, line);
    before += trimmed ? appended.trimEnd().length : appended.length;
  }
}

export function longLineError(file: string, line: number | undefined) {
  return inputError(`a line longer than ${MAX_LINE_CHARACTERS} characters: is this a text record?`, {
    file,
    line,
  });
}

/** A field as shown in a message: quoted, cut short, with unprintable characters escaped. */
export function quote(text: string): string {
  const short = text.length > 40 ? `${text.slice(0, 40)}…` : text;
  return `'${escapeUnprintable(short)}'`;
}

/**
 * Text from a file as a message shows it: unprintable characters escaped (\xNN, \uNNNN); line and
 * paragraph separators and the byte-order mark too, so that the message stays one line.
 */
export function escapeUnprintable(text: string): string {
  return text.replace(/[^\x20-\x7e\u00a0-\u2027\u202a-\ufefe\uff00-\uffff]/g, (c) => {
    const hex = c.charCodeAt(0).toString(16);
    return hex.length <= 2 ? `\\x${hex.padStart(2, '0')}` : `\\u${hex.padStart(4, '0')}`;
  });
}

import { createRequire } from 'node:module';
import type { Options as CsvOptions } from 'csv-parse';
import { inputError } from '../base/errors.js';
import { MAX_LINE_CHARACTERS, type Separator } from './separator.js';

/**
 * csv-parse's synchronous build, loaded on first use: a file of plain lines never needs it, and
 * loading it is a sizeable part of a short run.
 */
let csvParseSync: typeof import('csv-parse/sync') | undefined;
const requireHere = createRequire(import.meta.url);
const csvSync = () => (csvParseSync ??= requireHere('csv-parse/sync') as typeof import('csv-parse/sync'));

/**
 * The characters of a plain line, which csv-parse would split the same way as a plain `split`:
 * 1 for digits, letters, signs, points, commas, semicolons, the underscore, brackets, slashes and
 * the percent sign (what numbers and a header row of names are written with), 2 for space and
 * tab, 0 for anything else. No `#` (a comment), no quote, no character csv-parse trims other
 * than space and tab, no control character, nothing outside ASCII.
 */
const PLAIN_CHARACTERS = (() => {
  const kinds = new Uint8Array(128);
  const letters = 'abcdefghijklmnopqrstuvwxyz';
  for (const c of `0123456789${letters}${letters.toUpperCase()}+-.,;_()[]/%`) kinds[c.charCodeAt(0)] = 1;
  kinds[32] = 2;
  kinds[9] = 2;
  return kinds;
})();

/**
 * The fields of a plain line (no line break in it) as csv-parse gives them with the options
 * below: split at each separator (each space or tab for the whitespace separator) and, for `,`
 * and `;`, trimmed of spaces and tabs; none for a line of only spaces and tabs, which csv-parse
 * skips as empty. Undefined for a line that is not plain, which goes to csvFields. One pass over
 * the characters; String.prototype.split and a regular expression for the check were slower.
 */
export function plainFields(line: string, separator: Separator): string[] | undefined {
  const fields: string[] = [];
  const whitespace = separator === 'whitespace';
  const separatorCode = whitespace ? -1 : separator.charCodeAt(0);
  let from = 0;
  let spaces = false;
  for (let i = 0; i < line.length; i++) {
    const c = line.charCodeAt(i);
    const kind = c < 128 ? PLAIN_CHARACTERS[c] : 0;
    if (kind === 0) return undefined;
    if (c === separatorCode || (kind === 2 && whitespace)) {
      fields.push(line.slice(from, i));
      from = i + 1;
    } else if (kind === 2) {
      spaces = true;
    }
  }
  fields.push(from === 0 ? line : line.slice(from));
  if (spaces) {
    // csv-parse's trim; in a plain line the only characters it trims are spaces and tabs.
    for (let i = 0; i < fields.length; i++) fields[i] = fields[i].trim();
    if (fields.length === 1 && fields[0] === '') return [];
  }
  return fields;
}

/**
 * csv-parse's fields for one line that is not plain, the authority on comments, quotes and the
 * characters it trims; undefined for a comment or a line it skips. `file` and `line` place its
 * errors.
 */
export function csvFields(
  text: string,
  separator: Separator,
  file: string,
  line: number,
): string[] | undefined {
  try {
    return (csvSync().parse(text, csvOptions(separator)) as string[][])[0];
  } catch (error) {
    if (!(csvParseSync !== undefined && error instanceof csvParseSync.CsvError)) throw error;
    if (error.code === 'CSV_MAX_RECORD_SIZE') throw longLineError(file, line);
    throw inputError(`cannot read this line (${error.message.split('\n')[0]})`, { file, line });
  }
}

/**
 * How csv-parse reads a line with this separator: no quotes (a `"` is part of a field), `#`
 * starts a comment, no byte-order mark (the line splitter removes the one at the start of a file).
 */
function csvOptions(separator: Separator): CsvOptions {
  return {
    delimiter: separator === 'whitespace' ? [' ', '\t'] : separator,
    trim: separator !== 'whitespace',
    bom: false,
    comment: '#',
    quote: false,
    skip_empty_lines: true,
    relax_column_count: true,
    record_delimiter: ['\r\n', '\n', '\r'],
    max_record_size: MAX_LINE_CHARACTERS,
  };
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
  // Line and paragraph separators and the byte-order mark are escaped too, so the message stays one visible line.
  return `'${short.replace(/[^\x20-\x7e\u00a0-\u2027\u202a-\ufefe\uff00-\uffff]/g, (c) => {
    const code = c.charCodeAt(0);
    return code <= 0xff
      ? `\\x${code.toString(16).padStart(2, '0')}`
      : `\\u${code.toString(16).padStart(4, '0')}`;
  })}'`;
}

/**
 * Text from files and command lines made safe to print and to put in XML (SVG, HTML): terminal
 * control sequences (ESC and CSI/OSC sequences, C1 controls) are removed, so that a name cannot
 * move the cursor, retitle the window or recolour the terminal; characters XML 1.0 forbids (C0
 * controls but tab and line breaks, lone surrogates, U+FFFE, U+FFFF) are removed; tabs and line
 * breaks become spaces, as a name is one line.
 */
const ESCAPE_SEQUENCE =
  // biome-ignore lint/suspicious/noControlCharactersInRegex: removing control sequences is the point
  /\u001b(?:\[[0-?]*[ -/]*[@-~]?|\][^\u0007\u001b]*(?:\u0007|\u001b\\)?|[@-Z\\-_]?)|\u009b[0-?]*[ -/]*[@-~]?|\u009d[^\u0007]*\u0007?/g;
const FORBIDDEN =
  // biome-ignore lint/suspicious/noControlCharactersInRegex: removing control characters is the point
  /[\u0000-\u0008\u000b\u000c\u000e-\u001f\u007f-\u009f\ufffe\uffff]|[\ud800-\udbff](?![\udc00-\udfff])|(?<![\ud800-\udbff])[\udc00-\udfff]/g;

export function printable(text: string): string {
  return markupSafe(text).replace(/[\t\r\n\u2028\u2029]/g, ' ');
}

/** The same without joining lines: for text kept over several lines (a file name in a report's table or command line, a note). */
export function markupSafe(text: string): string {
  return text.replace(ESCAPE_SEQUENCE, '').replace(FORBIDDEN, '');
}

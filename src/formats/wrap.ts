/** Wrap a paragraph at `width` columns, the first line after `first`, the others after `rest`. */
export function wrapText(text: string, width: number, first: string, rest: string): string[] {
  const lines: string[] = [];
  let line = first;
  let fresh = true;
  for (const word of text.split(' ')) {
    if (!fresh && line.length + 1 + word.length > width) {
      lines.push(line);
      line = rest + word;
    } else {
      line = fresh ? line + word : `${line} ${word}`;
    }
    fresh = false;
  }
  lines.push(line);
  return lines;
}

// Breaks file text into lines the way an editor numbers them: LF, CRLF or a lone CR, BOM removed.

export function splitLines(text: string): string[] {
  const body = text.charCodeAt(0) === 0xfeff ? text.slice(1) : text;
  // Splitting on a plain string is much faster than on a pattern, and lone-CR files are rare.
  const lines = body.includes('\n') ? body.split('\n') : body.split('\r');
  for (let i = 0; i < lines.length; i++) {
    const line = lines[i];
    if (line.charCodeAt(line.length - 1) === 13) lines[i] = line.slice(0, -1);
  }
  // A final line end closes the last line rather than starting an empty one.
  if (lines.length > 1 && lines[lines.length - 1] === '') lines.pop();
  return lines;
}

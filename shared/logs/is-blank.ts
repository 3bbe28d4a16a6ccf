// Whether a line holds only spaces or tabs, without making a trimmed copy of every line of a large file.

export function isBlank(text: string): boolean {
  for (let i = 0; i < text.length; i++) {
    const c = text.charCodeAt(i);
    if (c !== 32 && c !== 9 && c !== 13 && c !== 160) return false;
  }
  return true;
}

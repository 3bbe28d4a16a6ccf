// Writes a validation issue's location the way a person would type it: lots[2].expiry.
export function formatIssuePath(path: readonly PropertyKey[]): string {
  if (path.length === 0) return '(file)';
  return path.reduce<string>((text, key) => {
    if (typeof key === 'number') return `${text}[${key}]`;
    return text === '' ? String(key) : `${text}.${String(key)}`;
  }, '');
}

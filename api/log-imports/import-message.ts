// The one sentence an import ends with, the same on the page and in the CLI.

const plural = (n: number, word: string) => `${n.toLocaleString('en-US')} ${word}${n === 1 ? '' : 's'}`;

export function importMessage(detail: { readingsStored: number; duplicates: number; conflicts: number; skipped: number }, opened: number): string {
  const parts = [`Stored ${plural(detail.readingsStored, 'reading')}`];
  const extras = [
    detail.duplicates ? `${plural(detail.duplicates, 'reading')} already stored` : '',
    detail.conflicts ? `${plural(detail.conflicts, 'conflicting value')} kept as first stored` : '',
    detail.skipped ? `${plural(detail.skipped, 'row')} skipped` : '',
  ].filter(Boolean);
  if (extras.length) parts.push(`(${extras.join(', ')})`);
  return `${parts.join(' ')}; ${opened ? `${plural(opened, 'excursion')} opened` : 'no new excursion'}.`;
}

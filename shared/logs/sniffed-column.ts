// A column as the sniffer sees it: its header and what most of its cells look like.
import { cellKind, type CellKind } from './cell-kind.js';

export interface SniffedColumn {
  /** 0-based. */
  readonly index: number;
  readonly name: string;
  readonly kind: CellKind;
}

/** The kind most non-empty cells share; `empty` only when every cell is. */
export function describeColumns(header: readonly string[], rows: readonly (readonly string[])[]): SniffedColumn[] {
  const width = Math.max(header.length, ...rows.map((r) => r.length));
  return Array.from({ length: width }, (_, index) => {
    const counts = new Map<CellKind, number>();
    for (const row of rows) {
      const kind = cellKind(row[index] ?? '');
      if (kind !== 'empty') counts.set(kind, (counts.get(kind) ?? 0) + 1);
    }
    let kind: CellKind = 'empty';
    let most = 0;
    for (const [k, n] of counts) if (n > most) [kind, most] = [k, n];
    return { index, name: (header[index] ?? '').trim(), kind };
  });
}

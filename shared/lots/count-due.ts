// When a fridge's stock count is due: monthly, and again once a shipment was put into it since the last count.
export const countIntervalDays = 30;
const day = 86_400_000;

export type CountDueReason = 'never_counted' | 'over_interval' | 'received_since';

export interface CountDueInput {
  /** Epoch ms of the fridge's last submitted count, or null if never counted. */
  lastCountAt: number | null;
  /** Epoch ms of the latest receipt (a shipment's vials put into the fridge), or null if none. */
  lastReceiptAt: number | null;
  now: number;
}

export interface CountDue {
  due: boolean;
  reasons: CountDueReason[];
  /** When the monthly count falls due (epoch ms), or null when never counted (due now). */
  dueAt: number | null;
}

export function countDue(input: CountDueInput): CountDue {
  if (input.lastCountAt === null) return { due: true, reasons: ['never_counted'], dueAt: null };
  const dueAt = input.lastCountAt + countIntervalDays * day;
  const reasons: CountDueReason[] = [];
  if (input.now > dueAt) reasons.push('over_interval');
  if (input.lastReceiptAt !== null && input.lastReceiptAt > input.lastCountAt) reasons.push('received_since');
  return { due: reasons.length > 0, reasons, dueAt };
}

export const countDueReasonLabels: Record<CountDueReason, string> = {
  never_counted: 'never counted',
  over_interval: `last count over ${countIntervalDays} days ago`,
  received_since: 'shipment received since the last count',
};

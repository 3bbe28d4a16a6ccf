// Why storage staff discard vials themselves (the veterinarian's discard decision posts its own movement); zod-free for the client.
export const discardReasons = ['expired', 'damaged', 'other'] as const;
export type DiscardReason = (typeof discardReasons)[number];

export const discardReasonLabels: Record<DiscardReason, string> = {
  expired: 'Expired',
  damaged: 'Damaged (broken, leaking, label unreadable)',
  other: 'Other (say why)',
};

// Why a lot is held "do not use"; receiving opens arrival holds, the lots feature the others.
export const holdCauses = ['arrival', 'excursion', 'freeze', 'transfer', 'return', 'recall'] as const;
export type HoldCause = (typeof holdCauses)[number];

export const holdCauseLabels: Record<HoldCause, string> = {
  arrival: 'Arrival',
  excursion: 'Excursion',
  freeze: 'Freeze',
  transfer: 'Transfer',
  return: 'Return',
  recall: 'Recall',
};

export interface HoldView {
  id: number;
  lotId: number;
  cause: HoldCause;
  sourceKind: string;
  sourceId: number | null;
  reason: string;
  openedAt: string;
  openedBy: string | null;
}

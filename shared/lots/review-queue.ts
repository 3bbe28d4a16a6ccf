// The veterinarian's queue as the API sends it: undecided holds grouped by the event behind them.
export interface QueueLot {
  holdId: number;
  lotId: number;
  lotNumber: string;
  expiry: string;
  product: string;
  dosesPerVial: number;
  vials: number;
  doses: number;
  siteId: number;
  reason: string;
  openedAt: string;
}

export interface QueueEvent {
  cause: string;
  sourceKind: string;
  sourceId: number | null;
  openedAt: string;
  lots: QueueLot[];
  vials: number;
  doses: number;
}

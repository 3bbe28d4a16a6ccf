// The veterinarian's queue as the API sends it: undecided holds grouped by the event behind them.
import type { ExposureEventView, TroubleshootingView } from './exposure-event-view.js';

export interface QueueRecall {
  id: number;
  lotNumber: string;
  reason: string;
  placedBy: string;
  placedAt: string;
}
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
  /** How the event is named wherever it appears. */
  title: string;
  /** Freezing of a freeze-sensitive product: shown as severe. */
  severe: boolean;
  /**
   * The zone of the site the event happened on, whose clock its times are shown on: the fridge's site, else the one
   * site all its lots are on; null when they are on several (a recall), shown on the reader's own clock.
   */
  timeZone: string | null;
  /** The fridge readings behind an excursion or freeze hold, kept even when a recompute replaced the fridge's record. */
  exposureEvent: ExposureEventView | null;
  troubleshooting: TroubleshootingView | null;
  recall: QueueRecall | null;
}

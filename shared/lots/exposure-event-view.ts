// An exposure event (the fridge readings behind automatic holds) and its troubleshooting record, as the API sends them.
export interface ExposureEventView {
  id: number;
  fridgeId: number;
  fridgeName: string;
  siteId: number;
  cause: 'excursion' | 'freeze';
  source: 'readings' | 'daily_check';
  kind: 'high' | 'low';
  start: string;
  end: string;
  /** Null for a daily check: one value seen, no duration known. */
  minutes: number | null;
  peakC: number;
  degreeMinutesC: number | null;
  /** MKT of the 24 hours ending when the event ends (USP PF 44(4)). */
  mkt24hC: number | null;
  openEnded: boolean;
  lowC: number;
  highC: number;
  fridgeLowC: number;
  fridgeHighC: number;
  /** Whether the fridge's own alarm range showed it too. */
  fridgeAlarmed: boolean;
  followUpOfId: number | null;
  title: string;
  /** All the event's holds are decided: the troubleshooting record is closed. */
  decided: boolean;
}

export interface TroubleshootingView {
  exposureEventId: number;
  foundAt: string | null;
  unitTempC: number | null;
  unitMinC: number | null;
  unitMaxC: number | null;
  roomTempC: number | null;
  enteredUnit: 'F' | 'C';
  foundBy: string;
  whatHappened: string;
  minutesSinceInRange: number | null;
  backInStorageAt: string | null;
  contacted: string;
  preventiveAction: string;
  updatedBy: string;
  updatedAt: string;
}

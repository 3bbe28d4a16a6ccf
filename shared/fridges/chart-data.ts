// What the fridge chart is drawn from: raw readings for short ranges, per-bucket minimum and maximum for long ones.

export interface ChartPoint {
  at: string;
  tempC: number;
}

export interface ChartBucket {
  /** Start of the bucket. */
  at: string;
  minC: number;
  maxC: number;
  count: number;
}

export interface ChartSeries {
  /** Raw when the range holds few enough readings; buckets otherwise (never both). */
  points: ChartPoint[];
  buckets: ChartBucket[];
}

export interface ChartData {
  from: string;
  to: string;
  /** Width of a bucket in minutes; 0 when the points are raw readings. */
  bucketMinutes: number;
  lowC: number;
  highC: number;
  primary: ChartSeries;
  /** Only the backup readings that fill gaps of the primary logger. */
  backup: ChartSeries;
}

/** At most about this many points per request: each bucket gives two (its minimum and its maximum). */
export const CHART_MAX_POINTS = 2000;

// Turns local clock readings into UTC instants in one zone, settling the clock changes by file order.
import { Info, type Zone } from 'luxon';

const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;
/** Half-width of a span of wall times known to share one offset; with offsets under 14 h it stays inside ±1 day. */
const SPAN_MS = 10 * HOUR_MS;

/** Offsets (minutes) valid for a wall time: none in a spring-forward gap, two in the repeated autumn hour. */
interface WallOffsets {
  /** The larger offset (daylight time), i.e. the earlier instant. NaN in a gap. */
  readonly early: number;
  /** Equal to `early` unless the wall time occurs twice. */
  readonly late: number;
}

const NONEXISTENT: WallOffsets = { early: NaN, late: NaN };

/**
 * Stateful, because the repeated autumn hour can only be told apart by the order of the rows:
 * readings in it take the daylight offset until the clock is seen to go back about an hour,
 * then the standard offset until a reading falls outside the repeated hour again.
 */
export class LocalTimeResolver {
  private readonly zone: Zone;
  private readonly fixedOffset: number | undefined;
  /** Wall times in [spanStart, spanEnd) share spanOffset (NaN: look up per hour), so most rows need no lookup. */
  private spanStart = NaN;
  private spanEnd = NaN;
  private spanOffset = NaN;
  /** Offsets per local hour near a clock change, computed with luxon once; null marks an hour the change splits. */
  private readonly hours = new Map<number, WallOffsets | null>();
  private lastHour = NaN;
  private lastHourOffsets: WallOffsets | null = null;
  private previousWall = NaN;
  private lastStep = 0;
  private previousAmbiguous = false;
  private secondPass = false;

  constructor(zoneName: string) {
    const zone = /^(local|system)$/i.test(zoneName.trim()) ? undefined : Info.normalizeZone(zoneName.trim());
    // The host's own zone would make results depend on the server, so it is refused like an unknown zone.
    if (!zone || !zone.isValid || zone.type === 'system') throw new RangeError(`unknown time zone '${zoneName}'`);
    this.zone = zone;
    this.fixedOffset = zone.isUniversal ? zone.offset(0) : undefined;
  }

  static isKnownZone(zoneName: string): boolean {
    try {
      new LocalTimeResolver(zoneName);
      return true;
    } catch {
      return false;
    }
  }

  /** UTC epoch ms for a wall time (clock reading written as if UTC); NaN when it does not exist in the zone. */
  resolve(wallMs: number): number {
    if (this.fixedOffset !== undefined) return wallMs - this.fixedOffset * 60_000;
    if (!(wallMs >= this.spanStart && wallMs < this.spanEnd)) this.findSpan(wallMs);
    if (!Number.isNaN(this.spanOffset)) {
      this.noteUnambiguous(wallMs);
      return wallMs - this.spanOffset * 60_000;
    }
    const offsets = this.offsetsAt(wallMs);
    let offset = offsets.early;
    if (Number.isNaN(offset)) return NaN;
    if (offsets.early === offsets.late) this.noteUnambiguous(wallMs);
    else {
      const back = this.previousWall - wallMs + this.lastStep;
      const shiftMs = (offsets.early - offsets.late) * 60_000;
      // Adding the usual step makes "went back an hour" work for hourly rows (01:00, 01:00)
      // as well as for minutely ones (01:59, 01:00).
      if (!this.secondPass && this.previousAmbiguous && back >= shiftMs / 2) this.secondPass = true;
      this.previousAmbiguous = true;
      if (this.secondPass) offset = offsets.late;
      this.noteWall(wallMs);
    }
    return wallMs - offset * 60_000;
  }

  private noteUnambiguous(wallMs: number): void {
    this.secondPass = false;
    this.previousAmbiguous = false;
    this.noteWall(wallMs);
  }

  private noteWall(wallMs: number): void {
    if (wallMs > this.previousWall) this.lastStep = wallMs - this.previousWall;
    this.previousWall = wallMs;
  }

  /**
   * The same offset a day either side (and valid) means no clock change near this wall time — zones
   * never change twice within two days — so the whole span around it shares that offset.
   */
  private findSpan(wallMs: number): void {
    const before = this.zone.offset(wallMs - DAY_MS);
    const constant =
      before === this.zone.offset(wallMs + DAY_MS) && this.zone.offset(wallMs - before * 60_000) === before;
    if (constant) {
      [this.spanStart, this.spanEnd, this.spanOffset] = [wallMs - SPAN_MS, wallMs + SPAN_MS, before];
    } else {
      // Near a change: the span shrinks to this local hour, whose offsets come from the hourly cache.
      const hourStart = Math.floor(wallMs / HOUR_MS) * HOUR_MS;
      [this.spanStart, this.spanEnd, this.spanOffset] = [hourStart, hourStart + HOUR_MS, NaN];
    }
  }

  private offsetsAt(wallMs: number): WallOffsets {
    const hour = Math.floor(wallMs / HOUR_MS);
    if (hour !== this.lastHour) {
      let cached = this.hours.get(hour);
      if (cached === undefined) {
        const start = this.computeOffsets(hour * HOUR_MS);
        const end = this.computeOffsets(hour * HOUR_MS + HOUR_MS - 1);
        cached = Object.is(start.early, end.early) && Object.is(start.late, end.late) ? start : null;
        this.hours.set(hour, cached);
      }
      this.lastHour = hour;
      this.lastHourOffsets = cached;
    }
    // Zones that change at a half hour split an hour; those rare hours are worked out per reading.
    return this.lastHourOffsets ?? this.computeOffsets(wallMs);
  }

  /** Candidate offsets are the ones a day either side; a candidate counts if the zone agrees at its instant. */
  private computeOffsets(wallMs: number): WallOffsets {
    const before = this.zone.offset(wallMs - DAY_MS);
    const after = this.zone.offset(wallMs + DAY_MS);
    const valid = [...new Set([before, after])].filter((o) => this.zone.offset(wallMs - o * 60_000) === o);
    if (valid.length === 0) return NONEXISTENT;
    return { early: Math.max(...valid), late: Math.min(...valid) };
  }
}

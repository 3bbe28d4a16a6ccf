// The fast path for reading a timestamp: a hand-written scanner and arithmetic, nothing allocated per row.
import type { DateOrder } from './log-layout.js';

const DAYS_IN_MONTH = [31, 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];

function daysInMonth(year: number, month: number): number {
  if (month === 2 && year % 4 === 0 && (year % 100 !== 0 || year % 400 === 0)) return 29;
  return DAYS_IN_MONTH[month - 1];
}

const isSpace = (c: number) => c === 32 || c === 9;
const isDigit = (c: number) => c >= 48 && c <= 57;
/** Lower-cases an ASCII letter's code. */
const lower = (c: number) => c | 32;

/**
 * Reads one timestamp into `wallMs` (the clock reading, as if it were UTC) and `offsetMinutes`
 * (NaN when the text has no offset, so it is a local time for the zone to settle).
 * Accepts the shapes of DATE_TIME_PATTERN in timestamp-patterns.ts, which the sniffer uses to
 * recognise them; the scanner exists because a regex match per row costs several times more.
 * One instance is reused across rows.
 */
export class TimestampParser {
  wallMs = NaN;
  offsetMinutes = NaN;
  /** Rows come in date order, so the start of the last day seen is usually the one needed. */
  private dayKey = -1;
  private dayMs = NaN;
  private text = '';
  private pos = 0;

  constructor(private readonly dateOrder: DateOrder) {}

  parse(text: string): boolean {
    this.text = text;
    this.pos = 0;
    this.skipSpaces();
    const start1 = this.pos;
    const a = this.digits(4);
    const aLength = this.pos - start1;
    const separator = text.charCodeAt(this.pos);
    if (aLength === 0 || (separator !== 45 && separator !== 47 && separator !== 46)) return false;
    this.pos++;
    const b = this.digits(2);
    if (b < 0 || text.charCodeAt(this.pos) !== separator) return false;
    this.pos++;
    const start3 = this.pos;
    const c = this.digits(4);
    const cLength = this.pos - start3;
    if (cLength === 0 || !this.dateTimeSeparator()) return false;

    let year: number, month: number, day: number;
    if (aLength > 2 || this.dateOrder === 'YMD') {
      if (cLength > 2) return false;
      year = aLength <= 2 ? 2000 + a : a;
      month = b;
      day = c;
    } else {
      if (cLength !== 2 && cLength !== 4) return false;
      year = cLength === 2 ? 2000 + c : c;
      month = this.dateOrder === 'MDY' ? a : b;
      day = this.dateOrder === 'MDY' ? b : a;
    }

    let hour = this.digits(2);
    if (hour < 0 || text.charCodeAt(this.pos++) !== 58) return false;
    const minute = this.exactDigits(2);
    let second = 0;
    let ms = 0;
    if (text.charCodeAt(this.pos) === 58) {
      this.pos++;
      second = this.exactDigits(2);
      const mark = text.charCodeAt(this.pos);
      if (mark === 46 || mark === 44) {
        this.pos++;
        const fractionStart = this.pos;
        const fraction = this.digits(3);
        if (fraction < 0) return false;
        ms = fraction * 10 ** (3 - (this.pos - fractionStart));
        while (isDigit(text.charCodeAt(this.pos))) this.pos++;
      }
    }
    if (minute < 0 || second < 0) return false;
    const meridiem = this.meridiem();
    if (meridiem !== 0) {
      if (hour < 1 || hour > 12) return false;
      hour = (hour % 12) + (meridiem === 2 ? 12 : 0);
    }
    const offset = this.offset();
    this.skipSpaces();
    if (this.pos !== text.length || Number.isNaN(offset)) return false;
    if (month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) return false;
    if (hour > 23 || minute > 59 || second > 59) return false;
    const dayKey = (year * 16 + month) * 32 + day;
    if (dayKey !== this.dayKey) {
      this.dayKey = dayKey;
      this.dayMs = Date.UTC(year, month - 1, day);
    }
    this.wallMs = this.dayMs + ((hour * 60 + minute) * 60 + second) * 1000 + ms;
    this.offsetMinutes = offset === Infinity ? NaN : offset;
    return true;
  }

  private skipSpaces(): void {
    while (isSpace(this.text.charCodeAt(this.pos))) this.pos++;
  }

  /** Up to `max` digits as a number, -1 when there are none. */
  private digits(max: number): number {
    let value = 0;
    const start = this.pos;
    while (this.pos - start < max && isDigit(this.text.charCodeAt(this.pos))) {
      value = value * 10 + this.text.charCodeAt(this.pos++) - 48;
    }
    return this.pos === start ? -1 : value;
  }

  private exactDigits(count: number): number {
    const start = this.pos;
    const value = this.digits(count);
    return this.pos - start === count ? value : -1;
  }

  /** `T` (with optional spaces), spaces, or a comma between date and time. */
  private dateTimeSeparator(): boolean {
    const start = this.pos;
    this.skipSpaces();
    const c = this.text.charCodeAt(this.pos);
    if (lower(c) === 116 || c === 44) {
      this.pos++;
      this.skipSpaces();
      return true;
    }
    return this.pos > start;
  }

  /** 0 none, 1 AM, 2 PM; accepts `am`, `PM`, `a.m.`, `p. m.`. */
  private meridiem(): number {
    const start = this.pos;
    this.skipSpaces();
    const c = lower(this.text.charCodeAt(this.pos));
    if (c !== 97 && c !== 112) {
      this.pos = start;
      return 0;
    }
    let i = this.pos + 1;
    if (this.text.charCodeAt(i) === 46) i++;
    if (this.text.charCodeAt(i) === 32) i++;
    if (lower(this.text.charCodeAt(i)) !== 109) {
      this.pos = start;
      return 0;
    }
    i++;
    if (this.text.charCodeAt(i) === 46) i++;
    this.pos = i;
    return c === 97 ? 1 : 2;
  }

  /** Minutes east of UTC; Infinity when there is no offset, NaN when it is malformed. */
  private offset(): number {
    this.skipSpaces();
    const text = this.text;
    const c = lower(text.charCodeAt(this.pos));
    if (c === 122) {
      this.pos++;
      return 0;
    }
    let named = false;
    if (c === 117 || c === 103) {
      const word = text.slice(this.pos, this.pos + 3).toLowerCase();
      if (word !== 'utc' && word !== 'gmt') return NaN;
      this.pos += 3;
      named = true;
    }
    const sign = text.charCodeAt(this.pos);
    if (sign !== 43 && sign !== 45) return named ? 0 : this.pos === text.length ? Infinity : NaN;
    this.pos++;
    const start = this.pos;
    let hours = this.digits(4);
    let minutes = 0;
    const count = this.pos - start;
    if (hours < 0) return NaN;
    if (count <= 2 && text.charCodeAt(this.pos) === 58) {
      this.pos++;
      minutes = this.exactDigits(2);
      if (minutes < 0) return NaN;
    } else if (count > 2) {
      minutes = hours % 100;
      hours = Math.floor(hours / 100);
    }
    const total = hours * 60 + minutes;
    return sign === 45 ? -total : total;
  }
}

/** One-off convenience over {@link TimestampParser}; undefined when the text is not a timestamp. */
export function parseTimestamp(
  text: string,
  dateOrder: DateOrder,
): { wallMs: number; offsetMinutes: number } | undefined {
  const parser = new TimestampParser(dateOrder);
  return parser.parse(text) ? { wallMs: parser.wallMs, offsetMinutes: parser.offsetMinutes } : undefined;
}

import { expect } from 'chai';
import { parseTimestamp } from '../../../shared/logs/parse-timestamp.js';
import { DATE_TIME_PATTERN } from '../../../shared/logs/timestamp-patterns.js';

/** The instant a timestamp stands for, reading a missing offset as UTC. */
function instant(text: string, order: 'MDY' | 'DMY' | 'YMD' = 'YMD'): string | undefined {
  const p = parseTimestamp(text, order);
  if (!p) return undefined;
  const offset = Number.isNaN(p.offsetMinutes) ? 0 : p.offsetMinutes;
  return new Date(p.wallMs - offset * 60_000).toISOString();
}

describe('parseTimestamp', () => {
  it('reads ISO 8601 with Z, with an offset, and with fractional seconds', () => {
    expect(instant('2026-03-08T02:30:00Z')).to.equal('2026-03-08T02:30:00.000Z');
    expect(instant('2026-03-08T02:30:00-06:00')).to.equal('2026-03-08T08:30:00.000Z');
    expect(instant('2026-03-08T02:30:00.25+05:30')).to.equal('2026-03-07T21:00:00.250Z');
    expect(instant('2026-03-08T02:30:00+0100')).to.equal('2026-03-08T01:30:00.000Z');
    expect(instant('2026-03-08 02:30 UTC')).to.equal('2026-03-08T02:30:00.000Z');
  });

  it('reports the offset, or NaN for a local time', () => {
    expect(parseTimestamp('2026-03-08T02:30:00-05:00', 'YMD')?.offsetMinutes).to.equal(-300);
    expect(parseTimestamp('2026-03-08 02:30', 'YMD')?.offsetMinutes).to.be.NaN;
  });

  it('reads YYYY-MM-DD HH:mm with or without seconds, and slashes', () => {
    expect(instant('2026-03-08 14:05')).to.equal('2026-03-08T14:05:00.000Z');
    expect(instant('2026-03-08 14:05:09')).to.equal('2026-03-08T14:05:09.000Z');
    expect(instant('2026/03/08 14:05')).to.equal('2026-03-08T14:05:00.000Z');
  });

  it('reads month-first and day-first dates with /, - and . by the order it is given', () => {
    expect(instant('03/08/2026 14:05', 'MDY')).to.equal('2026-03-08T14:05:00.000Z');
    expect(instant('08/03/2026 14:05', 'DMY')).to.equal('2026-03-08T14:05:00.000Z');
    expect(instant('08-03-2026 14:05', 'DMY')).to.equal('2026-03-08T14:05:00.000Z');
    expect(instant('08.03.2026 14:05:00', 'DMY')).to.equal('2026-03-08T14:05:00.000Z');
    expect(instant('3/8/26 14:05', 'MDY')).to.equal('2026-03-08T14:05:00.000Z');
  });

  it('reads a four-digit leading year as YMD whatever order is given', () => {
    expect(instant('2026-03-08 14:05', 'DMY')).to.equal('2026-03-08T14:05:00.000Z');
  });

  it('reads 12-hour times, with 12 AM as midnight and 12 PM as noon', () => {
    expect(instant('3/8/2026 2:05:30 PM', 'MDY')).to.equal('2026-03-08T14:05:30.000Z');
    expect(instant('3/8/2026 12:00 AM', 'MDY')).to.equal('2026-03-08T00:00:00.000Z');
    expect(instant('3/8/2026 12:00 PM', 'MDY')).to.equal('2026-03-08T12:00:00.000Z');
    expect(instant('3/8/2026 11:59 pm', 'MDY')).to.equal('2026-03-08T23:59:00.000Z');
    expect(instant('8/3/2026 9:15 a.m.', 'DMY')).to.equal('2026-03-08T09:15:00.000Z');
  });

  it('rejects dates and times that do not exist on any calendar or clock', () => {
    for (const text of [
      '2026-02-29 10:00',
      '2026-13-01 10:00',
      '2026-03-08 24:00',
      '2026-03-08 10:60',
      '3/8/2026 13:00 PM',
      '3/8/2026 0:30 AM',
    ]) {
      expect(parseTimestamp(text, 'MDY'), text).to.equal(undefined);
    }
    expect(instant('2028-02-29 10:00')).to.equal('2028-02-29T10:00:00.000Z');
  });

  it('rejects text that is not a date and time', () => {
    for (const text of ['', '2026-03-08', '14:05', 'yesterday', '2026-03-08 14:05 PMX', '2026-03-08 14:05:00 +', '40.5']) {
      expect(parseTimestamp(text, 'YMD'), text).to.equal(undefined);
    }
  });

  it('accepts exactly the shapes the sniffer recognises as date-times', () => {
    const samples = [
      '2026-03-08T02:30:00Z',
      '2026-03-08T02:30:00Z ',
      '2026-03-08T02:30:00Zulu',
      '2026-03-08 02:30',
      ' 3/8/2026 2:05 PM ',
      '08.03.2026, 14:05',
      '2026-03-08 02:30:00.5 GMT+1',
      '2026-03-08 2:30 x',
      '2026-03-08T02:30:00+5',
    ];
    for (const text of samples) expect(parseTimestamp(text, 'MDY') !== undefined, text).to.equal(DATE_TIME_PATTERN.test(text));
  });
});

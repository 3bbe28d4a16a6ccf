import { expect } from 'chai';
import { addDays, daysBetween, daysInMonth, fromDayNumber, isIsoDate, toDayNumber } from '../../../shared/planning/iso-date.js';

describe('iso-date', () => {
  it('accepts real calendar days only, including leap days of leap years', () => {
    expect(['2024-02-29', '2000-02-29', '2026-12-31', '2026-01-01'].filter(isIsoDate)).to.have.length(4);
    expect(['2025-02-29', '1900-02-29', '2100-02-29', '2026-04-31', '2026-13-01', '2026-00-10', '2026-1-5', '2026-01-01T00:00', 20260101].some(isIsoDate)).to.equal(false);
  });

  it('gives February 29 days in leap years and 28 otherwise', () => {
    expect([2024, 2000, 2025, 1900, 2100].map((year) => daysInMonth(year, 2))).to.deep.equal([29, 29, 28, 28, 28]);
  });

  it('counts days from 1970-01-01 the same way Date.UTC does', () => {
    for (const date of ['1970-01-01', '1999-12-31', '2000-03-01', '2024-02-29', '2026-07-15', '2099-12-31']) {
      expect(toDayNumber(date), date).to.equal(Date.UTC(Number(date.slice(0, 4)), Number(date.slice(5, 7)) - 1, Number(date.slice(8))) / 86_400_000);
    }
  });

  it('round-trips every day from 1999 to 2031 through day numbers', () => {
    const start = toDayNumber('1999-01-01');
    for (let day = start; day < start + 33 * 366; day++) expect(toDayNumber(fromDayNumber(day))).to.equal(day);
  });

  it('adds days across month, year and leap-day boundaries', () => {
    expect(addDays('2026-01-31', 1)).to.equal('2026-02-01');
    expect(addDays('2026-01-05', -9)).to.equal('2025-12-27');
    expect(addDays('2024-03-01', -1)).to.equal('2024-02-29');
    expect(addDays('2025-03-01', -1)).to.equal('2025-02-28');
  });

  it('measures whole days between dates, negative when the second is earlier', () => {
    expect(daysBetween('2026-06-09', '2026-06-30')).to.equal(21);
    expect(daysBetween('2026-06-30', '2026-06-09')).to.equal(-21);
  });

  it('rejects malformed dates with a RangeError', () => {
    expect(() => toDayNumber('2026-02-30')).to.throw(RangeError);
    expect(() => addDays('2026-02-01', 1.5)).to.throw(RangeError);
  });
});

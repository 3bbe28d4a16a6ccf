import { expect } from 'chai';
import { siteTimeText, siteWallTime, siteWallTimeToInstant, siteZoneName } from '../../../shared/sites/site-clock.js';

// Offsets and DST dates from memory (US rules since 2007: second Sunday of March, first Sunday of November, at 02:00);
// every expected instant below is hand-computed from them.
describe('the site clock', () => {
  it('shows an instant on the site’s clock with the zone’s short name, whatever zone the process runs in', () => {
    const instant = '2026-12-04T14:30:00.000Z';
    expect(siteTimeText(instant, 'America/Chicago')).to.equal('Dec 4, 2026, 8:30 AM CST');
    expect(siteTimeText(instant, 'America/Denver', 'time')).to.equal('7:30 AM MST');
    expect(siteTimeText(instant, 'America/Chicago', 'short')).to.equal('12/4/26, 8:30 AM CST');
    expect(siteTimeText('2026-07-04T14:30:00.000Z', 'America/Chicago', 'time')).to.equal('9:30 AM CDT');
    // A zone the locale has no abbreviation for shows its offset.
    expect(siteTimeText(instant, 'Europe/Berlin', 'time')).to.equal('3:30 PM GMT+1');
    expect(siteZoneName(Date.parse(instant), 'America/Chicago')).to.equal('CST');
    expect(siteZoneName(Date.parse('2026-07-04T12:00:00Z'), 'America/Chicago')).to.equal('CDT');
  });

  it('reads a wall-clock time at the site as the instant it stands for, across both DST changes', () => {
    const at = (wall: string, zone: string) => siteWallTimeToInstant(wall, zone)?.toISOString();
    expect(at('2026-12-04T08:30', 'America/Chicago')).to.equal('2026-12-04T14:30:00.000Z'); // CST, UTC−6
    expect(at('2026-07-04T08:30', 'America/Chicago')).to.equal('2026-07-04T13:30:00.000Z'); // CDT, UTC−5
    expect(at('2026-12-04T08:30', 'Asia/Tokyo')).to.equal('2026-12-03T23:30:00.000Z'); // UTC+9, the day before in UTC
    expect(at('2026-12-04T08:30:15', 'UTC')).to.equal('2026-12-04T08:30:15.000Z');
    // 2026-03-08: Chicago's clock goes from 01:59 CST to 03:00 CDT; the skipped 02:30 lands at 03:30 CDT.
    expect(at('2026-03-08T01:30', 'America/Chicago')).to.equal('2026-03-08T07:30:00.000Z');
    expect(at('2026-03-08T02:30', 'America/Chicago')).to.equal('2026-03-08T08:30:00.000Z');
    expect(at('2026-03-08T03:30', 'America/Chicago')).to.equal('2026-03-08T08:30:00.000Z');
    // 2026-11-01: 01:00–01:59 happens twice (CDT, then CST); the first pass is taken.
    expect(at('2026-11-01T01:30', 'America/Chicago')).to.equal('2026-11-01T06:30:00.000Z');
    expect(at('2026-11-01T02:30', 'America/Chicago')).to.equal('2026-11-01T08:30:00.000Z');
  });

  it('refuses text that is not a wall-clock time', () => {
    expect(siteWallTimeToInstant('', 'America/Chicago')).to.equal(null);
    expect(siteWallTimeToInstant('2026-12-04', 'America/Chicago')).to.equal(null);
    expect(siteWallTimeToInstant('2026-12-04T08:30Z', 'America/Chicago')).to.equal(null);
  });

  it('reads an instant back as the site’s wall clock, the inverse of reading a typed time', () => {
    // Hand-computed from the offsets above.
    expect(siteWallTime('2026-12-04T14:30:00.000Z', 'America/Chicago')).to.equal('2026-12-04T08:30');
    expect(siteWallTime('2026-07-04T13:30:59.999Z', 'America/Chicago')).to.equal('2026-07-04T08:30');
    expect(siteWallTime('2026-12-03T23:30:00.000Z', 'Asia/Tokyo')).to.equal('2026-12-04T08:30');
    expect(siteWallTime(Date.parse('2026-11-01T07:30:00Z'), 'America/Chicago')).to.equal('2026-11-01T01:30'); // the second 01:30 (CST)
    for (const wall of ['2026-12-04T08:30', '2026-07-04T23:59', '2026-03-08T03:00', '2026-01-01T00:00']) {
      expect(siteWallTime(siteWallTimeToInstant(wall, 'America/Chicago')!, 'America/Chicago')).to.equal(wall);
    }
  });
});

// "Today" on a site's own calendar (hand-computed from the zones' UTC offsets).
import { expect } from 'chai';
import { dueState, siteLocalDate } from '../../../shared/receiving/site-local-date.js';

describe('siteLocalDate', () => {
  it('03:30 UTC on 2 December is still 1 December in Chicago (UTC−6) and already 2 December in Tokyo (UTC+9)', () => {
    const instant = new Date('2026-12-02T03:30:00Z');
    expect(siteLocalDate(instant, 'America/Chicago')).to.equal('2026-12-01');
    expect(siteLocalDate(instant, 'Asia/Tokyo')).to.equal('2026-12-02');
  });

  it('follows daylight saving time: 05:30 UTC on 1 July is 1 July in Chicago (UTC−5)', () => {
    expect(siteLocalDate(new Date('2026-07-01T05:30:00Z'), 'America/Chicago')).to.equal('2026-07-01');
  });
});

describe('dueState', () => {
  it('sorts expected dates into overdue, today and later', () => {
    expect(['2026-12-01', '2026-12-02', '2026-12-03'].map((d) => dueState(d, '2026-12-02'))).to.deep.equal(['overdue', 'today', 'later']);
  });
});

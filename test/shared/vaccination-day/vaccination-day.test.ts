// The vaccination day's rules: visit order, the 12-hour rule, heat, mixing water, returns and reconciliation.
import { expect } from 'chai';
import { checkReturn, heatAdvice, reconcileVials, twelveHourRule, useByInstant, visitOrder, waterVolumeMl } from '../../../shared/vaccination-day/index.js';

const hour = 3_600_000;

describe('visit order (common practice: younger flocks before older ones)', () => {
  it('orders sites by their youngest flock, and the youngest flock first within a site', () => {
    const visits = [
      { id: 1, siteId: 10, houseName: 'House 2', flockAgeDays: 90 },
      { id: 2, siteId: 20, houseName: 'Barn A', flockAgeDays: 35 },
      { id: 3, siteId: 10, houseName: 'House 1', flockAgeDays: 20 },
      { id: 4, siteId: 20, houseName: 'Barn B', flockAgeDays: 70 },
    ];
    // Site 10's youngest is 20 days, site 20's is 35: site 10 first, then within each site by age.
    expect(visitOrder(visits).map((v) => v.id)).to.deep.equal([3, 1, 2, 4]);
  });

  it('breaks ties by house name in natural order (House 2 before House 10)', () => {
    const visits = [
      { id: 'b', siteId: 1, houseName: 'House 10', flockAgeDays: 30 },
      { id: 'a', siteId: 1, houseName: 'House 2', flockAgeDays: 30 },
    ];
    expect(visitOrder(visits).map((v) => v.id)).to.deep.equal(['a', 'b']);
  });
});

describe('the 12-hour rule (common practice: no other farm in the 12 hours before vaccinating)', () => {
  const first = Date.UTC(2026, 11, 3, 6, 0);
  it('fails for another farm 11 hours before the first visit, passes for one 13 hours before', () => {
    expect(twelveHourRule(first, [1], [{ siteId: 9, at: first - 11 * hour }]).ok).to.equal(false);
    expect(twelveHourRule(first, [1], [{ siteId: 9, at: first - 13 * hour }]).ok).to.equal(true);
  });

  it('counts a visit exactly 12 hours before as inside the window, and ignores the sheet\'s own sites', () => {
    expect(twelveHourRule(first, [1], [{ siteId: 9, at: first - 12 * hour }]).ok).to.equal(false);
    expect(twelveHourRule(first, [1, 2], [{ siteId: 2, at: first - 2 * hour }]).ok).to.equal(true);
    expect(twelveHourRule(first, [1], [{ siteId: null, at: first - hour, label: 'neighbour' }]).conflicts).to.have.length(1);
  });
});

describe('heat advice (common practice: avoid extreme heat, spray at night in summer)', () => {
  it('advises the night above the site threshold, comparing across units', () => {
    expect(heatAdvice({ value: 31, unit: 'C' }, { value: 85, unit: 'F' }).tooHot).to.equal(true); // 31 °C = 87.8 °F
    expect(heatAdvice({ value: 85, unit: 'F' }, { value: 85, unit: 'F' }).tooHot).to.equal(false);
    expect(heatAdvice({ value: 29, unit: 'C' }, { value: 85, unit: 'F' }).tooHot).to.equal(false); // 29 °C = 84.2 °F
  });
});

describe('mixing water (hand-computed from the rate the label or veterinarian gives)', () => {
  it('20,000 birds at 250 mL per 1,000 birds take 5,000 mL; odd counts round up to whole mL', () => {
    expect(waterVolumeMl({ birds: 20_000, mlPer1000Birds: 250 })).to.equal(5_000);
    expect(waterVolumeMl({ birds: 18_333, mlPer1000Birds: 250 })).to.equal(4_584); // 4,583.25 mL
  });

  it('never invents a rate: unknown stays unknown', () => {
    expect(waterVolumeMl({ birds: 20_000, mlPer1000Birds: null })).to.equal(null);
  });

  it('the use-by moment follows the label\'s use-within minutes from mixing', () => {
    const mixed = Date.UTC(2026, 11, 3, 6, 0);
    expect(useByInstant(mixed, 120)).to.equal(mixed + 2 * hour);
    expect(useByInstant(mixed, null)).to.equal(null);
  });
});

describe('vials out and back (hand-computed against our rule)', () => {
  const left = Date.UTC(2026, 11, 3, 6, 0);
  it('a return within the product limit goes straight back; over it, or with no limit, needs a return hold', () => {
    expect(checkReturn(left, left + 30 * 60_000, 60)).to.include({ minutesOut: 30, overLimit: false, holdReason: null });
    expect(checkReturn(left, left + 90 * 60_000, 60).holdReason).to.match(/90 minutes; the product allows 60/);
    expect(checkReturn(left, left + 5 * 60_000, null).overLimit).to.equal(true);
  });

  it('reconciles issued = used + returned, and reports the difference otherwise', () => {
    expect(reconcileVials(3, 2, 1)).to.include({ balanced: true, difference: 0 });
    expect(reconcileVials(3, 1, 1)).to.include({ balanced: false, difference: 1 });
  });
});

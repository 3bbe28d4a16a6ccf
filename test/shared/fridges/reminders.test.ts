import { expect } from 'chai';
import { calibrationStatus, CALIBRATION_REMINDER_DAYS } from '../../../shared/fridges/calibration-status.js';
import { checkExcursions } from '../../../shared/fridges/check-out-of-range.js';
import { checksNeededPerDay } from '../../../shared/fridges/checks-needed.js';
import { hasNoRecentData } from '../../../shared/fridges/no-recent-data.js';
import { siteDayBounds } from '../../../shared/fridges/site-date.js';
import { fahrenheitToCelsius } from '../../../shared/temperature/convert-temperature.js';

const HOUR = 3_600_000;

describe('fridge reminders', () => {
  it('reminds 60 days before recalibration is due (guidance: every 2–3 years), and flags overdue and missing certificates', () => {
    expect(CALIBRATION_REMINDER_DAYS).to.equal(60);
    expect(calibrationStatus('2026-05-01', '2026-03-01')).to.equal('ok'); // 61 days ahead, hand-computed
    expect(calibrationStatus('2026-04-30', '2026-03-01')).to.equal('due-soon'); // 60 days ahead
    expect(calibrationStatus('2026-03-01', '2026-03-01')).to.equal('due-soon');
    expect(calibrationStatus('2026-02-28', '2026-03-01')).to.equal('overdue');
    expect(calibrationStatus(null, '2026-03-01')).to.equal('none');
  });

  it('shows "no recent data" once the newest reading is older than the setting, or there is none', () => {
    const now = Date.UTC(2026, 2, 2, 12);
    expect(hasNoRecentData(now - 24 * HOUR, now, 24)).to.equal(false); // exactly the limit still counts as recent
    expect(hasNoRecentData(now - 24 * HOUR - 1, now, 24)).to.equal(true);
    expect(hasNoRecentData(now - 30 * HOUR, now, 48)).to.equal(false);
    expect(hasNoRecentData(null, now, 24)).to.equal(true);
  });

  it('asks for one check a day with a min/max display and two without (CDC Vaccine Storage and Handling Toolkit)', () => {
    expect(checksNeededPerDay(true)).to.equal(1);
    expect(checksNeededPerDay(false)).to.equal(2);
  });

  it('finds a daily check out of range by its current, minimum or maximum value, one entry per side', () => {
    const limits = { lowC: fahrenheitToCelsius(35), highC: fahrenheitToCelsius(45) }; // common practice
    expect(checkExcursions({ currentC: 4, minC: 2, maxC: 6 }, limits)).to.deep.equal([]);
    expect(checkExcursions({ currentC: 4, minC: 2, maxC: fahrenheitToCelsius(45) }, limits)).to.deep.equal([]); // on the limit
    expect(checkExcursions({ currentC: 4, minC: 0.5, maxC: 9 }, limits)).to.deep.equal([{ kind: 'high', peakC: 9 }, { kind: 'low', peakC: 0.5 }]);
    expect(checkExcursions({ currentC: 8, minC: null, maxC: null }, limits)).to.deep.equal([{ kind: 'high', peakC: 8 }]);
  });

  it('gives a local day of 23 hours on the spring clock change in America/Chicago (IANA tz database)', () => {
    const { start, end } = siteDayBounds('2026-03-08', 'America/Chicago');
    expect(new Date(start).toISOString()).to.equal('2026-03-08T06:00:00.000Z');
    expect((end - start) / HOUR).to.equal(23);
  });
});

import { expect } from 'chai';
import { ageInDays, ageLabel } from '../../../shared/flocks/flock-age.js';
import { flockStatus } from '../../../shared/flocks/flock-status.js';
import { stepAgeDays, stepDate } from '../../../shared/flocks/step-age.js';

// Hand-computed: day 0 is the hatch day; a step's date is the hatch date plus its age.
describe('flock age and programme step dates', () => {
  it('counts whole days from the hatch date, across a leap day', () => {
    expect(ageInDays('2028-02-01', '2028-03-01')).to.equal(29);
    expect(ageInDays('2026-02-01', '2026-03-01')).to.equal(28);
  });

  it('labels the age in weeks and days', () => {
    expect(ageLabel(0)).to.equal('day 0');
    expect(ageLabel(45)).to.equal('6 weeks 3 days');
    expect(ageLabel(7)).to.equal('1 week');
    expect(ageLabel(-2)).to.equal('hatches in 2 days');
  });

  it('turns a step in weeks into days (7 a week) and into a date', () => {
    expect(stepAgeDays({ ageValue: 18, ageUnit: 'weeks' })).to.equal(126);
    expect(stepDate('2026-01-05', { ageValue: 18, ageUnit: 'weeks' })).to.equal('2026-05-11');
    expect(stepDate('2026-01-05', { ageValue: 14, ageUnit: 'days' })).to.equal('2026-01-19');
  });

  it('derives the status from the dates: planned, placed, depleted', () => {
    expect(flockStatus({ placementDate: '2026-05-01', depletedOn: null }, '2026-04-30')).to.equal('planned');
    expect(flockStatus({ placementDate: '2026-05-01', depletedOn: null }, '2026-05-01')).to.equal('placed');
    expect(flockStatus({ placementDate: '2026-05-01', depletedOn: '2026-09-01' }, '2026-09-01')).to.equal('depleted');
  });
});

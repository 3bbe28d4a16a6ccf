import { expect } from 'chai';
import { flockSchedule, stepLabel, type ScheduleInput, type ScheduleStep, type ScheduleVaccination } from '../../../shared/flocks/flock-schedule.js';

const step = (id: number, ageValue: number, ageUnit: 'days' | 'weeks' = 'days'): ScheduleStep => ({
  id, position: id, productId: 1, productName: `Product ${id}`, ageValue, ageUnit, route: 'spray',
});
const vaccination = (id: number, programmeStepId: number | null, plannedDate: string, status: ScheduleVaccination['status'] = 'planned'): ScheduleVaccination => ({
  id, programmeStepId, productName: 'Given product', route: 'drinking_water', plannedDate, status,
});

// Hand-computed from hatch 2026-11-04 (day 0): day 10 is 2026-11-14, day 14 is 2026-11-18, week 4 is 2026-12-02,
// week 6 is 2026-12-16, week 20 is 2027-03-24; today 2026-12-04 is day 30.
const base: ScheduleInput<ScheduleVaccination> = {
  hatchDate: '2026-11-04',
  placementDate: '2026-11-04',
  lastDay: '2027-01-25',
  depleted: false,
  today: '2026-12-04',
  steps: [step(1, 10), step(2, 14), step(3, 4, 'weeks'), step(4, 6, 'weeks')],
  vaccinations: [],
};

const summary = (input: ScheduleInput<ScheduleVaccination>) => flockSchedule(input).map((e) => [e.key, e.state, e.date, e.daysLate]);

describe('flockSchedule', () => {
  it('labels steps by the age the programme gives', () => {
    expect([stepLabel({ ageValue: 14, ageUnit: 'days' }), stepLabel({ ageValue: 4, ageUnit: 'weeks' })]).to.deep.equal(['Day 14', 'Week 4']);
  });

  it('gives every step its state: done, overdue with its days late, planned, confirmed; in date order', () => {
    const schedule = summary({
      ...base,
      vaccinations: [
        vaccination(10, 1, '2026-11-14', 'done'),
        vaccination(11, 2, '2026-11-18'),
        vaccination(12, 3, '2026-12-02', 'confirmed'),
        vaccination(13, 4, '2026-12-16'),
      ],
    });
    expect(schedule).to.deep.equal([
      ['v10', 'done', '2026-11-14', 0],
      ['v11', 'overdue', '2026-11-18', 16],
      // A confirmed vaccination whose day passed without a record is overdue too.
      ['v12', 'overdue', '2026-12-02', 2],
      ['v13', 'planned', '2026-12-16', 0],
    ]);
  });

  it('is not overdue on its own day', () => {
    expect(summary({ ...base, today: '2026-12-16', vaccinations: [vaccination(13, 4, '2026-12-16', 'confirmed')] })[3]).to.deep.equal(['v13', 'confirmed', '2026-12-16', 0]);
  });

  it('keeps a cancelled vaccination on the schedule, and a moved one at its new date with the programme’s date beside it', () => {
    const schedule = flockSchedule({ ...base, vaccinations: [vaccination(11, 2, '2026-11-18', 'cancelled'), vaccination(14, 3, '2026-12-05')] });
    const cancelled = schedule.find((e) => e.key === 'v11')!;
    expect(cancelled.state).to.equal('cancelled');
    const moved = schedule.find((e) => e.key === 'v14')!;
    expect([moved.state, moved.date, moved.step!.programmeDate, moved.step!.label, moved.ageDays]).to.deep.equal(['planned', '2026-12-05', '2026-12-02', 'Week 4', 31]);
    expect(moved.productName, 'the vaccination’s own product').to.equal('Given product');
  });

  it('shows steps nothing was generated from: before placement, after depletion', () => {
    // Placed at day 12 (2026-11-16): day 10 fell at the hatchery or rearing farm. Depleted from 2026-12-16: week 6 is after it.
    const schedule = flockSchedule({ ...base, placementDate: '2026-11-16', lastDay: '2026-12-16', steps: [step(1, 10), step(4, 6, 'weeks')] });
    expect(schedule.map((e) => [e.key, e.state, e.date, e.ageDays, e.productName, e.vaccination])).to.deep.equal([
      ['s1', 'before_placement', '2026-11-14', 10, 'Product 1', null],
      ['s4', 'after_depletion', '2026-12-16', 42, 'Product 4', null],
    ]);
  });

  it('calls what stayed open in a depleted flock missed, never overdue', () => {
    const schedule = summary({ ...base, depleted: true, lastDay: '2026-12-01', steps: [step(2, 14), step(3, 4, 'weeks')], vaccinations: [vaccination(11, 2, '2026-11-18')] });
    expect(schedule).to.deep.equal([
      ['v11', 'missed', '2026-11-18', 16],
      ['s3', 'after_depletion', '2026-12-02', 0],
    ]);
  });

  it('lists vaccinations added by hand beside the steps, and two vaccinations of one step both', () => {
    const schedule = flockSchedule({
      ...base,
      steps: [step(2, 14)],
      vaccinations: [vaccination(20, null, '2026-11-18'), vaccination(11, 2, '2026-11-18', 'cancelled'), vaccination(21, 2, '2026-12-10')],
    });
    // On one day the programme's step comes before the one added by hand.
    expect(schedule.map((e) => [e.key, e.state, e.step?.label ?? null])).to.deep.equal([
      ['v11', 'cancelled', 'Day 14'],
      ['v20', 'overdue', null],
      ['v21', 'planned', 'Day 14'],
    ]);
  });

  it('shows an open-flock step without a vaccination by its date (a flock not yet brought in line)', () => {
    expect(summary({ ...base, steps: [step(2, 14), step(4, 6, 'weeks')] })).to.deep.equal([
      ['s2', 'overdue', '2026-11-18', 16],
      ['s4', 'planned', '2026-12-16', 0],
    ]);
  });
});

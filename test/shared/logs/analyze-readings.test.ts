import { expect } from 'chai';
import { analyzeReadings } from '../../../shared/logs/analyze-readings.js';
import { nominalIntervalMs } from '../../../shared/logs/nominal-interval.js';
import { readingDurations, type TimedReading } from '../../../shared/logs/reading-durations.js';
import { fahrenheitToCelsius } from '../../../shared/temperature/convert-temperature.js';

const T0 = Date.UTC(2026, 2, 1, 8, 0);
const MIN = 60_000;
const CDC = { lowC: 2, highC: 8 }; // CDC Vaccine Storage and Handling Toolkit, 2–8 °C
const COMMON_F = { lowC: fahrenheitToCelsius(35), highC: fahrenheitToCelsius(45) }; // 35–45 °F, common practice

/** Readings from [minutes after T0, °C] pairs. */
const series = (points: [number, number][]): TimedReading[] => points.map(([m, tempC]) => ({ at: T0 + m * MIN, tempC }));
const every10 = (temps: number[]) => series(temps.map((t, i) => [i * 10, t]));

// All expected figures below are hand-computed from the rules in the module comments.
describe('analyzeReadings', () => {
  describe('nominal interval', () => {
    it('is the median step, so one long gap does not change it', () => {
      expect(nominalIntervalMs(series([[0, 5], [10, 5], [20, 5], [50, 5], [60, 5], [70, 5]]))).to.equal(10 * MIN); // hand-computed
    });

    it('averages the two middle steps when their number is even', () => {
      expect(nominalIntervalMs(series([[0, 5], [10, 5], [30, 5]]))).to.equal(15 * MIN); // hand-computed: (10 + 20)/2
    });

    it('is reported in minutes', () => {
      expect(analyzeReadings(every10([5, 5, 5]), CDC).intervalMinutes).to.equal(10);
    });
  });

  describe('what each reading stands for', () => {
    it('lets a reading stand for up to two intervals, then one interval plus a gap', () => {
      const readings = series([[0, 5], [10, 5], [30, 5], [60, 5], [70, 5]]); // steps 10, 20, 30, 10 → nominal 15
      const d = readingDurations(readings);
      expect(d.intervalMs).to.equal(15 * MIN); // hand-computed: median of 10, 20, 30, 10
      expect([...d.durationsMs].map((ms) => ms / MIN)).to.deep.equal([10, 20, 30, 10, 15]); // hand-computed: 30 = 2 × 15 is no gap
      expect(d.gaps).to.deep.equal([]);
    });

    it('makes the rest of a long step a gap starting one interval after the reading', () => {
      const result = analyzeReadings(series([[0, 5], [10, 5], [20, 5], [50, 5], [60, 5]]), CDC);
      expect(result.gaps).to.deep.equal([{ start: T0 + 30 * MIN, end: T0 + 50 * MIN, minutes: 20 }]); // hand-computed
      expect(result.gapMinutes).to.equal(20); // hand-computed
    });

    it('lets the last reading stand for one nominal interval', () => {
      const result = analyzeReadings(every10([5, 5, 5, 5]), CDC);
      expect(result.minutesInRange).to.equal(40); // hand-computed: 3 steps of 10 + 10 for the last
      expect(result.last).to.equal(T0 + 30 * MIN);
    });

    it('accounts for every minute from the first reading to one interval past the last', () => {
      const result = analyzeReadings(series([[0, 5], [10, 9], [20, 1], [60, 5], [70, 5]]), CDC);
      const total = result.minutesInRange + result.minutesAbove + result.minutesBelow + result.gapMinutes;
      expect(total).to.equal(80); // hand-computed: 70 + 10
      expect(result.minutesAbove).to.equal(10);
      expect(result.minutesBelow).to.equal(10); // hand-computed: the 40-min step stands for 10 min
      expect(result.gapMinutes).to.equal(30);
    });

    it('uses "stands for" times the readings already carry', () => {
      const readings = [
        { at: T0, tempC: 5, standsForMs: 5 * MIN },
        { at: T0 + 10 * MIN, tempC: 9, standsForMs: 10 * MIN },
        { at: T0 + 20 * MIN, tempC: 5, standsForMs: 2 * MIN },
      ];
      const result = analyzeReadings(readings, CDC);
      expect(result.minutesInRange).to.equal(7); // hand-computed: 5 + 2
      expect(result.minutesAbove).to.equal(10);
      expect(result.gaps).to.deep.equal([{ start: T0 + 5 * MIN, end: T0 + 10 * MIN, minutes: 5 }]); // hand-computed
    });
  });

  describe('limits', () => {
    it('counts 45.0 °F as in range for a 45 °F limit, and 35.0 °F for a 35 °F limit', () => {
      const result = analyzeReadings(every10([45, 35, 45].map(fahrenheitToCelsius)), COMMON_F);
      expect(result.excursions).to.deep.equal([]); // hand-computed
      expect(result.minutesInRange).to.equal(30);
    });

    it('calls 45.1 °F high and 34.9 °F low', () => {
      const result = analyzeReadings(every10([45.1, 40, 34.9].map(fahrenheitToCelsius)), COMMON_F);
      expect(result.excursions.map((e) => e.kind)).to.deep.equal(['high', 'low']); // hand-computed
    });
  });

  describe('excursions', () => {
    it('reports start, end, minutes, peak and °C·min of a high excursion', () => {
      const result = analyzeReadings(every10([5, 9, 10, 8.5, 5]), CDC);
      expect(result.excursions).to.have.length(1);
      const [e] = result.excursions;
      expect(e.kind).to.equal('high');
      expect(e.start).to.equal(T0 + 10 * MIN); // hand-computed: first reading above 8
      expect(e.end).to.equal(T0 + 40 * MIN); // hand-computed: 30 min + the 10 it stands for
      expect(e.minutes).to.equal(30); // hand-computed
      expect(e.peakC).to.equal(10); // hand-computed
      expect(e.degreeMinutesC).to.be.closeTo(35, 1e-9); // hand-computed: (1 + 2 + 0.5) × 10
      expect(e.openEnded).to.equal(false);
    });

    it('reports the lowest temperature and the area below the low limit for a low excursion', () => {
      const [e] = analyzeReadings(every10([5, 1, 0.5, 3]), CDC).excursions;
      expect(e.kind).to.equal('low');
      expect(e.peakC).to.equal(0.5); // hand-computed
      expect(e.minutes).to.equal(20);
      expect(e.degreeMinutesC).to.be.closeTo(25, 1e-9); // hand-computed: (1 + 1.5) × 10
    });

    it('splits an excursion a gap runs through into two', () => {
      const result = analyzeReadings(series([[0, 5], [10, 9], [20, 9], [30, 9], [90, 9], [100, 9], [110, 5]]), CDC);
      expect(result.excursions.map((e) => [e.start, e.end, e.minutes])).to.deep.equal([
        [T0 + 10 * MIN, T0 + 40 * MIN, 30], // hand-computed: 10, 20 and 30 each stand for 10 min, then a gap
        [T0 + 90 * MIN, T0 + 110 * MIN, 20], // hand-computed
      ]);
      expect(result.gaps).to.deep.equal([{ start: T0 + 40 * MIN, end: T0 + 90 * MIN, minutes: 50 }]);
    });

    it('splits a run that goes straight from high to low', () => {
      const result = analyzeReadings(every10([9, 9, 1, 5]), CDC);
      expect(result.excursions.map((e) => [e.kind, e.minutes])).to.deep.equal([['high', 20], ['low', 10]]); // hand-computed
    });

    it('marks an excursion still going at the end of the data as open-ended', () => {
      const result = analyzeReadings(every10([5, 5, 9, 9.5]), CDC);
      const [e] = result.excursions;
      expect(e.openEnded).to.equal(true); // hand-computed
      expect(e.minutes).to.equal(20); // hand-computed: the last reading stands for one interval
      expect(e.end).to.equal(T0 + 40 * MIN);
      expect(e.degreeMinutesC).to.be.closeTo(25, 1e-9); // hand-computed: (1 + 1.5) × 10
    });
  });

  describe('summary figures', () => {
    it('gives min, max, time-weighted mean and MKT over the time each reading stands for', () => {
      const hourly = Array.from({ length: 24 }, (_, h): TimedReading => ({ at: T0 + h * 60 * MIN, tempC: h === 23 ? 15 : 5 }));
      const result = analyzeReadings(hourly, CDC);
      expect(result.minC).to.equal(5);
      expect(result.maxC).to.equal(15);
      expect(result.meanC).to.be.closeTo((23 * 5 + 15) / 24, 1e-9); // hand-computed
      expect(result.mktC).to.be.closeTo(5.764, 0.0005); // computed from USP ⟨1160⟩
    });

    it('weights the mean by time, so a reading before a long step counts for more', () => {
      const result = analyzeReadings(series([[0, 4], [20, 6], [30, 6]]), CDC); // nominal 15: 20 ≤ 30, no gap
      expect(result.meanC).to.be.closeTo((4 * 20 + 6 * 10 + 6 * 15) / 45, 1e-9); // hand-computed
    });

    it('sorts readings given out of order and echoes the limits', () => {
      const result = analyzeReadings(series([[20, 5], [0, 9], [10, 5]]), CDC);
      expect(result.first).to.equal(T0);
      expect(result.excursions[0].start).to.equal(T0);
      expect([result.lowC, result.highC]).to.deep.equal([2, 8]);
    });

    it('refuses fewer than two readings, or readings all at one instant', () => {
      expect(() => analyzeReadings(series([[0, 5]]), CDC)).to.throw(RangeError);
      expect(() => analyzeReadings(series([[0, 5], [0, 6]]), CDC)).to.throw(RangeError);
    });
  });
});

// Which lots a fridge's readings hold, judged by each lot's own product range and by freezing (hand-computed cases).
import { expect } from 'chai';
import {
  freezeLimits, groupCheckCrossings, groupRuns, judgedGroups, lotsPresent, mkt24hEndingAt, type JudgedLot,
} from '../../../shared/exposure/product-exposure-runs.js';
import { exposureEventTitle } from '../../../shared/exposure/exposure-event-title.js';
import { classifyTemperatureC } from '../../../shared/temperature/classify-temperature.js';

const MIN = 60_000;
const T0 = Date.UTC(2026, 2, 1, 8, 0);
const every10 = (temps: number[], start = T0) => temps.map((tempC, i) => ({ at: start + i * 10 * MIN, tempC }));
const usual = { lowC: 1.667, highC: 7.222 };

function lot(lotId: number, limits = usual, freezeSensitive = true, stays: JudgedLot['stays'] = [{ fridgeId: 1, from: T0 - 60 * MIN, to: null }]): JudgedLot {
  return { lotId, limits, freezeSensitive, stays };
}

describe('product exposure runs', () => {
  it('"at or below 0 °C" counts 0.0 °C and not 0.01 °C (our rule: a freeze-sensitive product at or below 0 °C is held)', () => {
    expect(classifyTemperatureC(0, freezeLimits)).to.equal('low');
    expect(classifyTemperatureC(-0.4, freezeLimits)).to.equal('low');
    expect(classifyTemperatureC(0.01, freezeLimits)).to.equal('in');
  });

  it('groups lots by their product range, with one freeze group of the freeze-sensitive ones', () => {
    const groups = judgedGroups([lot(1), lot(2), lot(3, { lowC: 2, highC: 6 }), lot(4, { lowC: -2, highC: 8 }, false)]);
    expect(groups.map((g) => [g.cause, g.lots.map((l) => l.lotId)])).to.deep.equal([
      ['excursion', [1, 2]], ['excursion', [3]], ['excursion', [4]], ['freeze', [1, 2, 3]],
    ]);
  });

  it('finds a run outside a product range narrower than the fridge\'s (hand-computed: 20 min, peak 6.5 °C)', () => {
    const [narrow] = judgedGroups([lot(1, { lowC: 2, highC: 6 }, false)]);
    const runs = groupRuns(every10([4, 4, 6.5, 6.5, 4, 4]), narrow, 1, { start: T0, end: T0 + 60 * MIN });
    expect(runs.map((r) => [r.kind, r.start, r.end, r.minutes, r.peakC])).to.deep.equal([['high', T0 + 20 * MIN, T0 + 40 * MIN, 20, 6.5]]);
  });

  it('opens no run where no lot of the group was in the fridge, and names only lots present', () => {
    const gone = lot(1, usual, false, [{ fridgeId: 1, from: T0 - 60 * MIN, to: T0 + 5 * MIN }, { fridgeId: 2, from: T0 + 10 * MIN, to: null }]);
    const [group] = judgedGroups([gone]);
    expect(groupRuns(every10([4, 4, 9, 9, 4]), group, 1, { start: T0, end: T0 + 50 * MIN })).to.deep.equal([]);
    const came = lot(2, usual, false, [{ fridgeId: 2, from: T0 - 60 * MIN, to: T0 + 30 * MIN }, { fridgeId: 1, from: T0 + 35 * MIN, to: null }]);
    expect(lotsPresent([gone, came], 1, T0 + 20 * MIN, T0 + 40 * MIN)).to.deep.equal([2]);
    // At one instant (a daily check): the stay must cover it.
    expect(lotsPresent([gone, came], 1, T0 + 5 * MIN, T0 + 5 * MIN)).to.deep.equal([]);
    expect(lotsPresent([gone, came], 2, T0 + 5 * MIN, T0 + 5 * MIN)).to.deep.equal([2]);
  });

  it('a freeze run only has a low side, and a daily check at 0 °C crosses it', () => {
    const freeze = judgedGroups([lot(1)]).find((g) => g.cause === 'freeze')!;
    const runs = groupRuns(every10([4, 0, -0.5, 4, 4]), freeze, 1, { start: T0, end: T0 + 50 * MIN });
    expect(runs.map((r) => [r.kind, r.minutes, r.peakC])).to.deep.equal([['low', 20, -0.5]]);
    expect(groupCheckCrossings({ currentC: 3, minC: 0, maxC: 9 }, freeze)).to.deep.equal([{ kind: 'low', peakC: 0 }]);
    expect(groupCheckCrossings({ currentC: 3, minC: 1, maxC: 9 }, freeze)).to.deep.equal([]);
  });

  it('MKT of the 24 h ending at the end: all at 5 °C is 5 °C; weights follow the time each reading stands for (USP ⟨1160⟩ formula)', () => {
    const flat = every10(Array(200).fill(5), T0 - 30 * 60 * MIN);
    expect(mkt24hEndingAt(flat, T0)).to.be.closeTo(5, 1e-9);
    // 23 h 20 min at 4 °C and 40 min at 9 °C: ΔH/R = 10,000 K gives 4.19 °C (hand-computed).
    const mixed = every10([...Array(140).fill(4), 9, 9, 9, 9], T0 - 1400 * MIN);
    expect(mkt24hEndingAt(mixed, T0 + 40 * MIN)).to.be.closeTo(4.19, 0.01);
    expect(mkt24hEndingAt([], T0)).to.equal(null);
    // 23 h at 5 °C then 1 h at 15 °C, time-weighted → 5.764 °C (computed from USP ⟨1160⟩).
    const warmHour = every10([...Array(138).fill(5), ...Array(6).fill(15)], T0 - 1440 * MIN);
    expect(mkt24hEndingAt(warmHour, T0)).to.be.closeTo(5.764, 0.001);
  });

  it('names an event by its fridge, side and range, and says when the fridge raised no alarm', () => {
    const base = { cause: 'excursion' as const, kind: 'high' as const, source: 'readings' as const, fridgeName: 'Fridge A', lowC: 2, highC: 6 };
    expect(exposureEventTitle({ ...base, fridgeAlarmed: false })).to.equal('Fridge A: above product range 2–6 °C / 35.6–42.8 °F (inside the fridge\'s alarm range: product range only)');
    expect(exposureEventTitle({ ...base, fridgeAlarmed: true, source: 'daily_check', kind: 'low' })).to.equal('Fridge A, daily check: below product range 2–6 °C / 35.6–42.8 °F');
    expect(exposureEventTitle({ ...base, cause: 'freeze', fridgeAlarmed: true })).to.equal('Fridge A: at or below 0 °C / 32 °F (freeze-sensitive products)');
  });
});

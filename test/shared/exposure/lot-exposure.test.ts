// Lot exposure on hand-computed cases: the vials' stays joined with each fridge's readings, judged by the product's own range.
import { expect } from 'chai';
import { fridgeExposureReadings, lotExposure } from '../../../shared/exposure/index.js';
import type { ExposureInput, FridgeReading } from '../../../shared/exposure/index.js';

const minute = 60_000;
const t0 = Date.UTC(2026, 5, 1, 10, 0);
const at = (minutes: number) => t0 + minutes * minute;
/** Readings every `step` minutes from `from`, one temperature per reading. */
function series(from: number, step: number, temps: number[]): FridgeReading[] {
  return temps.map((tempC, i) => ({ at: at(from + i * step), tempC }));
}
const label2to8 = { lowC: 2, highC: 8 };

function input(overrides: Partial<ExposureInput>): ExposureInput {
  return {
    stays: [],
    readings: new Map(),
    limits: label2to8,
    freezeSensitive: true,
    timeOutLimitMinutes: 30,
    asOf: at(24 * 60),
    ...overrides,
  };
}

describe('lot exposure', () => {
  it('a lot in one fridge through a one-hour excursion: 60 minutes above, the peak, the excursion times (hand-computed)', () => {
    // Half-hourly readings 10:00–13:30; 11:00 and 11:30 read 9.5 and 10.0 °C, the rest 5 °C.
    const readings = new Map([[1, series(0, 30, [5, 5, 9.5, 10, 5, 5, 5, 5])]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(240) }], readings }));
    expect(result.minutesAbove).to.equal(60);
    expect(result.minutesBelow).to.equal(0);
    expect(result.minutesUnknown).to.equal(0);
    expect(result.maxC).to.equal(10);
    expect(result.excursions).to.have.length(1);
    expect(result.excursions[0]).to.include({ kind: 'high', start: at(60), end: at(120), minutes: 60, peakC: 10 });
    expect(result.storageMinutes).to.equal(240);
  });

  it('a lot moved to a second fridge during an excursion: only the part it sat through, and the 20 minutes out (hand-computed)', () => {
    // Fridge 1 is warm from 11:00 to 13:00; the lot leaves it at 12:00, is out 20 minutes, and goes into fridge 2, which is fine.
    const readings = new Map([
      [1, series(0, 30, [5, 5, 11, 11, 11, 11, 5, 5])],
      [2, series(0, 30, [4, 4, 4, 4, 4, 4, 4, 4])],
    ]);
    const result = lotExposure(input({
      stays: [{ fridgeId: 1, from: at(0), to: at(120) }, { fridgeId: 2, from: at(140), to: at(240) }],
      timeOut: [{ reason: 'transfer', from: at(120), to: at(140) }],
      readings,
    }));
    expect(result.minutesAbove).to.equal(60);
    expect(result.excursions).to.have.length(1);
    expect(result.excursions[0]).to.include({ start: at(60), end: at(120), minutes: 60, peakC: 11 });
    expect(result.excursions[0].fridgeIds).to.deep.equal([1]);
    expect(result.minutesOutOfFridge).to.equal(20);
    expect(result.timeOut[0]).to.include({ minutes: 20, overLimit: false });
    expect(result.storageMinutes).to.equal(220);
  });

  it('judges by the product label, not the fridge alarm: 7.5 °C is inside a 35–46 °F alarm but above a 2–7 °C label', () => {
    // 46 °F = 7.778 °C (NIST SP 811 conversion); the product's own 7 °C limit is the one that counts (hand-computed).
    const readings = new Map([[1, series(0, 30, [5, 7.5, 7.5, 5])]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(120) }], readings, limits: { lowC: 2, highC: 7 } }));
    expect(result.minutesAbove).to.equal(60);
    expect(result.excursions[0].peakC).to.equal(7.5);
  });

  it('a three-hour hole in the log is unknown time, never counted as in range (hand-computed)', () => {
    // Readings at 10:00, 10:30, then 14:00, 14:30: nominal interval 30 min, so 10:30 stands for 30 min and 11:00–14:00 is a gap.
    const readings = new Map([[1, [{ at: at(0), tempC: 5 }, { at: at(30), tempC: 5 }, { at: at(240), tempC: 5 }, { at: at(270), tempC: 5 }]]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(300) }], readings }));
    expect(result.minutesUnknown).to.equal(180);
    expect(result.unknown).to.deep.equal([{ fridgeId: 1, start: at(60), end: at(240), minutes: 180, reason: 'gap' }]);
    expect(result.minutesAbove + result.minutesBelow).to.equal(0);
  });

  it('time before the first reading and after the last is unknown with no readings, not a gap', () => {
    const readings = new Map([[1, series(60, 30, [5, 5])]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(180) }], readings }));
    expect(result.unknown.map((u) => [u.reason, u.minutes])).to.deep.equal([['no-readings', 60], ['no-readings', 60]]);
    const empty = lotExposure(input({ stays: [{ fridgeId: 9, from: at(0), to: at(60) }] }));
    expect(empty.minutesUnknown).to.equal(60);
    expect(empty.mktStorageC).to.equal(null);
  });

  it('a transfer over the product limit is flagged; one within it is not; an unknown limit is flagged (hand-computed)', () => {
    const base = { stays: [], readings: new Map() };
    const over = lotExposure(input({ ...base, timeOut: [{ reason: 'transfer', from: at(0), to: at(45) }] }));
    const within = lotExposure(input({ ...base, timeOut: [{ reason: 'transfer', from: at(0), to: at(30) }] }));
    const unknownLimit = lotExposure(input({ ...base, timeOutLimitMinutes: null, timeOut: [{ reason: 'transfer', from: at(0), to: at(10) }] }));
    const inTransit = lotExposure(input({ ...base, timeOut: [{ reason: 'transfer', from: at(0), to: null }] }));
    expect(over.timeOut[0]).to.include({ minutes: 45, overLimit: true });
    expect(within.timeOut[0]).to.include({ minutes: 30, overLimit: false });
    expect(unknownLimit.timeOut[0].overLimit).to.equal(true);
    expect(inTransit.timeOut[0]).to.include({ minutes: null, overLimit: true });
  });

  it('a freeze-sensitive product that saw 0 °C or below froze; a product that is not freeze-sensitive did not', () => {
    // 32 °F = 0 °C exactly (NIST SP 811): "at or below 0 °C" includes it.
    const readings = new Map([[1, series(0, 30, [3, 0, -0.5, 3])]]);
    const stays = [{ fridgeId: 1, from: at(0), to: at(120) }];
    const sensitive = lotExposure(input({ stays, readings }));
    const hardy = lotExposure(input({ stays, readings, freezeSensitive: false }));
    expect(sensitive.froze).to.equal(true);
    expect(sensitive.firstFreezeAt).to.equal(at(30));
    expect(hardy.froze).to.equal(false);
    expect(sensitive.minutesBelow).to.equal(60);
  });

  it('the 24-hour MKT ending at an excursion: 23 h at 5 °C then 1 h at 15 °C gives 5.764 °C (computed from USP ⟨1160⟩)', () => {
    const temps = [...Array(23).fill(5), 15];
    const readings = new Map([[1, series(0, 60, temps)]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(24 * 60) }], readings }));
    expect(result.excursions).to.have.length(1);
    expect(result.excursions[0].end).to.equal(at(24 * 60));
    expect(result.excursions[0].mkt24hC).to.be.closeTo(5.764, 0.001);
    expect(result.mktStorageC).to.be.closeTo(5.764, 0.001);
  });

  it('an out-of-range arrival reading is an exposure of unknown length', () => {
    expect(lotExposure(input({ arrivalOutOfRange: true })).arrivalExposureUnknown).to.equal(true);
    expect(lotExposure(input({})).arrivalExposureUnknown).to.equal(false);
  });

  it('vials in two fridges at once: time above counts once even when both are warm (hand-computed)', () => {
    const readings = new Map([[1, series(0, 30, [9, 9])], [2, series(0, 30, [10, 10])]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(60) }, { fridgeId: 2, from: at(0), to: at(60) }], readings }));
    expect(result.minutesAbove).to.equal(60);
    expect(result.storageMinutes).to.equal(60);
    expect(result.maxC).to.equal(10);
  });

  it('a 3-hour primary outage filled by a 30-minute backup: each backup reading stands for 30 minutes, nothing unknown (hand-computed)', () => {
    // Primary every 10 min at 10:00–11:00 and 14:10–14:50 (5 °C): its 11:00 reading stands for one step, so its gap is
    // 11:10–14:10 (3 h). The backup reads every 30 min from 10:10; 11:10, 11:40, …, 13:40 fall in the gap and stand for
    // 30 min each, 6 × 30 = 180 min: 12:10 and 12:40 read 9 °C, so 12:10–13:10 is 60 min above a 2–8 °C label.
    const primary = [...series(0, 10, Array(7).fill(5)), ...series(250, 10, Array(5).fill(5))];
    const backup = series(10, 30, [5, 5, 5, 5, 9, 9, 5, 5, 5, 5]);
    const readings = new Map([[1, fridgeExposureReadings(primary, backup)]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(300) }], readings }));
    expect(result.minutesUnknown).to.equal(0);
    expect(result.unknown).to.deep.equal([]);
    expect(result.storageMinutes).to.equal(300);
    expect(result.minutesAbove).to.equal(60);
    expect(result.minutesBelow).to.equal(0);
    expect(result.excursions).to.have.length(1);
    expect(result.excursions[0]).to.include({ kind: 'high', start: at(130), end: at(190), minutes: 60, peakC: 9 });
    // The MKT of storage weighs each backup reading by its 30 minutes: 60 of 300 minutes at 9 °C, 240 at 5 °C gives
    // 5.969 °C (computed from USP ⟨1160⟩, ΔH/R = 10,000 K).
    expect(result.mktStorageC).to.be.closeTo(5.969, 0.001);
  });

  it('a backup reading stands for no more than the usual maximum gap rule allows: a hole in the backup stays unknown (hand-computed)', () => {
    // Same primary outage 11:10–14:10; the backup reads at 11:10, 11:40, then not until 13:40. Its own series'
    // nominal step is 30 min and a step over two intervals stands for one (readingDurations): 11:40 covers
    // 11:40–12:10 only, so 12:10–13:40 (90 min) is a gap; 13:40 covers 13:40–14:10.
    const primary = [...series(0, 10, Array(7).fill(5)), ...series(250, 10, Array(5).fill(5))];
    const backup = [...series(10, 30, [5, 5, 5, 5]), ...series(220, 30, [5, 5])];
    const readings = new Map([[1, fridgeExposureReadings(primary, backup)]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: at(300) }], readings }));
    expect(result.unknown).to.deep.equal([{ fridgeId: 1, start: at(130), end: at(220), minutes: 90, reason: 'gap' }]);
    expect(result.minutesUnknown).to.equal(90);
    expect(result.minutesAbove + result.minutesBelow).to.equal(0);
  });

  it('a stay still open ends at asOf', () => {
    const readings = new Map([[1, series(0, 30, [5, 5, 5, 5])]]);
    const result = lotExposure(input({ stays: [{ fridgeId: 1, from: at(0), to: null }], readings, asOf: at(120) }));
    expect(result.storageMinutes).to.equal(120);
    expect(result.minutesUnknown).to.equal(0);
  });
});

import { expect } from 'chai';
import { analyzeReadings } from '../../../shared/logs/analyze-readings.js';
import { mergeBackupReadings } from '../../../shared/logs/merge-backup-readings.js';
import type { TimedReading } from '../../../shared/logs/reading-durations.js';

const T0 = Date.UTC(2026, 2, 1, 8);
const MIN = 60_000;
const at = (m: number, tempC: number): TimedReading => ({ at: T0 + m * MIN, tempC });
const CDC = { lowC: 2, highC: 8 }; // CDC Vaccine Storage and Handling Toolkit, 2–8 °C

// Every expected figure here is hand-computed from the rules in the module comment.
describe('mergeBackupReadings', () => {
  it('uses the backup only inside the primary’s gap, marked as from the backup', () => {
    const primary = [at(0, 4), at(10, 4), at(20, 4), at(70, 4), at(80, 4)]; // gap 30–70
    const backup = [0, 15, 30, 45, 60, 75].map((m) => at(m, 5));
    const merged = mergeBackupReadings(primary, backup);
    expect(merged.readings.filter((r) => r.fromBackup).map((r) => (r.at - T0) / MIN)).to.deep.equal([30, 45, 60]);
    // The backup's own interval is 15 min, cut at the primary's next reading.
    expect(merged.readings.filter((r) => r.fromBackup).map((r) => r.standsForMs! / MIN)).to.deep.equal([15, 15, 10]);
    expect(merged.fills).to.deep.equal([{ start: T0 + 30 * MIN, end: T0 + 70 * MIN, minutes: 40 }]);
    expect(analyzeReadings(merged.readings, CDC).gaps).to.deep.equal([]);
  });

  it('leaves the part of a gap no backup reading stands for as a gap', () => {
    const primary = [at(0, 4), at(10, 4), at(20, 4), at(90, 4), at(100, 4)]; // gap 30–90
    const backup = [at(50, 9), at(60, 9)];
    const merged = mergeBackupReadings(primary, backup);
    expect(merged.fills).to.deep.equal([{ start: T0 + 50 * MIN, end: T0 + 70 * MIN, minutes: 20 }]);
    const analysis = analyzeReadings(merged.readings, CDC);
    expect(analysis.gaps.map((g) => [(g.start - T0) / MIN, (g.end - T0) / MIN])).to.deep.equal([[30, 50], [70, 90]]);
    expect(analysis.excursions.map((e) => [e.kind, e.minutes])).to.deep.equal([['high', 20]]);
  });

  it('fills before the primary starts and after it stops', () => {
    const merged = mergeBackupReadings([at(30, 4), at(40, 4)], [at(0, 5), at(10, 5), at(20, 5), at(50, 5), at(60, 5)]);
    expect(merged.readings.filter((r) => r.fromBackup).map((r) => (r.at - T0) / MIN)).to.deep.equal([0, 10, 20, 50, 60]);
  });

  it('is the primary alone when it has no gap, and the backup alone when there is no primary', () => {
    const primary = [at(0, 4), at(10, 4), at(20, 4)];
    expect(mergeBackupReadings(primary, [at(5, 9), at(15, 9)]).readings.every((r) => !r.fromBackup)).to.equal(true);
    expect(mergeBackupReadings([], primary).readings.every((r) => r.fromBackup)).to.equal(true);
  });
});

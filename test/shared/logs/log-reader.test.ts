import { expect } from 'chai';
import { parse } from 'csv-parse/sync';
import { readFileSync } from 'node:fs';
import { LogReader } from '../../../shared/logs/log-reader.js';
import type { LogLayout } from '../../../shared/logs/log-layout.js';
import { readLogText } from '../../../shared/logs/read-log-text.js';
import { requireLayout } from '../../../shared/logs/require-layout.js';
import { sniffLog } from '../../../shared/logs/sniff-log.js';
import { splitLines } from '../../../shared/logs/split-lines.js';

const LAYOUT: LogLayout = {
  delimiter: ',',
  headerLine: 2,
  decimalComma: false,
  timeColumn: 0,
  tempColumn: 1,
  unit: 'F',
  dateOrder: 'YMD',
  zone: 'UTC',
};

describe('LogReader', () => {
  it('returns each reading as its line is pushed, ignoring lines up to the header', () => {
    const reader = new LogReader(LAYOUT);
    expect(reader.pushLine('Serial: 9')).to.equal(undefined);
    expect(reader.pushLine('Time,Temp °F')).to.equal(undefined);
    const first = reader.pushLine('2026-03-01 08:00,41\r');
    expect(first).to.deep.equal({ at: Date.UTC(2026, 2, 1, 8), tempC: 5, line: 3 }); // (41 − 32)/1.8, NIST SP 811
    expect(reader.pushLine('2026-03-01 08:05,x')).to.equal(undefined);
    expect(reader.pushLine('2026-03-01 08:10,50')).to.deep.include({ tempC: 10, line: 5 });
    const result = reader.finish();
    expect(result.readings).to.have.length(2);
    expect(result.warnings).to.deep.equal([{ line: 4, message: "temperature 'x' is not a number; row skipped" }]);
  });

  it('takes records from a CSV parser with their line numbers and reads them as the text reader does', () => {
    const text = readFileSync(new URL('../../fixtures/logs/semicolon-decimal-comma.csv', import.meta.url), 'utf8');
    const layout = requireLayout(sniffLog(splitLines(text), { zone: 'Europe/Berlin' }));
    const reader = new LogReader(layout);
    // With `info`, each record comes with the parser's line count, which is what pushRecord wants;
    // csv-parse's types do not model `info: true`, hence the cast.
    const options = { delimiter: layout.delimiter, info: true, relax_column_count: true, bom: true };
    const rows = parse(text, options) as unknown as { record: string[]; info: { lines: number } }[];
    for (const { record, info } of rows) reader.pushRecord(record, info.lines);
    expect(reader.finish().readings).to.deep.equal(readLogText(text, { zone: 'Europe/Berlin' }).readings);
  });

  it('skips a readable number no logger records, such as a -999 sentinel, naming its line', () => {
    const reader = new LogReader({ ...LAYOUT, unit: 'C', headerLine: 1 });
    reader.pushLine('Time,Temp °C');
    reader.pushLine('2026-03-01 08:00,4');
    expect(reader.pushLine('2026-03-01 08:10,-999')).to.equal(undefined);
    reader.pushLine('2026-03-01 08:20,5');
    const result = reader.finish();
    expect(result.readings.map((r) => r.tempC)).to.deep.equal([4, 5]);
    expect(result.warnings).to.deep.equal([{ line: 3, message: "temperature '-999' is outside what a logger records (-100 to 200 °C); row skipped" }]);
  });

  it('refuses to finish with fewer than two readings', () => {
    const reader = new LogReader(LAYOUT);
    reader.pushLine('Serial: 9');
    reader.pushLine('Time,Temp °F');
    reader.pushLine('2026-03-01 08:00,41');
    expect(() => reader.finish()).to.throw(/fewer than two readable rows \(found 1\)/);
  });

  it('refuses an unknown zone when it is built', () => {
    expect(() => new LogReader({ ...LAYOUT, zone: 'Atlantis/Lost' })).to.throw(/unknown time zone 'Atlantis\/Lost'/);
  });
});

import { expect } from 'chai';
import { readFileSync } from 'node:fs';
import { LogFileError } from '../../../shared/logs/log-file-error.js';
import { readLogText } from '../../../shared/logs/read-log-text.js';

const fixture = (name: string) => readFileSync(new URL(`../../fixtures/logs/${name}`, import.meta.url), 'utf8');
const iso = (ms: number) => new Date(ms).toISOString();
const times = (result: ReturnType<typeof readLogText>) => result.readings.map((r) => iso(r.at));
const temps = (result: ReturnType<typeof readLogText>) => result.readings.map((r) => Math.round(r.tempC * 1000) / 1000);

function fatal(text: string, mapping = {}): LogFileError {
  try {
    readLogText(text, mapping);
  } catch (error) {
    if (error instanceof LogFileError) return error;
    throw error;
  }
  throw new Error('expected a LogFileError');
}

describe('readLogText', () => {
  describe('file shapes', () => {
    it('reads a BOM, CRLF file with metadata, converting °F and ignoring humidity and alarm columns', () => {
      const result = readLogText(fixture('bom-crlf-metadata.csv'), { zone: 'America/Chicago' });
      expect(times(result)).to.deep.equal([
        '2026-03-01T14:00:00.000Z', // IANA tz: CST −06:00
        '2026-03-01T14:15:00.000Z',
        '2026-03-01T14:30:00.000Z',
        '2026-03-01T15:00:00.000Z',
      ]);
      expect(temps(result)).to.deep.equal([4.5, 5, 7.722, 6.778]); // NIST SP 811 B.9: (F − 32)/1.8
      expect(result.warnings).to.deep.equal([{ line: 9, message: 'temperature is empty; row skipped' }]); // line 9 of the file, BOM line 1
    });

    it('reads `;` with decimal commas and day-first dates', () => {
      const result = readLogText(fixture('semicolon-decimal-comma.csv'), { zone: 'Europe/Berlin' });
      expect(times(result)).to.deep.equal([
        '2026-03-01T07:00:00.000Z', // IANA tz: CET +01:00
        '2026-03-01T07:10:00.000Z',
        '2026-03-01T07:20:00.000Z',
        '2026-03-13T07:30:00.000Z',
      ]);
      expect(temps(result)).to.deep.equal([4.5, 4.7, -0.5, 5]);
    });

    it('reads tab-separated ISO times with offsets, ignoring the serial column', () => {
      const result = readLogText(fixture('tab-offsets.csv'));
      expect(times(result)).to.deep.equal(['2026-03-01T14:00:00.000Z', '2026-03-01T14:05:00.000Z', '2026-03-01T14:10:00.000Z']);
      expect(temps(result)).to.deep.equal([4, 4.5, 5]);
    });

    it('reads separate date and 12-hour time columns across midnight', () => {
      const result = readLogText(fixture('twelve-hour-split.csv'), { zone: 'UTC' });
      expect(times(result)).to.deep.equal([
        '2026-03-08T23:45:00.000Z',
        '2026-03-09T00:00:00.000Z', // 12:00 AM is midnight
        '2026-03-09T00:15:00.000Z',
        '2026-03-13T12:30:00.000Z', // 12:30 PM is just after noon
      ]);
    });

    it('reads an ambiguous day/month order the way the mapping says', () => {
      const text = 'Time,Temp °C\n03/04/2026 10:00,4\n03/04/2026 10:10,5\n';
      expect(times(readLogText(text, { zone: 'UTC', dateOrder: 'DMY' }))[0]).to.equal('2026-04-03T10:00:00.000Z');
      expect(times(readLogText(text, { zone: 'UTC', dateOrder: 'MDY' }))[0]).to.equal('2026-03-04T10:00:00.000Z');
    });

    it('takes quoted fields and a unit given by the mapping under an unhelpful header', () => {
      const text = '"Col A","Col B"\n"2026-03-01 08:00","4,5"\n"2026-03-01 08:05","4,0"\n';
      expect(temps(readLogText(text, { zone: 'UTC', unit: 'C' }))).to.deep.equal([4.5, 4]);
    });
  });

  describe('clock changes in America/Chicago (IANA tz database)', () => {
    it('reads the repeated 01:00–01:59 of 2026-11-01 as CDT, then CST', () => {
      const text = [
        'Time,Temp °F',
        '2026-11-01 00:30,40',
        '2026-11-01 01:00,40',
        '2026-11-01 01:30,40',
        '2026-11-01 01:00,41',
        '2026-11-01 01:30,41',
        '2026-11-01 02:00,41',
      ].join('\n');
      expect(times(readLogText(text, { zone: 'America/Chicago' }))).to.deep.equal([
        '2026-11-01T05:30:00.000Z', // CDT −05:00
        '2026-11-01T06:00:00.000Z', // CDT
        '2026-11-01T06:30:00.000Z', // CDT
        '2026-11-01T07:00:00.000Z', // CST −06:00
        '2026-11-01T07:30:00.000Z', // CST
        '2026-11-01T08:00:00.000Z', // CST
      ]);
    });

    it('skips 2026-03-08 02:30, which does not exist, with a warning naming its line', () => {
      const text = ['Time,Temp °F', '2026-03-08 01:30,40', '2026-03-08 02:30,40', '2026-03-08 03:30,40'].join('\n');
      const result = readLogText(text, { zone: 'America/Chicago' });
      expect(times(result)).to.deep.equal(['2026-03-08T07:30:00.000Z', '2026-03-08T08:30:00.000Z']); // CST, then CDT
      expect(result.warnings).to.have.length(1);
      expect(result.warnings[0].line).to.equal(3);
      expect(result.warnings[0].message).to.match(/2026-03-08 02:30 does not exist in America\/Chicago/);
      expect(result.skipped).to.equal(1);
    });
  });

  describe('rows that cannot be read', () => {
    const text = [
      'Serial: 123', // 1
      'Device name,Reach-in 1', // 2
      'Time,Temp °C,Humidity', // 3
      '2026-03-01 08:00,4.0,50', // 4
      '2026-03-01 08:10,,50', // 5: empty temperature
      '2026-03-01 08:20,warm,50', // 6: not a number
      'yesterday,4.1,50', // 7: bad time
      '2026-03-01 08:40', // 8: too few fields
      '', // 9: blank, skipped silently
      '2026-03-01 08:50,4.2,50', // 10
    ].join('\n');

    it('skips each with a warning naming its line, counting metadata and header lines', () => {
      const result = readLogText(text, { zone: 'UTC' });
      expect(result.warnings).to.deep.equal([
        { line: 5, message: 'temperature is empty; row skipped' },
        { line: 6, message: "temperature 'warm' is not a number; row skipped" },
        { line: 7, message: "time 'yesterday' cannot be read; row skipped" },
        { line: 8, message: 'row has 1 fields, too few for the chosen columns; row skipped' },
      ]);
      expect(result.skipped).to.equal(4);
      expect(result.readings.map((r) => r.line)).to.deep.equal([4, 10]);
    });
  });

  describe('order and repeats', () => {
    it('sorts rows out of time order, with one warning for the whole file', () => {
      const text = ['Time,Temp °C', '2026-03-01 08:20,3', '2026-03-01 08:00,1', '2026-03-01 08:10,2', '2026-03-01 07:50,0'].join('\n');
      const result = readLogText(text, { zone: 'UTC' });
      expect(temps(result)).to.deep.equal([0, 1, 2, 3]);
      expect(result.warnings).to.have.length(1);
      expect(result.warnings[0]).to.deep.include({ line: 3 });
      expect(result.warnings[0].message).to.match(/not in time order/);
    });

    it('keeps the first row in file order for a repeated timestamp, warning on the repeat', () => {
      const text = ['Time,Temp °C', '2026-03-01 08:00,1', '2026-03-01 08:10,2', '2026-03-01 08:00,9', '2026-03-01 08:20,3'].join('\n');
      const result = readLogText(text, { zone: 'UTC' });
      expect(temps(result)).to.deep.equal([1, 2, 3]);
      expect(result.skipped).to.equal(1);
      const repeat = result.warnings.find((w) => /repeats time/.test(w.message));
      expect(repeat).to.deep.equal({ line: 4, message: 'repeats time 2026-03-01T08:00:00.000Z of line 2; row skipped' });
    });

    it('treats the same instant written with two offsets as a repeat', () => {
      const text = ['Time,Temp °C', '2026-03-01T08:00:00-06:00,1', '2026-03-01T14:00:00Z,2', '2026-03-01T14:10:00Z,3'].join('\n');
      expect(temps(readLogText(text))).to.deep.equal([1, 3]);
    });
  });

  describe('fatal input', () => {
    it('fails without a header row', () => {
      const error = fatal('2026-03-01 08:00,4\n2026-03-01 08:10,4\n', { zone: 'UTC', unit: 'C' });
      expect(error.message).to.match(/no header row found/);
      expect(error.needs).to.deep.equal(['header']);
    });

    it('fails on an empty file', () => {
      expect(fatal('').message).to.match(/no header row found/);
    });

    it('fails without a temperature column', () => {
      const error = fatal('Time,Note,Temp °C\n2026-03-01 08:00,ok,\n2026-03-01 08:10,ok,\n', { zone: 'UTC' });
      expect(error.message).to.match(/no temperature column/);
      expect(error.needs).to.deep.equal(['tempColumn']);
    });

    it('fails when the unit is unknown and not given, and reads once it is', () => {
      const text = 'Time,Temperature\n2026-03-01 08:00,4\n2026-03-01 08:10,4\n';
      const error = fatal(text, { zone: 'UTC' });
      expect(error.message).to.match(/unit unknown/);
      expect(error.needs).to.deep.equal(['unit']);
      expect(readLogText(text, { zone: 'UTC', unit: 'C' }).readings).to.have.length(2);
    });

    it('fails with fewer than two readable rows', () => {
      const error = fatal('Time,Temp °C\n2026-03-01 08:00,4\n2026-03-01 08:10,n/a\n', { zone: 'UTC' });
      expect(error.message).to.equal('fewer than two readable rows (found 1)');
    });

    it('fails on an ambiguous date order, naming what to give', () => {
      expect(fatal('Time,Temp °C\n03/04/2026 10:00,4\n03/04/2026 10:10,5\n', { zone: 'UTC' }).needs).to.deep.equal(['dateOrder']);
    });
  });
});

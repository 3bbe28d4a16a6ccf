import { expect } from 'chai';
import { readFileSync } from 'node:fs';
import { sniffLog } from '../../../shared/logs/sniff-log.js';
import { splitLines } from '../../../shared/logs/split-lines.js';

const fixture = (name: string) => splitLines(readFileSync(new URL(`../../fixtures/logs/${name}`, import.meta.url), 'utf8'));
const sniff = (text: string, mapping = {}) => sniffLog(splitLines(text), mapping);

describe('sniffLog', () => {
  describe('file shapes', () => {
    it('finds the header below a BOM, CRLF line ends and metadata lines', () => {
      const result = sniffLog(fixture('bom-crlf-metadata.csv'), { zone: 'America/Chicago' });
      expect(result.needs).to.deep.equal([]);
      expect(result.header).to.deep.equal(['Date/Time', 'Temperature (°F)', 'Humidity (%RH)', 'Alarm']);
      expect(result.found).to.include({ delimiter: ',', headerLine: 5, timeColumn: 0, tempColumn: 1, unit: 'F', dateOrder: 'YMD' });
    });

    it('detects `;` with a decimal comma, and skips a humidity column that comes first', () => {
      const result = sniffLog(fixture('semicolon-decimal-comma.csv'), { zone: 'Europe/Berlin' });
      expect(result.needs).to.deep.equal([]);
      expect(result.found).to.include({ delimiter: ';', decimalComma: true, headerLine: 2, unit: 'C', dateOrder: 'DMY' });
      expect(result.found).to.include({ dateColumn: 0, timeColumn: 1, tempColumn: 3 });
    });

    it('detects tabs, and needs no zone when every time carries an offset', () => {
      const result = sniffLog(fixture('tab-offsets.csv'));
      expect(result.needs).to.deep.equal([]);
      expect(result.found).to.include({ delimiter: '\t', timeColumn: 0, tempColumn: 2, unit: 'C', decimalComma: false });
    });

    it('finds separate date and 12-hour time columns and a month-first order', () => {
      const result = sniffLog(fixture('twelve-hour-split.csv'), { zone: 'America/Chicago' });
      expect(result.found).to.include({ dateColumn: 0, timeColumn: 1, tempColumn: 2, unit: 'F', dateOrder: 'MDY' });
    });

    it('tells day-first from month-first by a day above 12', () => {
      expect(sniff('Time,Temp °C\n04/03/2026 10:00,5\n13/03/2026 10:00,5\n', { zone: 'UTC' }).found.dateOrder).to.equal('DMY');
      expect(sniff('Time,Temp °C\n03/04/2026 10:00,5\n03/13/2026 10:00,5\n', { zone: 'UTC' }).found.dateOrder).to.equal('MDY');
    });

    it('finds the day above 12 anywhere in the lines it is given, not only the first rows', () => {
      const rows = Array.from({ length: 300 }, (_, i) => `0${1 + Math.floor(i / 250)}/02/2026 ${String(i % 24).padStart(2, '0')}:00,5`);
      rows.push('14/02/2026 00:00,5');
      expect(sniff(`Time,Temp °C\n${rows.join('\n')}`, { zone: 'UTC' }).found.dateOrder).to.equal('DMY');
    });
  });

  describe('headers in five languages', () => {
    const cases: [string, string][] = [
      ['English', 'Date,Time,Humidity (%),Temperature (°C)\n13/03/2026,08:00,60,4.5\n13/03/2026,08:10,60,4.6'],
      ['Spanish', 'Fecha;Hora;Humedad (%);Temperatura (°C)\n13/03/2026;08:00;60;4,5\n13/03/2026;08:10;60;4,6'],
      ['French', 'Date;Heure;Humidité (%);Température (°C)\n13/03/2026;08:00;60;4,5\n13/03/2026;08:10;60;4,6'],
      ['German', 'Datum;Uhrzeit;Luftfeuchte (%);Temperatur [°C]\n13.03.2026;08:00;60;4,5\n13.03.2026;08:10;60;4,6'],
      ['Dutch', 'Datum;Tijd;Luchtvochtigheid (%);Temperatuur (°C)\n13-03-2026;08:00;60;4,5\n13-03-2026;08:10;60;4,6'],
    ];
    for (const [language, text] of cases) {
      it(`finds date, time and temperature columns in ${language}`, () => {
        const result = sniff(text, { zone: 'Europe/Paris' });
        expect(result.needs, language).to.deep.equal([]);
        expect(result.found, language).to.include({ dateColumn: 0, timeColumn: 1, tempColumn: 3, unit: 'C', dateOrder: 'DMY' });
      });
    }
  });

  describe('columns found by their values', () => {
    it('finds the time and temperature columns under unhelpful headers, passing over a row counter', () => {
      const text = 'Col A,Col B,Col C\n1,2026-03-01 08:00,4.1\n2,2026-03-01 08:05,4.3\n3,2026-03-01 08:10,4.2';
      const result = sniff(text, { zone: 'UTC', unit: 'C' });
      expect(result.needs).to.deep.equal([]);
      expect(result.found).to.include({ timeColumn: 1, tempColumn: 2 });
      expect(result.columns.map((c) => c.kind)).to.deep.equal(['number', 'datetime', 'number']);
    });

    it('asks which column when several unnamed numeric columns could be the temperature', () => {
      const text = 'When,A,B\n2026-03-01 08:00,4.1,60.2\n2026-03-01 08:05,4.3,61.0';
      expect(sniff(text, { zone: 'UTC', unit: 'C' }).needs).to.deep.equal(['tempColumn']);
    });

    it('asks which column when two headers both say temperature', () => {
      const text = 'Time,Temp 1 (°C),Temp 2 (°C)\n2026-03-01 08:00,4.1,5.0\n2026-03-01 08:05,4.3,5.2';
      const result = sniff(text, { zone: 'UTC' });
      expect(result.needs).to.deep.equal(['tempColumn']);
      expect(sniff(text, { zone: 'UTC', tempColumn: 'temp 2 (°c)' }).found.tempColumn).to.equal(2);
    });
  });

  describe('what it asks for', () => {
    it('asks for the date order when every date reads both ways, with a preview of the first lines', () => {
      const text = 'Logger 7\nTime,Temp °F\n03/04/2026 10:00,40\n03/04/2026 10:10,41\n';
      const result = sniff(text, { zone: 'UTC' });
      expect(result.needs).to.deep.equal(['dateOrder']);
      expect(result.found).to.include({ timeColumn: 0, tempColumn: 1, unit: 'F', headerLine: 2 });
      expect(result.preview.slice(0, 3)).to.deep.equal([
        { line: 1, fields: ['Logger 7'] },
        { line: 2, fields: ['Time', 'Temp °F'] },
        { line: 3, fields: ['03/04/2026 10:00', '40'] },
      ]);
      expect(sniff(text, { zone: 'UTC', dateOrder: 'DMY' }).needs).to.deep.equal([]);
    });

    it('asks for the unit when neither header nor cells give it', () => {
      expect(sniff('Time,Temperature\n2026-03-01 08:00,4.1\n2026-03-01 08:05,4.3', { zone: 'UTC' }).needs).to.deep.equal(['unit']);
    });

    it('takes the unit from the cells when they carry it', () => {
      expect(sniff('Time,Reading\n2026-03-01 08:00,40.1 °F\n2026-03-01 08:05,40.3 °F', { zone: 'UTC' }).found.unit).to.equal('F');
    });

    it('asks for the zone when times have no offset', () => {
      expect(sniff('Time,Temp °C\n2026-03-01 08:00,4.1\n2026-03-01 08:05,4.3').needs).to.deep.equal(['zone']);
    });

    it('asks for the zone again, with a note, when the given zone is unknown', () => {
      const result = sniff('Time,Temp °C\n2026-03-01 08:00,4.1\n2026-03-01 08:05,4.3', { zone: 'Nowhere/Special' });
      expect(result.needs).to.deep.equal(['zone']);
      expect(result.notes).to.deep.equal(["unknown time zone 'Nowhere/Special'"]);
    });

    it('asks for the header when the file starts straight with readings', () => {
      expect(sniff('2026-03-01 08:00,4.1\n2026-03-01 08:05,4.3').needs).to.deep.equal(['header']);
    });

    it('asks for the header when no row below one holds a date', () => {
      expect(sniff('Time,Temp °C\n08:00,4.1\n08:05,4.3').needs).to.deep.equal(['header']);
    });

    it('asks for the time column when the dates have no time of day', () => {
      const result = sniff('Date,Temp °C\n2026-03-01,4.1\n2026-03-02,4.3', { zone: 'UTC' });
      expect(result.needs).to.deep.equal(['timeColumn']);
      expect(result.found.dateColumn).to.equal(0);
    });

    it('asks for the time column, with a note, when the named one is not in the header', () => {
      const result = sniff('Time,Temp °C\n2026-03-01 08:00,4.1\n2026-03-01 08:05,4.3', { zone: 'UTC', timeColumn: 'Zeit' });
      expect(result.needs).to.deep.equal(['timeColumn']);
      expect(result.notes[0]).to.match(/time column 'Zeit' is not in the header/);
    });

    it('lets a mapping override the header line and every column', () => {
      const text = 'A,B,C\nx,y,z\n2026-03-01 08:00,4.1,9\n2026-03-01 08:05,4.3,9';
      const result = sniff(text, { headerLine: 2, timeColumn: 'x', tempColumn: 2, unit: 'F', zone: 'UTC' });
      expect(result.needs).to.deep.equal([]);
      expect(result.found).to.include({ headerLine: 2, timeColumn: 0, tempColumn: 2, unit: 'F' });
    });
  });
});

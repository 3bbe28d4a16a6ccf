import { expect } from 'chai';
import { splitCsvLine } from '../../../shared/logs/split-csv-line.js';
import { splitLines } from '../../../shared/logs/split-lines.js';

describe('splitCsvLine', () => {
  it('splits on the delimiter and keeps empty fields', () => {
    expect(splitCsvLine('a,,c,', ',')).to.deep.equal(['a', '', 'c', '']);
    expect(splitCsvLine('a;b\tc', ';')).to.deep.equal(['a', 'b\tc']);
  });

  it('keeps delimiters and doubled quotes inside quoted fields', () => {
    expect(splitCsvLine('"2026-03-01 08:00","4,5","say ""hi"""', ',')).to.deep.equal(['2026-03-01 08:00', '4,5', 'say "hi"']);
  });
});

describe('splitLines', () => {
  it('removes a BOM and splits LF, CRLF and lone-CR text alike, without a trailing empty line', () => {
    expect(splitLines('\uFEFFa\r\nb\r\n')).to.deep.equal(['a', 'b']);
    expect(splitLines('a\nb\n\nc')).to.deep.equal(['a', 'b', '', 'c']);
    expect(splitLines('a\rb\r')).to.deep.equal(['a', 'b']);
  });
});

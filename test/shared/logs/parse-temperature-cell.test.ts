import { expect } from 'chai';
import { parseTemperatureCell, temperatureCellUnit } from '../../../shared/logs/parse-temperature-cell.js';

describe('parseTemperatureCell', () => {
  it('reads plain numbers exactly as Number does', () => {
    for (const text of ['40', '40.1', '-0.5', '4.25', '-12.375', '0.1', '98.60']) {
      expect(parseTemperatureCell(text, false), text).to.equal(Number(text));
    }
  });

  it('reads a decimal comma only when told the file uses one', () => {
    expect(parseTemperatureCell('4,5', true)).to.equal(4.5);
    expect(parseTemperatureCell('-0,5', true)).to.equal(-0.5);
    expect(parseTemperatureCell('4,5', false)).to.be.NaN;
  });

  it('accepts a plus sign, a Unicode minus and a trailing unit', () => {
    expect(parseTemperatureCell('+4.5', false)).to.equal(4.5);
    expect(parseTemperatureCell('\u22123.5', false)).to.equal(-3.5);
    expect(parseTemperatureCell('4.5 °C', false)).to.equal(4.5);
    expect(temperatureCellUnit('40.1°F')).to.equal('F');
    expect(temperatureCellUnit('40.1')).to.equal(undefined);
  });

  it('returns NaN for anything that is not a number', () => {
    for (const text of ['', '-', '.', 'abc', '4.5.6', '0x10', '1e3', 'NaN', 'Infinity', '4.5 K']) {
      expect(parseTemperatureCell(text, true), text).to.be.NaN;
    }
  });
});

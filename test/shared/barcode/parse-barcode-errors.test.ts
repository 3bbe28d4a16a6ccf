import { expect } from 'chai';
import { parseBarcode } from '../../../shared/barcode/parse-barcode.js';
import { BarcodeError } from '../../../shared/barcode/barcode-error.js';

const NOW = new Date('2026-12-02T12:00:00Z');
const GS = '\u001d';

function reasonFor(data: string): string {
  try {
    parseBarcode(data, NOW);
  } catch (error) {
    expect(error).to.be.instanceOf(BarcodeError);
    return (error as BarcodeError).message;
  }
  expect.fail(`expected ${JSON.stringify(data)} to be refused`);
}

describe('parseBarcode refuses bad input with a message naming the problem', () => {
  it('says the input is empty for an empty string', () => {
    expect(reasonFor('')).to.match(/empty/);
  });

  it('says the input is empty for whitespace only', () => {
    expect(reasonFor(' \r\n')).to.match(/empty/);
  });

  it('names an unknown AI in bracketed text', () => {
    expect(reasonFor('(01)09506000134352(99)ABC')).to.match(/unknown application identifier \(99\)/);
  });

  it('names an unknown AI in raw data and where it starts', () => {
    expect(reasonFor('0109506000134352' + '05123')).to.match(/unknown application identifier \(05\) at character 17/);
  });

  it('names a three-digit AI that is not supported', () => {
    expect(reasonFor(`0109506000134352242123`)).to.match(/unknown application identifier \(242\)/);
  });

  it('refuses a lot of 21 characters, the maximum being 20', () => {
    expect(reasonFor('(01)09506000134352(10)ABCDEFGHIJKLMNOPQRSTU')).to.match(/\(10\) BATCH\/LOT is 21 characters long, the maximum is 20/);
  });

  it('hints at a missing separator when a raw lot runs into the next AI', () => {
    expect(reasonFor('0109506000134352' + '10LOT12345' + '17271231' + '21SERIAL0001')).to.match(/\(10\).*GS separator missing/);
  });

  it('names the AI and the character when a fixed numeric field holds a non-digit', () => {
    expect(reasonFor('(01)0950600013435X')).to.match(/\(01\) GTIN must contain only digits, found "X"/);
  });

  it('refuses a raw expiry cut short by the end of the data', () => {
    expect(reasonFor('0109506000134352' + '172712')).to.match(/\(17\) USE BY or EXPIRY is cut short: it needs 6 characters but has 4/);
  });

  it('refuses a raw GTIN cut short by a separator', () => {
    expect(reasonFor(`01095060001${GS}10ABC`)).to.match(/\(01\) GTIN is cut short/);
  });

  it('refuses a bracketed GTIN with too few digits', () => {
    expect(reasonFor('(01)0950600013435')).to.match(/\(01\) GTIN must be exactly 14 digits, got 13/);
  });

  it('refuses a wrong GTIN check digit and gives the right one', () => {
    expect(reasonFor('(01)09506000134353')).to.match(/\(01\) GTIN 09506000134353 has a wrong check digit: it should end in 2/);
  });

  it('refuses a wrong check digit on a bare EAN-13', () => {
    expect(reasonFor('6291041500214')).to.match(/wrong check digit/);
  });

  it('refuses an expiry with month 13', () => {
    expect(reasonFor('(01)09506000134352(17)271310')).to.match(/\(17\) USE BY or EXPIRY is not a valid date: 271310 has month 13/);
  });

  it('refuses a production date of 31 April', () => {
    expect(reasonFor('(11)260431')).to.match(/\(11\) PROD DATE is not a valid date/);
  });

  it('refuses garbage text', () => {
    expect(reasonFor('hello vial')).to.match(/not a GS1 barcode/);
  });

  it('refuses a lot with a character outside the GS1 AI encodable character set 82', () => {
    expect(reasonFor('(01)09506000134352(10)AB CD')).to.match(/\(10\) BATCH\/LOT contains " ", which is not in the GS1 AI encodable character set 82/);
  });

  it('refuses an empty variable-length field', () => {
    expect(reasonFor(`0109506000134352` + `10${GS}21X`)).to.match(/\(10\) BATCH\/LOT is empty/);
  });

  it('refuses a non-digit in a variable numeric field', () => {
    expect(reasonFor('(01)09506000134352(30)12A')).to.match(/\(30\) VAR. COUNT must contain only digits/);
  });

  it('refuses the same AI twice with different values', () => {
    expect(reasonFor('(01)09506000134352(10)L1(10)L2')).to.match(/\(10\) appears twice/);
  });

  it('refuses bracketed text with an unescaped "(" inside a value', () => {
    expect(reasonFor('(01)09506000134352(10)A(B')).to.match(/expected "\(AI\)" at character 24/);
  });

  it('refuses a symbology identifier it cannot read', () => {
    expect(reasonFor(']A0HELLO')).to.match(/unsupported symbology identifier "\]A0"/);
  });

  it('refuses a symbology identifier with nothing after it', () => {
    expect(reasonFor(']d2')).to.match(/no data after symbology identifier \]d2/);
  });
});

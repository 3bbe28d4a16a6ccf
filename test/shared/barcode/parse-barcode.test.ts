import { expect } from 'chai';
import { parseBarcode } from '../../../shared/barcode/parse-barcode.js';

const NOW = new Date('2026-12-02T12:00:00Z');
const GS = '\u001d';

describe('parseBarcode', () => {
  describe('BWIPP wiki, "GS1 Application Identifier Standard Format"', () => {
    const expected = {
      gtin: '09521234543213',
      lot: '123ABC',
      expiry: '2010-01-01',
      expiryDayGiven: true,
      serial: '1234567890',
      productionDate: null,
      ais: { '01': '09521234543213', '17': '100101', '10': '123ABC', '21': '1234567890' },
    };
    const forms: Array<[string, string]> = [
      ['bracketed text', '(01)09521234543213(17)100101(10)123ABC(21)1234567890'],
      ['raw data with the literal <GS> text', '01095212345432131710010110123ABC<GS>211234567890'],
      ['raw data with a real ASCII 29', `01095212345432131710010110123ABC${GS}211234567890`],
      ['raw data behind a ]d2 prefix', `]d201095212345432131710010110123ABC${GS}211234567890`],
      ['raw data behind a ]C1 prefix', `]C101095212345432131710010110123ABC${GS}211234567890`],
    ];
    for (const [form, data] of forms) {
      it(`reads GTIN, expiry, lot and serial from ${form}`, () => {
        expect(parseBarcode(data, NOW)).to.deep.equal(expected);
      });
    }
  });

  describe('Solidsoft GS1 parser wiki, "GS1 Data Example"', () => {
    const expected = {
      gtin: '05060917510011',
      lot: '628S93R',
      expiry: '2024-10-31',
      expiryDayGiven: false,
      serial: '8898847482518646',
      productionDate: null,
      ais: { '01': '05060917510011', '10': '628S93R', '17': '241000', '21': '8898847482518646' },
    };
    const forms: Array<[string, string]> = [
      ['the literal <GS> text', '010506091751001110628S93R<GS>17241000218898847482518646'],
      ['a real ASCII 29', `010506091751001110628S93R${GS}17241000218898847482518646`],
      ['a ]d2 prefix', `]d2010506091751001110628S93R${GS}17241000218898847482518646`],
      ['a ]C1 prefix', `]C1010506091751001110628S93R${GS}17241000218898847482518646`],
    ];
    for (const [form, data] of forms) {
      it(`reads day 00 as the end of October 2024 with the day marked as not given, from ${form}`, () => {
        expect(parseBarcode(data, NOW)).to.deep.equal(expected);
      });
    }
  });

  it('accepts the ]Q3 and ]e0 prefixes like ]d2', () => {
    const data = '0109506000134352' + '17271231';
    expect(parseBarcode(`]Q3${data}`, NOW).expiry).to.equal('2027-12-31');
    expect(parseBarcode(`]e0${data}`, NOW).gtin).to.equal('09506000134352');
  });

  it('accepts a lowercase <gs> typed by hand', () => {
    expect(parseBarcode('0109506000134352' + '10AB<gs>21X9', NOW)).to.include({ lot: 'AB', serial: 'X9' });
  });

  it('ignores the newline a keyboard-wedge scanner sends after the data', () => {
    expect(parseBarcode('(01)09506000134352(10)L1\r\n', NOW).lot).to.equal('L1');
  });

  it('skips a leading separator some scanners send for the first FNC1', () => {
    expect(parseBarcode(`${GS}0109506000134352`, NOW).gtin).to.equal('09506000134352');
  });

  it('reads the production date from AI 11 using the century rule', () => {
    expect(parseBarcode('(01)09506000134352(11)250300(17)270228', NOW)).to.include({
      productionDate: '2025-03-31',
      expiry: '2027-02-28',
    });
  });

  it('keeps packaging and best-before dates (13, 15) in ais after checking them', () => {
    const parsed = parseBarcode('(01)09506000134352(13)260115(15)270600', NOW);
    expect(parsed.ais).to.deep.equal({ '01': '09506000134352', '13': '260115', '15': '270600' });
    expect(parsed.expiry).to.equal(null);
  });

  it('reads a logistics label: SSCC (00), contained GTIN (02) and count (37) without a GTIN (01)', () => {
    // SSCC check digit 5 computed outside this code with weights 3,1,3,1,... from the right.
    const parsed = parseBarcode(`(00)095060000000000015(02)09506000134352(37)24(400)PO-7781`, NOW);
    expect(parsed.gtin).to.equal(null);
    expect(parsed.ais).to.deep.equal({
      '00': '095060000000000015',
      '02': '09506000134352',
      '37': '24',
      '400': 'PO-7781',
    });
  });

  it('splits raw variable-length fields 30, 240, 241 and 250 at the separators', () => {
    const parsed = parseBarcode(`0109506000134352` + `3012${GS}240A-1${GS}241B/2${GS}250C.3`, NOW);
    expect(parsed.ais).to.include({ '30': '12', '240': 'A-1', '241': 'B/2', '250': 'C.3' });
  });

  it('accepts the same AI twice when both values agree', () => {
    expect(parseBarcode('(01)09506000134352(10)L1(10)L1', NOW).lot).to.equal('L1');
  });

  it('reads a "(" written as "\\(" inside a bracketed lot', () => {
    expect(parseBarcode('(01)09506000134352(10)A\\(B)', NOW).lot).to.equal('A(B)');
  });

  describe('bare GTIN from a plain EAN/UPC scan', () => {
    const cases: Array<[string, string]> = [
      ['96385074', '00000096385074'],
      ['036000291452', '00036000291452'],
      ['6291041500213', '06291041500213'],
      ['09506000134352', '09506000134352'],
    ];
    for (const [scanned, gtin] of cases) {
      it(`returns ${scanned.length}-digit ${scanned} as the 14-digit GTIN ${gtin}`, () => {
        expect(parseBarcode(scanned, NOW)).to.deep.equal({
          gtin,
          lot: null,
          expiry: null,
          expiryDayGiven: null,
          serial: null,
          productionDate: null,
          ais: { '01': gtin },
        });
      });
    }

    it('reads an EAN-13 behind its ]E0 symbology identifier', () => {
      expect(parseBarcode(']E06291041500213', NOW).gtin).to.equal('06291041500213');
    });
  });
});

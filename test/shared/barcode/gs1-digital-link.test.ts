import { expect } from 'chai';
import { parseBarcode } from '../../../shared/barcode/parse-barcode.js';
import { BarcodeError } from '../../../shared/barcode/barcode-error.js';

const NOW = new Date('2026-12-02T12:00:00Z');

describe('GS1 Digital Link URIs (GS1 Digital Link standard)', () => {
  it('reads GTIN and lot from the path and expiry from the query of https://example.com/01/09506000134352/10/ABC1?17=271231', () => {
    expect(parseBarcode('https://example.com/01/09506000134352/10/ABC1?17=271231', NOW)).to.deep.equal({
      gtin: '09506000134352',
      lot: 'ABC1',
      expiry: '2027-12-31',
      expiryDayGiven: true,
      serial: null,
      productionDate: null,
      ais: { '01': '09506000134352', '10': 'ABC1', '17': '271231' },
    });
  });

  it('percent-decodes path segments and query values', () => {
    const parsed = parseBarcode('https://example.com/01/09506000134352/10/AB%2F1/21/S%25%26?17=2712%331', NOW);
    expect(parsed).to.include({ lot: 'AB/1', serial: 'S%&', expiry: '2027-12-31' });
  });

  it('skips a custom path prefix before the primary key', () => {
    expect(parseBarcode('https://id.example.org/products/vials/01/09506000134352/21/778', NOW)).to.include({
      gtin: '09506000134352',
      serial: '778',
    });
  });

  it('ignores non-AI query parameters and the fragment', () => {
    const parsed = parseBarcode('HTTPS://example.com/01/09506000134352?linkType=gs1:pip&10=L7#top', NOW);
    expect(parsed.ais).to.deep.equal({ '01': '09506000134352', '10': 'L7' });
  });

  it('pads a GTIN-13 in the path to 14 digits', () => {
    expect(parseBarcode('https://example.com/01/6291041500213', NOW).gtin).to.equal('06291041500213');
  });

  it('accepts a URI behind the ]Q1 symbology identifier of a plain QR Code', () => {
    expect(parseBarcode(']Q1https://example.com/01/09506000134352', NOW).gtin).to.equal('09506000134352');
  });

  it('validates the GTIN check digit found in the path', () => {
    expect(() => parseBarcode('https://example.com/01/09506000134353', NOW)).to.throw(BarcodeError, /check digit/);
  });

  it('refuses a web address with no GTIN or SSCC in its path', () => {
    expect(() => parseBarcode('https://example.com/about/us', NOW)).to.throw(BarcodeError, /not a GS1 Digital Link URI/);
  });

  it('refuses malformed percent-encoding', () => {
    expect(() => parseBarcode('https://example.com/01/09506000134352/10/A%ZZ', NOW)).to.throw(BarcodeError, /percent-encoding/);
  });

  it('refuses an unknown AI in the query and names it', () => {
    expect(() => parseBarcode('https://example.com/01/09506000134352?99=X', NOW)).to.throw(BarcodeError, /\(99\)/);
  });
});

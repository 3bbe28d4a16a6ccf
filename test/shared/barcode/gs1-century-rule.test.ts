import { expect } from 'chai';
import { applyGs1CenturyRule } from '../../../shared/barcode/gs1-century-rule.js';
import { parseGs1Date } from '../../../shared/barcode/gs1-date.js';

function at(year: number): Date {
  return new Date(Date.UTC(year, 5, 15));
}

// Every expected year below is hand-computed from GS1 General Specifications §7.12:
// difference = YY - (current year mod 100); 51..99 -> previous century, -99..-50 -> next century, else current.
describe('applyGs1CenturyRule (hand-computed from GS1 General Specifications §7.12)', () => {
  const cases: Array<[number, number, number, string]> = [
    [2026, 26, 2026, 'difference 0 stays in the current century'],
    [2026, 76, 2076, 'difference 50 stays in the current century'],
    [2026, 77, 1977, 'difference 51 moves to the previous century'],
    [2026, 99, 1999, 'difference 73 moves to the previous century'],
    [2026, 0, 2000, 'difference -26 stays in the current century'],
    [2060, 11, 2011, 'difference -49 stays in the current century'],
    [2060, 10, 2110, 'difference -50 moves to the next century'],
    [2099, 0, 2100, 'difference -99 moves to the next century'],
    [2000, 99, 1999, 'difference 99 moves to the previous century'],
    [2000, 50, 2050, 'difference 50 in year 2000 stays in the current century'],
  ];
  for (const [currentYear, yy, expected, why] of cases) {
    it(`in ${currentYear}, YY ${String(yy).padStart(2, '0')} is ${expected}: ${why}`, () => {
      expect(applyGs1CenturyRule(yy, at(currentYear))).to.equal(expected);
    });
  }

  it('uses the injected date, so the same label reads differently decades apart', () => {
    expect(parseGs1Date('771231', at(2026)).iso).to.equal('1977-12-31');
    expect(parseGs1Date('771231', at(2030)).iso).to.equal('2077-12-31');
  });

  it('decides leap years after the century is known: 000229 is valid in 2026 (2000) but not in 2060 (2100)', () => {
    expect(parseGs1Date('000229', at(2026)).iso).to.equal('2000-02-29');
    expect(() => parseGs1Date('000229', at(2060))).to.throw(/2100-02 has 28 days/);
  });

  it('refuses a year outside 0-99', () => {
    expect(() => applyGs1CenturyRule(100, at(2026))).to.throw(/0-99/);
  });
});

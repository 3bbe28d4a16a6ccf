import { expect } from 'chai';
import { parsePlanInput } from '../../../shared/planning/plan-input-schema.js';

const validInput = () => ({
  lots: [
    { id: 'L1', product: 'Product A', dosesPerVial: 1000, vials: 10, expiry: '2026-06-30', status: 'usable' },
    { id: 2, product: 'Product A', dosesPerVial: 5000, vials: 2, expiry: '2026-07', status: 'hold' },
    { id: 'L3', product: 'Product B', dosesPerVial: 2000, vials: 0, expiry: '2026-08-31', status: 'discarded' },
  ],
  vaccinations: [{ id: 'v1', product: 'Product A', date: '2026-05-01', birds: 20_000 }],
});

function errorsFor(change: (input: ReturnType<typeof validInput>) => unknown): string[] {
  const input = validInput();
  const raw = change(input) ?? input;
  const result = parsePlanInput(raw);
  return result.ok ? [] : result.errors;
}

describe('parsePlanInput', () => {
  it('accepts a well-formed file, defaults the overage to 0 and expands month/year expiry to month end', () => {
    const result = parsePlanInput(validInput());
    expect(result.ok).to.equal(true);
    if (!result.ok) return;
    expect(result.input.overagePercent).to.equal(0);
    expect(result.input.lots[1]!.expiry).to.equal('2026-07-31');
    expect(result.input.lots[1]!.id).to.equal(2);
  });

  it('names the path of an impossible date', () => {
    expect(errorsFor((input) => void (input.lots[2]!.expiry = '2026-02-30'))).to.deep.equal([
      'lots[2].expiry: must be a calendar date YYYY-MM-DD (or YYYY-MM for month end)',
    ]);
    expect(errorsFor((input) => void (input.vaccinations[0]!.date = '2026-05')).join()).to.match(/^vaccinations\[0\]\.date: /);
  });

  it('names the path of a missing field', () => {
    expect(errorsFor((input) => void delete (input.lots[0] as Partial<(typeof input.lots)[0]>).dosesPerVial).join()).to.match(/^lots\[0\]\.dosesPerVial: /);
  });

  it('names the path of a wrong type, a negative number and a fraction', () => {
    expect(errorsFor((input) => void ((input.vaccinations[0] as { birds: unknown }).birds = '20000')).join()).to.match(/^vaccinations\[0\]\.birds: /);
    expect(errorsFor((input) => void (input.lots[1]!.vials = -1)).join()).to.match(/^lots\[1\]\.vials: /);
    expect(errorsFor((input) => void (input.lots[0]!.dosesPerVial = 1000.5)).join()).to.match(/^lots\[0\]\.dosesPerVial: /);
  });

  it('rejects an unknown status, an empty id and a zero-dose vial', () => {
    expect(errorsFor((input) => void ((input.lots[0] as { status: string }).status = 'quarantine')).join()).to.match(/^lots\[0\]\.status: /);
    expect(errorsFor((input) => void (input.lots[0]!.id = '')).join()).to.match(/^lots\[0\]\.id: /);
    expect(errorsFor((input) => void (input.lots[0]!.dosesPerVial = 0)).join()).to.match(/^lots\[0\]\.dosesPerVial: /);
  });

  it('rejects an overage with more than two decimals or below zero', () => {
    expect(errorsFor((input) => ({ ...input, overagePercent: 2.555 }))).to.deep.equal(['overagePercent: allows at most two decimals']);
    expect(errorsFor((input) => ({ ...input, overagePercent: -1 })).join()).to.match(/^overagePercent: /);
  });

  it('rejects duplicate lot ids at the second occurrence', () => {
    expect(errorsFor((input) => void (input.lots[2]!.id = 'L1'))).to.deep.equal(['lots[2].id: duplicate id "L1"']);
  });

  it('reports a file that is not an object, or lacks the lists, at the top level', () => {
    expect(parsePlanInput([])).to.deep.include({ ok: false });
    expect(errorsFor(() => ({ lots: [] })).join()).to.match(/^vaccinations: /);
    expect(errorsFor(() => 'text').join()).to.match(/^\(file\): /);
  });
});

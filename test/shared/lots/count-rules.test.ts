// Pure stock-count rules: when a count is due, and what each counted line adjusts.
import { expect } from 'chai';
import { countDue } from '../../../shared/lots/count-due.js';
import { countAdjustments, countLineProblems, difference } from '../../../shared/lots/count-lines.js';
import { judgeTimeOut, timeOutReason } from '../../../shared/lots/time-out.js';

const day = 86_400_000;
const now = Date.parse('2026-12-03T12:00:00Z');

describe('count due', () => {
  // A count every month and with each order: common practice for vaccine stock (monthly physical inventory,
  // and checking stock in when a delivery is put away).
  it('a fridge never counted is due', () => {
    expect(countDue({ lastCountAt: null, lastReceiptAt: null, now })).to.deep.equal({ due: true, reasons: ['never_counted'], dueAt: null });
  });

  it('is due once the last count is over 30 days old, not at 30 days (hand-computed)', () => {
    expect(countDue({ lastCountAt: now - 30 * day, lastReceiptAt: null, now }).due).to.equal(false);
    const late = countDue({ lastCountAt: now - 30 * day - 1, lastReceiptAt: null, now });
    expect(late).to.deep.equal({ due: true, reasons: ['over_interval'], dueAt: now - 1 });
    expect(countDue({ lastCountAt: now - 3 * day, lastReceiptAt: null, now })).to.deep.equal({ due: false, reasons: [], dueAt: now + 27 * day });
  });

  it('is due after a receipt into the fridge since the last count, not one before it', () => {
    expect(countDue({ lastCountAt: now - 3 * day, lastReceiptAt: now - 4 * day, now }).due).to.equal(false);
    expect(countDue({ lastCountAt: now - 3 * day, lastReceiptAt: now - 2 * day, now }).reasons).to.deep.equal(['received_since']);
    expect(countDue({ lastCountAt: now - 40 * day, lastReceiptAt: now - 2 * day, now }).reasons).to.deep.equal(['over_interval', 'received_since']);
  });
});

describe('count lines', () => {
  const lines = [
    { lotId: 1, expected: 10, counted: 10, reason: '' },
    { lotId: 2, expected: 10, counted: 7, reason: 'three broken in the tray' },
    { lotId: 3, expected: 0, counted: 2, reason: 'found behind the drawer' },
  ];

  it('difference is counted minus expected; each difference adjusts by its size, in or out (hand-computed)', () => {
    expect(lines.map(difference)).to.deep.equal([0, -3, 2]);
    expect(countAdjustments(lines)).to.deep.equal([
      { lotId: 2, direction: 'out', vials: 3, reason: 'three broken in the tray' },
      { lotId: 3, direction: 'in', vials: 2, reason: 'found behind the drawer' },
    ]);
  });

  it('a difference needs a reason; a lot may appear once', () => {
    expect(countLineProblems(lines)).to.deep.equal([]);
    expect(countLineProblems([{ lotId: 1, expected: 5, counted: 4, reason: '  ' }, { lotId: 1, expected: 5, counted: 5, reason: '' }])).to.deep.equal([
      { index: 0, field: 'reason', message: 'Say why the count differs.' },
      { index: 1, field: 'lotId', message: 'This lot is on the sheet twice.' },
    ]);
  });
});

describe('time out of a fridge', () => {
  const left = Date.parse('2026-12-03T08:00:00Z');
  it('is over a limit only when longer than it; with no limit, any time out is over (hand-computed)', () => {
    expect(judgeTimeOut(left, left + 30 * 60_000, 30)).to.deep.equal({ minutes: 30, limitMinutes: 30, over: false });
    expect(judgeTimeOut(left, left + 31 * 60_000, 30).over).to.equal(true);
    expect(judgeTimeOut(left, left, null).over).to.equal(false);
    expect(judgeTimeOut(left, left + 20_000, null).over).to.equal(true);
  });

  it('states the minutes rounded up and the limit', () => {
    expect(timeOutReason(judgeTimeOut(left, left + 44.5 * 60_000, 30))).to.equal('Out of a fridge 45 min during a transfer, over the product\'s limit of 30 min.');
    expect(timeOutReason(judgeTimeOut(left, left + 20_000, null))).to.contain('1 min').and.contain('no recorded time-out limit');
  });
});

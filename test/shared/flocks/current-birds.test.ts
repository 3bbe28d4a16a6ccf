import { expect } from 'chai';
import { birdHistory, currentBirds, firstNegativeEntry } from '../../../shared/flocks/current-birds.js';

// Hand-computed: birds placed less mortality, a headcount resets the number.
describe('currentBirds', () => {
  it('is the birds placed when nothing was recorded', () => {
    expect(currentBirds(20_000, [])).to.equal(20_000);
  });

  it('subtracts each mortality update: 20,000 − 35 − 12 = 19,953', () => {
    expect(
      currentBirds(20_000, [
        { id: 1, countedOn: '2026-03-02', kind: 'mortality', birds: 35 },
        { id: 2, countedOn: '2026-03-09', kind: 'mortality', birds: 12 },
      ]),
    ).to.equal(19_953);
  });

  it('lets a headcount set the number, and later losses count from it', () => {
    expect(
      currentBirds(20_000, [
        { id: 3, countedOn: '2026-03-20', kind: 'mortality', birds: 10 },
        { id: 1, countedOn: '2026-03-02', kind: 'mortality', birds: 35 },
        { id: 2, countedOn: '2026-03-15', kind: 'count', birds: 19_900 },
      ]),
    ).to.equal(19_890);
  });

  it('orders updates by date, then by the order they were recorded', () => {
    const history = birdHistory(1000, [
      { id: 9, countedOn: '2026-03-02', kind: 'count', birds: 990 },
      { id: 4, countedOn: '2026-03-02', kind: 'mortality', birds: 5 },
    ]);
    expect(history.map((h) => [h.id, h.birdsAfter])).to.deep.equal([
      [4, 995],
      [9, 990],
    ]);
  });

  it('finds the update that would leave fewer than zero birds', () => {
    const bad = firstNegativeEntry(100, [
      { id: 1, countedOn: '2026-03-02', kind: 'mortality', birds: 60 },
      { id: 2, countedOn: '2026-03-03', kind: 'mortality', birds: 50 },
    ]);
    expect(bad?.id).to.equal(2);
    expect(firstNegativeEntry(100, [{ id: 1, countedOn: '2026-03-02', kind: 'mortality', birds: 100 }])).to.equal(null);
  });
});

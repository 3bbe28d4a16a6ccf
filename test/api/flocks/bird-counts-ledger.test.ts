// Bird counts are a history: the application role may add them but neither change nor remove them.
import { expect } from 'chai';
import { BirdCount } from '../../../database/models/index.js';
import { resetDatabase } from '../../support/test-database.js';
import { createSite, testContext } from '../../support/test-app.js';
import { createFlock, createHouse } from '../../support/flock-fixtures.js';

describe('bird-count history', () => {
  before(() => void testContext());
  beforeEach(resetDatabase);

  it('refuses UPDATE and DELETE from the application role', async () => {
    const flock = await createFlock(await createHouse(await createSite('NORTH')));
    const count = await BirdCount.create({ flockId: flock.id, countedOn: flock.placementDate, kind: 'mortality', birds: 5, recordedBy: null });
    const sequelize = BirdCount.sequelize!;
    for (const statement of [`UPDATE bird_counts SET birds = 1 WHERE id = ${count.id}`, `DELETE FROM bird_counts WHERE id = ${count.id}`]) {
      let error: unknown;
      try {
        await sequelize.query(statement);
      } catch (caught) {
        error = caught;
      }
      expect(String(error), statement).to.match(/permission denied/);
    }
  });
});

// The lots list sorts and pages in SQL: collations that order as the screen does (lot numbers with their digits read as
// numbers, "PX-9" before "PX-10"), and indexes for finding the lots that passed through a set of fridges.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE COLLATION lot_number_order (provider = icu, locale = 'en-u-kn-true');
    CREATE COLLATION list_text_order (provider = icu, locale = 'en');
    CREATE INDEX stock_movements_to_fridge_idx ON stock_movements (to_fridge_id, lot_id) WHERE to_fridge_id IS NOT NULL;
    CREATE INDEX stock_movements_from_fridge_idx ON stock_movements (from_fridge_id, lot_id) WHERE from_fridge_id IS NOT NULL;
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP INDEX stock_movements_from_fridge_idx;
    DROP INDEX stock_movements_to_fridge_idx;
    DROP COLLATION list_text_order;
    DROP COLLATION lot_number_order;
  `);
};

// How long a product's vials may be out of a fridge (transfers, vaccination day) before the veterinarian must look.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    -- Null: the label gives no limit, so any recorded time out of a fridge goes to the veterinarian.
    ALTER TABLE products ADD COLUMN time_out_limit_minutes integer
      CHECK (time_out_limit_minutes IS NULL OR time_out_limit_minutes BETWEEN 0 AND 2880);
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`ALTER TABLE products DROP COLUMN time_out_limit_minutes;`);
};

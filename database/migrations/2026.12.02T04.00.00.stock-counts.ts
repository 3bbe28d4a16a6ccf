// Stock counts: a counter's sheet for one fridge, each lot's expected and counted vials, and why they differ.
// Records like the ledger: the application adds and reads them, never changes or removes them.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    CREATE TABLE stock_counts (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      counted_at timestamptz NOT NULL DEFAULT now(),
      counted_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      notes text NOT NULL DEFAULT '' CHECK (length(notes) <= 1000)
    );
    CREATE INDEX stock_counts_fridge_idx ON stock_counts (fridge_id, counted_at DESC);

    CREATE TABLE stock_count_lines (
      id serial PRIMARY KEY,
      stock_count_id integer NOT NULL REFERENCES stock_counts(id) ON DELETE RESTRICT,
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      expected integer NOT NULL CHECK (expected >= 0),
      counted integer NOT NULL CHECK (counted >= 0),
      difference integer GENERATED ALWAYS AS (counted - expected) STORED,
      reason text NOT NULL DEFAULT '' CHECK (length(reason) <= 500),
      UNIQUE (stock_count_id, lot_id),
      -- A difference is never recorded without the counter's reason.
      CHECK (counted = expected OR length(trim(reason)) > 0)
    );
    CREATE INDEX stock_count_lines_lot_idx ON stock_count_lines (lot_id);

    REVOKE UPDATE, DELETE, TRUNCATE ON stock_counts FROM ${app};
    REVOKE UPDATE, DELETE, TRUNCATE ON stock_count_lines FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`DROP TABLE stock_count_lines, stock_counts;`);
};

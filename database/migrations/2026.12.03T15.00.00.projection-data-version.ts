// A data version for the planning projection's cache: one counter, advanced by a trigger in the same transaction as
// every write to a table the projection reads. Many services write those tables; a trigger cannot be forgotten by one.
import type { Migration } from '../migrator.js';

/** Every table `api/demand/projection-inputs.ts` and the projection's view read. */
export const projectionTables = [
  'sites', 'fridges', 'houses', 'suppliers', 'products', 'presentations', 'lots', 'stock_movements', 'stock_balances', 'holds',
  'hold_decisions', 'flocks', 'bird_counts', 'vaccinations', 'purchase_orders', 'purchase_order_lines', 'purchase_order_sendings',
  'planned_transfers', 'product_stock_settings',
];

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    -- One row. Its value comes from a sequence, so emptying the table (as the test suites do) never brings back an old value.
    CREATE SEQUENCE projection_data_version_seq;
    CREATE TABLE projection_data_version (
      id smallint PRIMARY KEY DEFAULT 1 CHECK (id = 1),
      version bigint NOT NULL
    );
    INSERT INTO projection_data_version (id, version) VALUES (1, nextval('projection_data_version_seq'));

    -- Deferred to the commit: the row is locked only while the transaction commits (never while it waits on other locks,
    -- so it cannot take part in a deadlock), and readers see the new version together with the new data. Once per
    -- transaction: later rows of the same transaction find the mark and skip.
    CREATE FUNCTION advance_projection_data_version() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF current_setting('vialyard.projection_version_xact', true) IS DISTINCT FROM txid_current()::text THEN
        PERFORM set_config('vialyard.projection_version_xact', txid_current()::text, true);
        INSERT INTO projection_data_version (id, version) VALUES (1, nextval('projection_data_version_seq'))
          ON CONFLICT (id) DO UPDATE SET version = excluded.version;
      END IF;
      RETURN NULL;
    END $$;
  `);
  for (const table of projectionTables) {
    await sequelize.query(`
      CREATE CONSTRAINT TRIGGER ${table}_projection_version AFTER INSERT OR UPDATE OR DELETE ON ${table}
        DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION advance_projection_data_version();
    `);
  }
};

export const down: Migration = async ({ context: { sequelize } }) => {
  for (const table of projectionTables) await sequelize.query(`DROP TRIGGER ${table}_projection_version ON ${table};`);
  await sequelize.query(`
    DROP FUNCTION advance_projection_data_version();
    DROP TABLE projection_data_version;
    DROP SEQUENCE projection_data_version_seq;
  `);
};

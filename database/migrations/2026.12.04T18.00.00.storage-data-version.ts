// A data version for the fridge chart's and the storage overview's caches, as projection-data-version does for the
// planning projection: one counter, advanced in the same transaction as every write to a table they read.
import type { Migration } from '../migrator.js';

/** Tables written a few rows at a time: a deferred trigger per row, as for the projection. */
export const storageTables = ['sites', 'fridges', 'loggers', 'logger_certificates', 'log_imports', 'excursions', 'daily_checks', 'backup_fills'];

/**
 * Tables a logger file writes by the hundred thousand through COPY: a trigger per statement, which marks the
 * transaction in `storage_data_touches` (one row per transaction, removed at its commit); that row's deferred trigger
 * advances the version, so the counter is locked only while the transaction commits, never during a long import.
 */
export const bulkStorageTables = ['readings', 'reading_hours'];

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    CREATE SEQUENCE storage_data_version_seq;
    CREATE TABLE storage_data_version (
      id smallint PRIMARY KEY DEFAULT 1 CHECK (id = 1),
      version bigint NOT NULL
    );
    INSERT INTO storage_data_version (id, version) VALUES (1, nextval('storage_data_version_seq'));
    CREATE UNLOGGED TABLE storage_data_touches (txid bigint PRIMARY KEY);

    CREATE FUNCTION advance_storage_data_version() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF current_setting('vialyard.storage_version_xact', true) IS DISTINCT FROM txid_current()::text THEN
        PERFORM set_config('vialyard.storage_version_xact', txid_current()::text, true);
        INSERT INTO storage_data_version (id, version) VALUES (1, nextval('storage_data_version_seq'))
          ON CONFLICT (id) DO UPDATE SET version = excluded.version;
      END IF;
      IF TG_TABLE_NAME = 'storage_data_touches' THEN
        DELETE FROM storage_data_touches WHERE txid = NEW.txid;
      END IF;
      RETURN NULL;
    END $$;

    CREATE FUNCTION touch_storage_data() RETURNS trigger LANGUAGE plpgsql AS $$
    BEGIN
      IF current_setting('vialyard.storage_touch_xact', true) IS DISTINCT FROM txid_current()::text THEN
        PERFORM set_config('vialyard.storage_touch_xact', txid_current()::text, true);
        INSERT INTO storage_data_touches (txid) VALUES (txid_current()) ON CONFLICT DO NOTHING;
      END IF;
      RETURN NULL;
    END $$;

    CREATE CONSTRAINT TRIGGER storage_data_touches_version AFTER INSERT ON storage_data_touches
      DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION advance_storage_data_version();
  `);
  for (const table of storageTables) {
    await sequelize.query(`
      CREATE CONSTRAINT TRIGGER ${table}_storage_version AFTER INSERT OR UPDATE OR DELETE ON ${table}
        DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION advance_storage_data_version();
    `);
  }
  for (const table of bulkStorageTables) {
    await sequelize.query(`
      CREATE TRIGGER ${table}_storage_touch AFTER INSERT OR UPDATE OR DELETE ON ${table}
        FOR EACH STATEMENT EXECUTE FUNCTION touch_storage_data();
    `);
  }
};

export const down: Migration = async ({ context: { sequelize } }) => {
  for (const table of bulkStorageTables) await sequelize.query(`DROP TRIGGER ${table}_storage_touch ON ${table};`);
  for (const table of storageTables) await sequelize.query(`DROP TRIGGER ${table}_storage_version ON ${table};`);
  await sequelize.query(`
    DROP TRIGGER storage_data_touches_version ON storage_data_touches;
    DROP FUNCTION touch_storage_data();
    DROP FUNCTION advance_storage_data_version();
    DROP TABLE storage_data_touches;
    DROP TABLE storage_data_version;
    DROP SEQUENCE storage_data_version_seq;
  `);
};

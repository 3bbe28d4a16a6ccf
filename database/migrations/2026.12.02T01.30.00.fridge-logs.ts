// Fridge logs: loggers and certificates, log imports, readings with an hourly aggregate, excursions, gaps, daily checks.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    ALTER TABLE fridges ADD COLUMN min_max_display boolean NOT NULL DEFAULT true;

    CREATE TABLE loggers (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      serial text NOT NULL CHECK (length(serial) BETWEEN 1 AND 60),
      model text NOT NULL DEFAULT '' CHECK (length(model) <= 120),
      role text NOT NULL CHECK (role IN ('primary', 'backup')),
      installed_on date NOT NULL DEFAULT current_date,
      removed_on date,
      mapping jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (fridge_id, serial),
      CHECK (removed_on IS NULL OR removed_on >= installed_on)
    );
    -- One primary in service per fridge at a time; backups may be several.
    CREATE UNIQUE INDEX loggers_one_primary_idx ON loggers (fridge_id) WHERE role = 'primary' AND removed_on IS NULL;

    CREATE TABLE logger_certificates (
      id serial PRIMARY KEY,
      logger_id integer NOT NULL REFERENCES loggers(id) ON DELETE RESTRICT,
      calibrated_on date NOT NULL,
      due_on date NOT NULL,
      file_name text NOT NULL CHECK (length(file_name) BETWEEN 1 AND 255),
      content_type text NOT NULL CHECK (content_type IN ('application/pdf', 'image/png', 'image/jpeg')),
      stored_name text NOT NULL,
      size_bytes integer NOT NULL CHECK (size_bytes > 0),
      sha256 char(64) NOT NULL,
      uploaded_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK (due_on > calibrated_on)
    );
    CREATE INDEX logger_certificates_logger_idx ON logger_certificates (logger_id, due_on);

    CREATE TABLE log_imports (
      id serial PRIMARY KEY,
      logger_id integer NOT NULL REFERENCES loggers(id) ON DELETE RESTRICT,
      file_name text NOT NULL CHECK (length(file_name) BETWEEN 1 AND 255),
      sha256 char(64) NOT NULL,
      size_bytes bigint NOT NULL CHECK (size_bytes > 0),
      stored_name text NOT NULL,
      source text NOT NULL CHECK (source IN ('upload', 'cli')),
      imported_by integer REFERENCES users(id) ON DELETE RESTRICT,
      imported_at timestamptz NOT NULL DEFAULT now(),
      rows_read integer NOT NULL CHECK (rows_read >= 0),
      readings_stored integer NOT NULL CHECK (readings_stored >= 0),
      duplicates integer NOT NULL CHECK (duplicates >= 0),
      conflicts integer NOT NULL CHECK (conflicts >= 0),
      skipped integer NOT NULL CHECK (skipped >= 0),
      first_at timestamptz NOT NULL,
      last_at timestamptz NOT NULL CHECK (last_at >= first_at),
      layout jsonb NOT NULL,
      warning_count integer NOT NULL DEFAULT 0,
      warnings jsonb NOT NULL DEFAULT '[]'::jsonb,
      conflict_samples jsonb NOT NULL DEFAULT '[]'::jsonb,
      -- The same file twice for one logger is refused before anything is written; this is the last guard.
      UNIQUE (logger_id, sha256)
    );
    CREATE INDEX log_imports_span_idx ON log_imports (logger_id, first_at, last_at);

    -- A year of one-minute readings is 525,600 rows per logger, so each row is kept small: 8 + 4 + 4 bytes
    -- fill one 16-byte slot after the tuple header. No foreign key: a per-row check would double the cost of
    -- a bulk import; only the import service writes here, under a lock on the logger's fridge, and loggers
    -- are never deleted (records are kept at least 3 years).
    CREATE TABLE readings (
      at timestamptz NOT NULL,
      logger_id integer NOT NULL,
      temp_c real NOT NULL CHECK (temp_c BETWEEN -100 AND 200),
      PRIMARY KEY (logger_id, at)
    ) WITH (fillfactor = 100);

    -- Per logger and UTC hour, kept up to date by each import: long-range charts and daily figures read this.
    CREATE TABLE reading_hours (
      logger_id integer NOT NULL,
      hour timestamptz NOT NULL,
      min_c real NOT NULL,
      max_c real NOT NULL,
      sum_c double precision NOT NULL,
      count integer NOT NULL CHECK (count > 0),
      PRIMARY KEY (logger_id, hour)
    );

    CREATE TABLE daily_checks (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      checked_at timestamptz NOT NULL,
      current_c real NOT NULL,
      min_c real,
      max_c real,
      entered_unit char(1) NOT NULL CHECK (entered_unit IN ('F', 'C')),
      initials text NOT NULL CHECK (initials ~ '^[A-Z]{1,4}$'),
      note text NOT NULL DEFAULT '' CHECK (length(note) <= 500),
      recorded_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      CHECK (min_c IS NULL OR max_c IS NULL OR min_c <= max_c)
    );
    CREATE INDEX daily_checks_fridge_idx ON daily_checks (fridge_id, checked_at);

    CREATE TABLE excursions (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      source text NOT NULL CHECK (source IN ('readings', 'daily_check')),
      kind text NOT NULL CHECK (kind IN ('high', 'low')),
      starts_at timestamptz NOT NULL,
      ends_at timestamptz NOT NULL,
      minutes double precision,
      peak_c real NOT NULL,
      degree_minutes_c double precision,
      open_ended boolean NOT NULL DEFAULT false,
      backup_minutes double precision NOT NULL DEFAULT 0,
      low_c double precision NOT NULL,
      high_c double precision NOT NULL,
      status text NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'in_review', 'decided')),
      follow_up_of_id integer REFERENCES excursions(id) ON DELETE RESTRICT,
      daily_check_id integer REFERENCES daily_checks(id) ON DELETE RESTRICT,
      action_taken text NOT NULL DEFAULT '' CHECK (length(action_taken) <= 2000),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (ends_at >= starts_at),
      -- A daily check finds an excursion but cannot say how long it lasted.
      CHECK ((source = 'readings') = (minutes IS NOT NULL AND degree_minutes_c IS NOT NULL)),
      CHECK ((source = 'daily_check') = (daily_check_id IS NOT NULL))
    );
    CREATE INDEX excursions_fridge_idx ON excursions (fridge_id, starts_at);
    CREATE INDEX excursions_status_idx ON excursions (status) WHERE status <> 'decided';

    CREATE TABLE excursion_imports (
      excursion_id integer NOT NULL REFERENCES excursions(id) ON DELETE CASCADE,
      log_import_id integer NOT NULL REFERENCES log_imports(id) ON DELETE RESTRICT,
      PRIMARY KEY (excursion_id, log_import_id)
    );

    CREATE TABLE fridge_gaps (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      starts_at timestamptz NOT NULL,
      ends_at timestamptz NOT NULL CHECK (ends_at > starts_at),
      minutes double precision NOT NULL
    );
    CREATE INDEX fridge_gaps_fridge_idx ON fridge_gaps (fridge_id, starts_at);

    CREATE TABLE backup_fills (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      starts_at timestamptz NOT NULL,
      ends_at timestamptz NOT NULL CHECK (ends_at > starts_at),
      minutes double precision NOT NULL
    );
    CREATE INDEX backup_fills_fridge_idx ON backup_fills (fridge_id, starts_at);

    -- How far an upload has been read, polled by the page; scratch data, so not worth a WAL record.
    CREATE UNLOGGED TABLE log_import_progress (
      token text PRIMARY KEY CHECK (token ~ '^[A-Za-z0-9_-]{8,64}$'),
      user_id integer NOT NULL,
      phase text NOT NULL,
      done bigint NOT NULL DEFAULT 0,
      total bigint NOT NULL DEFAULT 0,
      updated_at timestamptz NOT NULL DEFAULT now()
    );
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE log_import_progress, backup_fills, fridge_gaps, excursion_imports, excursions, daily_checks,
      reading_hours, readings, log_imports, logger_certificates, loggers;
    ALTER TABLE fridges DROP COLUMN min_max_display;
  `);
};

// Foundation schema: sites, users and their sites, sessions, sign-in throttle, the append-only audit log.
import type { Migration } from '../migrator.js';

// Frozen here on purpose: a later change to the roles comes with its own migration.
const roles = ['admin', 'receiving', 'storage', 'purchasing', 'veterinarian', 'crew'];

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    GRANT USAGE ON SCHEMA public TO ${app};
    ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT SELECT, INSERT, UPDATE, DELETE ON TABLES TO ${app};
    ALTER DEFAULT PRIVILEGES IN SCHEMA public GRANT USAGE, SELECT ON SEQUENCES TO ${app};

    CREATE TABLE sites (
      id serial PRIMARY KEY,
      code text NOT NULL UNIQUE CHECK (code ~ '^[A-Z0-9-]{2,16}$'),
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
      time_zone text NOT NULL,
      settings jsonb NOT NULL DEFAULT '{}'::jsonb,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE users (
      id serial PRIMARY KEY,
      email text NOT NULL UNIQUE CHECK (email = lower(email) AND length(email) BETWEEN 3 AND 254),
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
      password_hash text NOT NULL,
      roles text[] NOT NULL CHECK (cardinality(roles) > 0 AND roles <@ ARRAY[${roles.map((r) => `'${r}'`).join(', ')}]::text[]),
      all_sites boolean NOT NULL DEFAULT true,
      display_unit char(1) NOT NULL DEFAULT 'F' CHECK (display_unit IN ('F', 'C')),
      active boolean NOT NULL DEFAULT true,
      password_changed_at timestamptz NOT NULL DEFAULT now(),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE user_sites (
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      PRIMARY KEY (user_id, site_id)
    );

    CREATE TABLE houses (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 60),
      housing text NOT NULL CHECK (housing IN ('cage', 'aviary', 'floor')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (site_id, name)
    );

    CREATE TABLE fridges (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      code text NOT NULL UNIQUE CHECK (code ~ '^[A-Z0-9-]{2,20}$'),
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 80),
      place text NOT NULL DEFAULT '',
      alarm_low numeric(6,2) NOT NULL DEFAULT 35,
      alarm_high numeric(6,2) NOT NULL DEFAULT 45,
      alarm_unit char(1) NOT NULL DEFAULT 'F' CHECK (alarm_unit IN ('F', 'C')),
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (alarm_low < alarm_high)
    );

    -- express-session store (connect-pg-simple's layout), shared by every API process.
    CREATE TABLE session (
      sid varchar PRIMARY KEY,
      sess json NOT NULL,
      expire timestamp(6) NOT NULL
    );
    CREATE INDEX session_expire_idx ON session (expire);

    -- Sign-in throttle counters (rate-limiter-flexible's Postgres layout), shared by every API process.
    CREATE TABLE sign_in_limits (
      key varchar(255) PRIMARY KEY,
      points integer NOT NULL DEFAULT 0,
      expire bigint
    );

    CREATE TABLE audit_log (
      id bigserial PRIMARY KEY,
      at timestamptz NOT NULL DEFAULT now(),
      actor_id integer REFERENCES users(id) ON DELETE RESTRICT,
      action text NOT NULL,
      entity text NOT NULL,
      entity_id text,
      before jsonb,
      after jsonb
    );
    CREATE INDEX audit_log_entity_idx ON audit_log (entity, entity_id);
    -- The application may add and read audit entries, never change or remove them.
    REVOKE UPDATE, DELETE, TRUNCATE ON audit_log FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    DROP TABLE audit_log, sign_in_limits, session, fridges, houses, user_sites, users, sites;
    ALTER DEFAULT PRIVILEGES IN SCHEMA public REVOKE SELECT, INSERT, UPDATE, DELETE ON TABLES FROM ${app};
    ALTER DEFAULT PRIVILEGES IN SCHEMA public REVOKE USAGE, SELECT ON SEQUENCES FROM ${app};
  `);
};

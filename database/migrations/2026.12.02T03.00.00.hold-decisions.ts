// The veterinarian's signed decisions on holds: append-only; a correction is a new decision that supersedes, both kept.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  await sequelize.query(`
    CREATE TABLE hold_decisions (
      id serial PRIMARY KEY,
      hold_id integer NOT NULL REFERENCES holds(id) ON DELETE RESTRICT,
      decision text NOT NULL CHECK (decision IN ('release', 'release_with_condition', 'discard')),
      condition text NOT NULL DEFAULT '' CHECK (length(condition) <= 2000),
      notes text NOT NULL DEFAULT '' CHECK (length(notes) <= 4000),
      -- The signature: who (and their name as it was then), when, and what signing means.
      signed_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      signer_name text NOT NULL,
      signed_at timestamptz NOT NULL DEFAULT now(),
      signature_meaning text NOT NULL,
      -- Each decision is superseded at most once, so a hold's current decision is the one nobody supersedes.
      supersedes_id integer UNIQUE REFERENCES hold_decisions(id) ON DELETE RESTRICT,
      CHECK (decision <> 'release_with_condition' OR length(trim(condition)) > 0)
    );
    CREATE INDEX hold_decisions_hold_idx ON hold_decisions (hold_id);
    -- One first decision per hold; every later one supersedes (the database's guard behind the service's lock).
    CREATE UNIQUE INDEX hold_decisions_first_idx ON hold_decisions (hold_id) WHERE supersedes_id IS NULL;
    REVOKE UPDATE, DELETE, TRUNCATE ON hold_decisions FROM "${appRole}";
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`DROP TABLE hold_decisions;`);
};

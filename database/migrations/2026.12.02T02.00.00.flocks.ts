// Flocks schema: houses extended, programmes and their steps, flocks with bird-count history, vaccinations, withdrawal overrides.
import type { Migration } from '../migrator.js';

// Frozen here on purpose: later statuses or routes come with their own migration.
const routes = ['spray', 'drinking_water', 'injection', 'eye_drop', 'wing_web', 'in_ovo', 'other'];
const vaccinationStatuses = ['planned', 'confirmed', 'done', 'cancelled'];
const list = (values: string[]) => values.map((v) => `'${v}'`).join(', ');

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    ALTER TABLE houses
      ADD COLUMN capacity integer CHECK (capacity > 0),
      ADD COLUMN active boolean NOT NULL DEFAULT true;

    CREATE TABLE programmes (
      id serial PRIMARY KEY,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
      notes text NOT NULL DEFAULT '',
      active boolean NOT NULL DEFAULT true,
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE UNIQUE INDEX programmes_name_idx ON programmes (lower(name));

    CREATE TABLE programme_steps (
      id serial PRIMARY KEY,
      programme_id integer NOT NULL REFERENCES programmes(id) ON DELETE CASCADE,
      position integer NOT NULL CHECK (position > 0),
      product_id integer NOT NULL REFERENCES products(id) ON DELETE RESTRICT,
      age_value integer NOT NULL CHECK (age_value >= 0),
      age_unit text NOT NULL CHECK (age_unit IN ('days', 'weeks')),
      route text NOT NULL CHECK (route IN (${list(routes)})),
      notes text NOT NULL DEFAULT '',
      -- Deferred so a programme's steps can be renumbered in one transaction.
      CONSTRAINT programme_steps_position_key UNIQUE (programme_id, position) DEFERRABLE INITIALLY DEFERRED,
      CHECK ((CASE age_unit WHEN 'weeks' THEN age_value * 7 ELSE age_value END) <= 1050)
    );

    CREATE TABLE flocks (
      id serial PRIMARY KEY,
      house_id integer NOT NULL REFERENCES houses(id) ON DELETE RESTRICT,
      programme_id integer REFERENCES programmes(id) ON DELETE RESTRICT,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 60),
      hatch_date date NOT NULL,
      placement_date date NOT NULL,
      birds_placed integer NOT NULL CHECK (birds_placed BETWEEN 1 AND 10000000),
      planned_depletion_date date,
      depleted_on date,
      notes text NOT NULL DEFAULT '',
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (hatch_date <= placement_date),
      CHECK (planned_depletion_date IS NULL OR planned_depletion_date > placement_date),
      CHECK (depleted_on IS NULL OR depleted_on >= placement_date),
      -- A house holds one flock at a time: their stays may not overlap (int4range and daterange have GiST support built in).
      CONSTRAINT flocks_house_stay_excl EXCLUDE USING gist (
        int4range(house_id, house_id, '[]') WITH &&,
        daterange(placement_date, coalesce(depleted_on, planned_depletion_date), '[)') WITH &&
      )
    );
    CREATE UNIQUE INDEX flocks_house_name_idx ON flocks (house_id, lower(name));

    -- Bird numbers as a history: each update is kept; the current number is derived from them.
    CREATE TABLE bird_counts (
      id serial PRIMARY KEY,
      flock_id integer NOT NULL REFERENCES flocks(id) ON DELETE RESTRICT,
      counted_on date NOT NULL,
      kind text NOT NULL CHECK (kind IN ('mortality', 'count')),
      birds integer NOT NULL CHECK (birds >= 0 AND (kind = 'count' OR birds > 0)),
      note text NOT NULL DEFAULT '',
      recorded_by integer REFERENCES users(id) ON DELETE RESTRICT,
      recorded_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX bird_counts_flock_idx ON bird_counts (flock_id, counted_on);

    CREATE TABLE vaccinations (
      id serial PRIMARY KEY,
      flock_id integer NOT NULL REFERENCES flocks(id) ON DELETE RESTRICT,
      programme_step_id integer REFERENCES programme_steps(id) ON DELETE SET NULL,
      product_id integer NOT NULL REFERENCES products(id) ON DELETE RESTRICT,
      route text NOT NULL CHECK (route IN (${list(routes)})),
      planned_date date NOT NULL,
      moved_by_hand boolean NOT NULL DEFAULT false,
      status text NOT NULL DEFAULT 'planned' CHECK (status IN (${list(vaccinationStatuses)})),
      notes text NOT NULL DEFAULT '',
      confirmed_by integer REFERENCES users(id) ON DELETE RESTRICT,
      confirmed_at timestamptz,
      cancelled_by integer REFERENCES users(id) ON DELETE RESTRICT,
      cancelled_at timestamptz,
      cancel_reason text,
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (status NOT IN ('confirmed', 'done') OR confirmed_at IS NOT NULL),
      CHECK (status <> 'cancelled' OR (cancelled_at IS NOT NULL AND cancel_reason IS NOT NULL))
    );
    CREATE INDEX vaccinations_flock_idx ON vaccinations (flock_id, planned_date);
    CREATE INDEX vaccinations_open_idx ON vaccinations (planned_date) WHERE status IN ('planned', 'confirmed');

    -- A veterinarian's ruling that a flagged vaccination may go ahead: for this date, depletion and label only.
    CREATE TABLE withdrawal_overrides (
      id serial PRIMARY KEY,
      vaccination_id integer NOT NULL REFERENCES vaccinations(id) ON DELETE RESTRICT,
      vaccination_date date NOT NULL,
      depletion_date date NOT NULL,
      withdrawal_days integer NOT NULL CHECK (withdrawal_days >= 0),
      reason text NOT NULL CHECK (length(reason) BETWEEN 10 AND 2000),
      decided_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      decided_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX withdrawal_overrides_vaccination_idx ON withdrawal_overrides (vaccination_id);

    -- Histories and rulings are records: the application adds and reads them, never changes or removes them.
    REVOKE UPDATE, DELETE, TRUNCATE ON bird_counts FROM ${app};
    REVOKE UPDATE, DELETE, TRUNCATE ON withdrawal_overrides FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE withdrawal_overrides, vaccinations, bird_counts, flocks, programme_steps, programmes;
    ALTER TABLE houses DROP COLUMN active, DROP COLUMN capacity;
  `);
};

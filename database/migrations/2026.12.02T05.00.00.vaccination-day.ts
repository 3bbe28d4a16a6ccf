// Vaccination day: crews per site and date, readiness checks and overrides, sprayer trials, water volumes, starts,
// mixings and the signed record of what was given.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    -- Who works a site on a date: one crew lead (assigned by an admin, a veterinarian or the lead) and its members.
    CREATE TABLE crew_assignments (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      day date NOT NULL,
      lead_id integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      assigned_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      assigned_at timestamptz NOT NULL DEFAULT now(),
      UNIQUE (site_id, day)
    );
    CREATE INDEX crew_assignments_lead_idx ON crew_assignments (lead_id, day);
    CREATE TABLE crew_assignment_members (
      assignment_id integer NOT NULL REFERENCES crew_assignments(id) ON DELETE CASCADE,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      PRIMARY KEY (assignment_id, user_id)
    );

    -- One recorded readiness check: per crew member (lead's day) or per vaccination. The latest per key counts.
    CREATE TABLE readiness_checks (
      id serial PRIMARY KEY,
      day date NOT NULL,
      lead_id integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      vaccination_id integer REFERENCES vaccinations(id) ON DELETE RESTRICT,
      member_id integer REFERENCES users(id) ON DELETE RESTRICT,
      check_kind text NOT NULL CHECK (check_kind IN ('twelve_hour', 'hygiene', 'ppe', 'flock_health', 'withdrawal',
        'water_treatments', 'heat', 'battery', 'enough_vaccine')),
      passed boolean NOT NULL,
      details jsonb NOT NULL DEFAULT '{}',
      note text NOT NULL DEFAULT '' CHECK (length(note) <= 1000),
      recorded_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      recorded_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((vaccination_id IS NULL) <> (member_id IS NULL))
    );
    CREATE INDEX readiness_checks_vaccination_idx ON readiness_checks (vaccination_id);
    CREATE INDEX readiness_checks_member_idx ON readiness_checks (lead_id, day, member_id);

    -- A veterinarian lets a failed check go ahead, with a reason.
    CREATE TABLE readiness_overrides (
      id serial PRIMARY KEY,
      readiness_check_id integer NOT NULL UNIQUE REFERENCES readiness_checks(id) ON DELETE RESTRICT,
      reason text NOT NULL CHECK (length(reason) BETWEEN 10 AND 2000),
      decided_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      decided_at timestamptz NOT NULL DEFAULT now()
    );

    -- The water-sensitive-paper trial before spraying (no photo yet).
    CREATE TABLE sprayer_trials (
      id serial PRIMARY KEY,
      vaccination_id integer NOT NULL REFERENCES vaccinations(id) ON DELETE RESTRICT,
      result text NOT NULL CHECK (result IN ('acceptable', 'adjusted_retested')),
      nozzle_height_cm numeric(6,1) NOT NULL CHECK (nozzle_height_cm > 0 AND nozzle_height_cm <= 500),
      walking_pace_m_per_min numeric(6,1) NOT NULL CHECK (walking_pace_m_per_min > 0 AND walking_pace_m_per_min <= 200),
      notes text NOT NULL DEFAULT '' CHECK (length(notes) <= 1000),
      recorded_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      recorded_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX sprayer_trials_vaccination_idx ON sprayer_trials (vaccination_id);
    -- Optional photos of the paper, stored by api/photos' pipeline (files under UPLOADS_DIR/photos).
    CREATE TABLE sprayer_trial_photos (
      id serial PRIMARY KEY,
      trial_id integer NOT NULL REFERENCES sprayer_trials(id) ON DELETE RESTRICT,
      file_key text NOT NULL UNIQUE,
      width integer NOT NULL CHECK (width > 0),
      height integer NOT NULL CHECK (height > 0),
      bytes integer NOT NULL CHECK (bytes > 0),
      uploaded_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      uploaded_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX sprayer_trial_photos_trial_idx ON sprayer_trial_photos (trial_id);

    -- Water for the mix, per product and age range, as the label or the veterinarian gives it; the newest entry counts.
    CREATE TABLE water_volumes (
      id serial PRIMARY KEY,
      product_id integer NOT NULL REFERENCES products(id) ON DELETE RESTRICT,
      age_from_days integer NOT NULL CHECK (age_from_days >= 0),
      age_to_days integer NOT NULL CHECK (age_to_days >= age_from_days AND age_to_days <= 1050),
      ml_per_1000_birds numeric(10,2) NOT NULL CHECK (ml_per_1000_birds > 0 AND ml_per_1000_birds <= 100000),
      source text NOT NULL CHECK (source IN ('label', 'veterinarian')),
      note text NOT NULL DEFAULT '' CHECK (length(note) <= 500),
      entered_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      entered_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX water_volumes_product_idx ON water_volumes (product_id);

    CREATE TABLE vaccination_starts (
      vaccination_id integer PRIMARY KEY REFERENCES vaccinations(id) ON DELETE RESTRICT,
      started_at timestamptz NOT NULL DEFAULT now(),
      started_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT
    );

    -- Each batch mixed: the label's use-within time counts from here.
    CREATE TABLE vaccination_mixings (
      id serial PRIMARY KEY,
      vaccination_id integer NOT NULL REFERENCES vaccinations(id) ON DELETE RESTRICT,
      mixed_at timestamptz NOT NULL DEFAULT now(),
      recorded_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT
    );
    CREATE INDEX vaccination_mixings_vaccination_idx ON vaccination_mixings (vaccination_id);

    -- What was given, signed by the crew lead (password re-entered); never changed.
    CREATE TABLE vaccination_records (
      id serial PRIMARY KEY,
      vaccination_id integer NOT NULL UNIQUE REFERENCES vaccinations(id) ON DELETE RESTRICT,
      started_at timestamptz NOT NULL,
      ended_at timestamptz NOT NULL,
      birds_vaccinated integer NOT NULL CHECK (birds_vaccinated BETWEEN 0 AND 10000000),
      crew jsonb NOT NULL,
      deviations text NOT NULL DEFAULT '' CHECK (length(deviations) <= 4000),
      cleaning jsonb NOT NULL,
      signed_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      signer_name text NOT NULL,
      signed_at timestamptz NOT NULL DEFAULT now(),
      signature_meaning text NOT NULL,
      CHECK (ended_at >= started_at)
    );
    CREATE TABLE vaccination_record_lots (
      record_id integer NOT NULL REFERENCES vaccination_records(id) ON DELETE RESTRICT,
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      vials_issued integer NOT NULL CHECK (vials_issued >= 0),
      vials_used integer NOT NULL CHECK (vials_used >= 0),
      vials_returned integer NOT NULL CHECK (vials_returned >= 0),
      doses_used integer NOT NULL CHECK (doses_used >= 0),
      PRIMARY KEY (record_id, lot_id),
      -- Each lot reconciles: issued = used + returned.
      CHECK (vials_issued = vials_used + vials_returned)
    );

    REVOKE UPDATE, DELETE, TRUNCATE ON readiness_checks, readiness_overrides, sprayer_trials, sprayer_trial_photos, water_volumes,
      vaccination_starts, vaccination_mixings, vaccination_records, vaccination_record_lots FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE vaccination_record_lots, vaccination_records, vaccination_mixings, vaccination_starts, water_volumes,
      sprayer_trial_photos, sprayer_trials, readiness_overrides, readiness_checks, crew_assignment_members, crew_assignments;
  `);
};

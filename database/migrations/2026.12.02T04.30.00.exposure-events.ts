// The events behind automatic holds (a fridge's readings crossing a product's own range, or freezing), recalls,
// troubleshooting records and in-app notifications. Events, recalls and records are kept: nothing deletes them.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    CREATE TABLE exposure_events (
      id serial PRIMARY KEY,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      cause text NOT NULL CHECK (cause IN ('excursion', 'freeze')),
      source text NOT NULL CHECK (source IN ('readings', 'daily_check')),
      kind text NOT NULL CHECK (kind IN ('high', 'low')),
      starts_at timestamptz NOT NULL,
      ends_at timestamptz NOT NULL CHECK (ends_at >= starts_at),
      -- Null for a daily check: one value seen, no duration known.
      minutes double precision CHECK (minutes IS NULL OR minutes >= 0),
      peak_c real NOT NULL,
      degree_minutes_c double precision,
      mkt_24h_c double precision,
      open_ended boolean NOT NULL DEFAULT false,
      -- The range the lots were judged by (their product's label range; 0 °C and up for freezing) ...
      low_c double precision NOT NULL,
      high_c double precision NOT NULL,
      -- ... and the fridge's own alarm range then, which may be wider or narrower.
      fridge_low_c double precision NOT NULL,
      fridge_high_c double precision NOT NULL,
      -- The fridge excursion it met when computed (no foreign key: a recompute may remove that row, the event stays).
      excursion_id integer,
      daily_check_id integer REFERENCES daily_checks(id) ON DELETE RESTRICT,
      follow_up_of_id integer REFERENCES exposure_events(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX exposure_events_fridge_idx ON exposure_events (fridge_id, starts_at);
    REVOKE DELETE, TRUNCATE ON exposure_events FROM ${app};

    CREATE TABLE recalls (
      id serial PRIMARY KEY,
      lot_number text NOT NULL CHECK (length(trim(lot_number)) BETWEEN 1 AND 60),
      product_id integer REFERENCES products(id) ON DELETE RESTRICT,
      reason text NOT NULL CHECK (length(trim(reason)) BETWEEN 1 AND 2000),
      placed_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      placed_at timestamptz NOT NULL DEFAULT now()
    );
    REVOKE UPDATE, DELETE, TRUNCATE ON recalls FROM ${app};

    CREATE TABLE troubleshooting_records (
      id serial PRIMARY KEY,
      exposure_event_id integer NOT NULL UNIQUE REFERENCES exposure_events(id) ON DELETE RESTRICT,
      found_at timestamptz,
      unit_temp_c double precision,
      unit_min_c double precision,
      unit_max_c double precision,
      room_temp_c double precision,
      entered_unit text NOT NULL DEFAULT 'F' CHECK (entered_unit IN ('F', 'C')),
      found_by text NOT NULL DEFAULT '' CHECK (length(found_by) <= 200),
      what_happened text NOT NULL DEFAULT '' CHECK (length(what_happened) <= 4000),
      minutes_since_in_range integer CHECK (minutes_since_in_range IS NULL OR minutes_since_in_range >= 0),
      back_in_storage_at timestamptz,
      contacted text NOT NULL DEFAULT '' CHECK (length(contacted) <= 2000),
      preventive_action text NOT NULL DEFAULT '' CHECK (length(preventive_action) <= 4000),
      updated_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    REVOKE DELETE, TRUNCATE ON troubleshooting_records FROM ${app};

    CREATE TABLE notifications (
      id serial PRIMARY KEY,
      user_id integer NOT NULL REFERENCES users(id) ON DELETE CASCADE,
      kind text NOT NULL CHECK (kind IN ('hold_opened', 'hold_decided')),
      -- What the notification is about (one per event and user): e.g. 'excursion:exposure_event:12'.
      event_key text NOT NULL,
      title text NOT NULL,
      body text NOT NULL DEFAULT '',
      link text NOT NULL DEFAULT '',
      -- The e-mail copy, sent after the transaction that made the notification commits.
      mail_state text NOT NULL DEFAULT 'pending' CHECK (mail_state IN ('pending', 'sending', 'sent', 'failed', 'none')),
      created_at timestamptz NOT NULL DEFAULT now(),
      read_at timestamptz,
      UNIQUE (user_id, kind, event_key)
    );
    CREATE INDEX notifications_user_idx ON notifications (user_id, created_at DESC);
    CREATE INDEX notifications_mail_idx ON notifications (mail_state) WHERE mail_state = 'pending';
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`DROP TABLE notifications, troubleshooting_records, recalls, exposure_events;`);
};

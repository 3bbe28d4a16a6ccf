// Receiving schema: catalogue, purchase orders, shipments with lines and photos, and the lot records later features
// build on: lots, the append-only movement ledger with its never-negative balances, and holds.
import type { Migration } from '../migrator.js';

// Frozen here on purpose: later kinds and causes come with their own migration if they change.
const movementKinds = ['receive', 'transfer', 'issue', 'return', 'discard', 'adjust'];
const holdCauses = ['arrival', 'excursion', 'freeze', 'transfer', 'return', 'recall'];
const routes = ['spray', 'drinking_water', 'injection', 'eye_drop', 'wing_web', 'in_ovo', 'other'];
const list = (values: string[]) => values.map((v) => `'${v}'`).join(', ');

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    CREATE TABLE suppliers (
      id serial PRIMARY KEY,
      name text NOT NULL UNIQUE CHECK (length(name) BETWEEN 1 AND 120),
      order_email text NOT NULL CHECK (order_email = lower(order_email) AND length(order_email) BETWEEN 3 AND 254),
      lead_time_days integer NOT NULL DEFAULT 7 CHECK (lead_time_days BETWEEN 0 AND 365),
      notes text NOT NULL DEFAULT '',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );

    CREATE TABLE products (
      id serial PRIMARY KEY,
      name text NOT NULL CHECK (length(name) BETWEEN 1 AND 120),
      maker text NOT NULL DEFAULT '',
      kind text CHECK (kind IN ('live', 'inactivated')),
      route text CHECK (route IN (${list(routes)})),
      -- The label's storage range as entered (value and unit); comparisons convert to °C.
      storage_low numeric(6,2) NOT NULL,
      storage_high numeric(6,2) NOT NULL,
      storage_unit char(1) NOT NULL CHECK (storage_unit IN ('F', 'C')),
      freeze_sensitive boolean NOT NULL DEFAULT true,
      use_within_minutes integer CHECK (use_within_minutes > 0),
      withdrawal_days integer NOT NULL DEFAULT 21 CHECK (withdrawal_days >= 0),
      notes text NOT NULL DEFAULT '',
      status text NOT NULL DEFAULT 'confirmed' CHECK (status IN ('confirmed', 'proposed')),
      proposed_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (storage_low < storage_high),
      -- A product proposed from an unknown barcode may lack what only the label says; a confirmed one may not.
      CHECK (status = 'proposed' OR (kind IS NOT NULL AND route IS NOT NULL))
    );
    CREATE UNIQUE INDEX products_name_maker_idx ON products (lower(name), lower(maker));

    CREATE TABLE presentations (
      id serial PRIMARY KEY,
      product_id integer NOT NULL REFERENCES products(id) ON DELETE RESTRICT,
      doses_per_vial integer NOT NULL CHECK (doses_per_vial > 0),
      vials_per_pack integer NOT NULL DEFAULT 10 CHECK (vials_per_pack > 0),
      pack_gtin char(14) UNIQUE CHECK (pack_gtin ~ '^[0-9]{14}$'),
      vial_gtin char(14) UNIQUE CHECK (vial_gtin ~ '^[0-9]{14}$'),
      unit_price numeric(12,2) CHECK (unit_price >= 0),
      status text NOT NULL DEFAULT 'confirmed' CHECK (status IN ('confirmed', 'proposed')),
      proposed_by integer REFERENCES users(id) ON DELETE RESTRICT,
      proposed_at timestamptz,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (pack_gtin IS NULL OR vial_gtin IS NULL OR pack_gtin <> vial_gtin)
    );
    CREATE INDEX presentations_product_idx ON presentations (product_id);

    CREATE TABLE purchase_orders (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      supplier_id integer NOT NULL REFERENCES suppliers(id) ON DELETE RESTRICT,
      reference text NOT NULL UNIQUE CHECK (length(reference) BETWEEN 1 AND 40),
      expected_date date NOT NULL,
      carrier text NOT NULL DEFAULT '',
      tracking_number text NOT NULL DEFAULT '',
      notes text NOT NULL DEFAULT '',
      status text NOT NULL DEFAULT 'open' CHECK (status IN ('open', 'received', 'cancelled')),
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX purchase_orders_due_idx ON purchase_orders (site_id, expected_date) WHERE status = 'open';

    CREATE TABLE purchase_order_lines (
      id serial PRIMARY KEY,
      purchase_order_id integer NOT NULL REFERENCES purchase_orders(id) ON DELETE CASCADE,
      line_no integer NOT NULL CHECK (line_no > 0),
      presentation_id integer NOT NULL REFERENCES presentations(id) ON DELETE RESTRICT,
      packs integer NOT NULL CHECK (packs > 0),
      UNIQUE (purchase_order_id, line_no)
    );

    CREATE TABLE lots (
      id serial PRIMARY KEY,
      presentation_id integer NOT NULL REFERENCES presentations(id) ON DELETE RESTRICT,
      lot_number text NOT NULL CHECK (length(lot_number) BETWEEN 1 AND 20),
      -- The last usable day; a month/year label is stored as that month's last day (expiry_day_given false).
      expiry date NOT NULL,
      expiry_day_given boolean NOT NULL DEFAULT true,
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now()
    );
    -- One lot per presentation and number, whatever the case it was typed in: a second receipt adds to it.
    CREATE UNIQUE INDEX lots_presentation_number_idx ON lots (presentation_id, upper(lot_number));

    CREATE TABLE shipments (
      id serial PRIMARY KEY,
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      purchase_order_id integer REFERENCES purchase_orders(id) ON DELETE RESTRICT,
      supplier_id integer REFERENCES suppliers(id) ON DELETE RESTRICT,
      client_key uuid NOT NULL UNIQUE,
      carrier text NOT NULL DEFAULT '',
      tracking_number text NOT NULL DEFAULT '',
      arrived_at timestamptz NOT NULL,
      shipped_at timestamptz CHECK (shipped_at <= arrived_at),
      container_intact boolean NOT NULL,
      coolant_present boolean NOT NULL,
      indicator text NOT NULL CHECK (indicator IN ('none', 'not_triggered', 'triggered')),
      contents_cold boolean NOT NULL,
      reading_value numeric(6,2),
      reading_unit char(1) CHECK (reading_unit IN ('F', 'C')),
      reading_place text CHECK (reading_place IN ('product_surface', 'probe', 'shipping_monitor')),
      outcome text NOT NULL CHECK (outcome IN ('accepted', 'accepted_with_discrepancies', 'refused')),
      notes text NOT NULL DEFAULT '',
      received_by integer NOT NULL REFERENCES users(id) ON DELETE RESTRICT,
      report_mailed_at timestamptz,
      report_mailed_to text[] NOT NULL DEFAULT '{}',
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK ((reading_value IS NULL) = (reading_unit IS NULL) AND (reading_unit IS NULL) = (reading_place IS NULL))
    );
    CREATE INDEX shipments_site_arrived_idx ON shipments (site_id, arrived_at DESC);

    CREATE TABLE shipment_lines (
      id serial PRIMARY KEY,
      shipment_id integer NOT NULL REFERENCES shipments(id) ON DELETE RESTRICT,
      line_no integer NOT NULL CHECK (line_no > 0),
      presentation_id integer NOT NULL REFERENCES presentations(id) ON DELETE RESTRICT,
      lot_id integer REFERENCES lots(id) ON DELETE RESTRICT,
      scan text NOT NULL DEFAULT '',
      lot_number text NOT NULL CHECK (length(lot_number) BETWEEN 1 AND 20),
      expiry date NOT NULL,
      expiry_day_given boolean NOT NULL DEFAULT true,
      vials_expected integer NOT NULL CHECK (vials_expected >= 0),
      vials_intact integer NOT NULL CHECK (vials_intact >= 0),
      vials_broken integer NOT NULL CHECK (vials_broken >= 0),
      vials_missing integer NOT NULL CHECK (vials_missing >= 0),
      accepted boolean NOT NULL,
      fridge_id integer REFERENCES fridges(id) ON DELETE RESTRICT,
      stored_at timestamptz,
      notes text NOT NULL DEFAULT '',
      UNIQUE (shipment_id, line_no),
      -- A line names its lot exactly when its intact vials went into stock, and then it names the fridge.
      CHECK (lot_id IS NULL OR (accepted AND vials_intact > 0 AND fridge_id IS NOT NULL AND stored_at IS NOT NULL))
    );

    CREATE TABLE shipment_photos (
      id serial PRIMARY KEY,
      shipment_id integer NOT NULL REFERENCES shipments(id) ON DELETE RESTRICT,
      -- The generated file name stem under UPLOADS_DIR/photos; nothing of the uploaded name reaches the disk.
      file_key uuid NOT NULL UNIQUE,
      width integer NOT NULL CHECK (width > 0),
      height integer NOT NULL CHECK (height > 0),
      bytes integer NOT NULL CHECK (bytes > 0),
      original_name text NOT NULL DEFAULT '',
      uploaded_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX shipment_photos_shipment_idx ON shipment_photos (shipment_id);

    -- The ledger: stock changes only by appending movements of whole vials.
    CREATE TABLE stock_movements (
      id bigserial PRIMARY KEY,
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      kind text NOT NULL CHECK (kind IN (${list(movementKinds)})),
      vials integer NOT NULL CHECK (vials > 0),
      from_fridge_id integer REFERENCES fridges(id) ON DELETE RESTRICT,
      to_fridge_id integer REFERENCES fridges(id) ON DELETE RESTRICT,
      -- When the vials left the source fridge (transfers and issues: time out of a fridge is exposure).
      left_at timestamptz,
      -- When the movement took effect: vials in the destination, or gone from the source.
      at timestamptz NOT NULL,
      source_kind text NOT NULL,
      source_id integer,
      reason text NOT NULL DEFAULT '',
      recorded_by integer REFERENCES users(id) ON DELETE RESTRICT,
      recorded_at timestamptz NOT NULL DEFAULT now(),
      CHECK (from_fridge_id IS NULL OR to_fridge_id IS NULL OR from_fridge_id <> to_fridge_id),
      CHECK (left_at IS NULL OR left_at <= at),
      CHECK (CASE kind
        WHEN 'receive' THEN from_fridge_id IS NULL AND to_fridge_id IS NOT NULL
        WHEN 'return' THEN from_fridge_id IS NULL AND to_fridge_id IS NOT NULL
        WHEN 'transfer' THEN from_fridge_id IS NOT NULL AND to_fridge_id IS NOT NULL
        WHEN 'issue' THEN from_fridge_id IS NOT NULL AND to_fridge_id IS NULL
        WHEN 'discard' THEN from_fridge_id IS NOT NULL AND to_fridge_id IS NULL
        WHEN 'adjust' THEN (from_fridge_id IS NULL) <> (to_fridge_id IS NULL)
      END)
    );
    CREATE INDEX stock_movements_lot_idx ON stock_movements (lot_id, at);
    CREATE INDEX stock_movements_source_idx ON stock_movements (source_kind, source_id);

    -- Balances per lot and fridge, derived from the ledger by the trigger below and never negative.
    CREATE TABLE stock_balances (
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      fridge_id integer NOT NULL REFERENCES fridges(id) ON DELETE RESTRICT,
      vials integer NOT NULL CONSTRAINT stock_balances_vials_check CHECK (vials >= 0),
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (lot_id, fridge_id)
    );
    CREATE INDEX stock_balances_fridge_idx ON stock_balances (fridge_id);

    -- Runs as the owner (SECURITY DEFINER): the application cannot write balances except by appending movements.
    -- The UPDATE row-locks the balance, so concurrent takings from one lot and fridge queue up and each sees the
    -- one before it; the CHECK then refuses the one that would go below zero.
    CREATE FUNCTION apply_stock_movement() RETURNS trigger
    LANGUAGE plpgsql SECURITY DEFINER SET search_path = public, pg_temp AS $fn$
    BEGIN
      IF NEW.from_fridge_id IS NOT NULL THEN
        UPDATE stock_balances SET vials = vials - NEW.vials, updated_at = now()
          WHERE lot_id = NEW.lot_id AND fridge_id = NEW.from_fridge_id;
        IF NOT FOUND THEN
          RAISE EXCEPTION 'lot % has no vials in fridge %', NEW.lot_id, NEW.from_fridge_id
            USING ERRCODE = 'check_violation', CONSTRAINT = 'stock_balances_vials_check', TABLE = 'stock_balances';
        END IF;
      END IF;
      IF NEW.to_fridge_id IS NOT NULL THEN
        INSERT INTO stock_balances (lot_id, fridge_id, vials) VALUES (NEW.lot_id, NEW.to_fridge_id, NEW.vials)
          ON CONFLICT (lot_id, fridge_id) DO UPDATE SET vials = stock_balances.vials + EXCLUDED.vials, updated_at = now();
      END IF;
      RETURN NULL;
    END
    $fn$;
    REVOKE ALL ON FUNCTION apply_stock_movement() FROM PUBLIC;
    CREATE TRIGGER stock_movements_apply AFTER INSERT ON stock_movements FOR EACH ROW EXECUTE FUNCTION apply_stock_movement();

    CREATE TABLE holds (
      id serial PRIMARY KEY,
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      cause text NOT NULL CHECK (cause IN (${list(holdCauses)})),
      -- What opened it: a shipment for arrival holds; an excursion, a transfer, a recall... later.
      source_kind text NOT NULL,
      source_id integer,
      reason text NOT NULL DEFAULT '',
      opened_at timestamptz NOT NULL DEFAULT now(),
      -- Null when Vialyard opened the hold by itself.
      opened_by integer REFERENCES users(id) ON DELETE RESTRICT,
      UNIQUE (lot_id, cause, source_kind, source_id)
    );
    CREATE INDEX holds_lot_idx ON holds (lot_id);

    -- The ledger and holds are records: the application adds and reads them, never changes or removes them.
    REVOKE UPDATE, DELETE, TRUNCATE ON stock_movements FROM ${app};
    REVOKE INSERT, UPDATE, DELETE, TRUNCATE ON stock_balances FROM ${app};
    REVOKE UPDATE, DELETE, TRUNCATE ON holds FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    DROP TABLE holds, stock_balances, stock_movements, shipment_photos, shipment_lines, shipments, lots,
      purchase_order_lines, purchase_orders, presentations, products, suppliers;
    DROP FUNCTION apply_stock_movement();
  `);
};

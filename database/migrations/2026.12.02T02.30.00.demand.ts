// Demand schema: per-site product stock settings (safety stock, supplier, pack), planned transfers, and each sending of a purchase order.
import type { Migration } from '../migrator.js';

export const up: Migration = async ({ context: { sequelize, appRole } }) => {
  const app = `"${appRole}"`;
  await sequelize.query(`
    CREATE TABLE product_stock_settings (
      site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      product_id integer NOT NULL REFERENCES products(id) ON DELETE RESTRICT,
      safety_stock_kind text NOT NULL CHECK (safety_stock_kind IN ('doses', 'days')),
      safety_stock_value numeric(12,2) NOT NULL CHECK (safety_stock_value >= 0),
      supplier_id integer REFERENCES suppliers(id) ON DELETE RESTRICT,
      presentation_id integer REFERENCES presentations(id) ON DELETE RESTRICT,
      service_level numeric(6,4) CHECK (service_level > 0 AND service_level < 1),
      updated_by integer REFERENCES users(id) ON DELETE RESTRICT,
      updated_at timestamptz NOT NULL DEFAULT now(),
      PRIMARY KEY (site_id, product_id),
      CHECK (safety_stock_kind = 'doses' OR safety_stock_value <= 365)
    );

    -- Stock purchasing plans to move between sites; storage staff carry it out with a transfer movement.
    CREATE TABLE planned_transfers (
      id serial PRIMARY KEY,
      lot_id integer NOT NULL REFERENCES lots(id) ON DELETE RESTRICT,
      from_site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      to_site_id integer NOT NULL REFERENCES sites(id) ON DELETE RESTRICT,
      vials integer NOT NULL CHECK (vials > 0),
      planned_on date NOT NULL,
      status text NOT NULL DEFAULT 'planned' CHECK (status IN ('planned', 'done', 'cancelled')),
      notes text NOT NULL DEFAULT '',
      created_by integer REFERENCES users(id) ON DELETE RESTRICT,
      created_at timestamptz NOT NULL DEFAULT now(),
      updated_at timestamptz NOT NULL DEFAULT now(),
      CHECK (from_site_id <> to_site_id)
    );
    CREATE INDEX planned_transfers_open_idx ON planned_transfers (to_site_id, from_site_id) WHERE status = 'planned';

    -- Every time an order went to the supplier: to whom, by whom, and whether the mail server took it.
    CREATE TABLE purchase_order_sendings (
      id serial PRIMARY KEY,
      purchase_order_id integer NOT NULL REFERENCES purchase_orders(id) ON DELETE RESTRICT,
      sent_to text NOT NULL,
      mailed boolean NOT NULL,
      pdf_bytes integer NOT NULL CHECK (pdf_bytes > 0),
      sent_by integer REFERENCES users(id) ON DELETE RESTRICT,
      sent_at timestamptz NOT NULL DEFAULT now()
    );
    CREATE INDEX purchase_order_sendings_order_idx ON purchase_order_sendings (purchase_order_id, sent_at);

    REVOKE UPDATE, DELETE, TRUNCATE ON purchase_order_sendings FROM ${app};
  `);
};

export const down: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`DROP TABLE purchase_order_sendings, planned_transfers, product_stock_settings;`);
};

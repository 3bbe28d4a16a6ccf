// Programme steps whose day had passed when the programme was applied were never generated, so a missed vaccination
// vanished from the flock's schedule and from the vaccine need. The rule now generates them (overdue); this brings the
// flocks already stored in line: each open flock gets its missing steps, as reconcileProgramme would create them.
import type { Migration } from '../migrator.js';

const name = '2026.12.04T19.30.00.overdue-programme-steps';

export const up: Migration = async ({ context: { sequelize } }) => {
  await sequelize.query(`
    WITH due AS (
      SELECT f.id AS flock_id, s.id AS step_id, s.product_id, s.route, s.notes,
             f.hatch_date + (CASE s.age_unit WHEN 'weeks' THEN s.age_value * 7 ELSE s.age_value END) AS planned_date,
             f.placement_date, f.planned_depletion_date
        FROM flocks f
        JOIN programme_steps s ON s.programme_id = f.programme_id
       WHERE f.depleted_on IS NULL
         AND NOT EXISTS (SELECT 1 FROM vaccinations v WHERE v.flock_id = f.id AND v.programme_step_id = s.id)
    ),
    created AS (
      INSERT INTO vaccinations (flock_id, programme_step_id, product_id, route, planned_date, notes, created_by)
      SELECT flock_id, step_id, product_id, route, planned_date, notes, NULL
        FROM due d
       -- In the flock's life: on or after placement (earlier steps are the hatchery's), before its planned depletion.
       WHERE d.planned_date >= d.placement_date
         AND (d.planned_depletion_date IS NULL OR d.planned_date < d.planned_depletion_date)
      RETURNING *
    )
    -- One audit entry per flock, as the application writes when it generates a flock's vaccinations.
    INSERT INTO audit_log (actor_id, action, entity, entity_id, before, after)
    SELECT NULL, 'flock.vaccinations_generated', 'flock', flock_id::text, jsonb_build_object('removed', '[]'::jsonb),
           jsonb_build_object('created', jsonb_agg(to_jsonb(created) ORDER BY planned_date, id), 'updated', '[]'::jsonb, 'migration', '${name}')
      FROM created
     GROUP BY flock_id;
  `);
};

// Nothing to undo: the earlier code keeps an overdue planned vaccination it finds, so the rows stay valid under it.
export const down: Migration = async () => {};

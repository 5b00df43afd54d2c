// A hang becomes a lineset's numbered revisions. Each keeps the items as the fly operator entered them (one
// hang_items row per entry, figures in SI) and the engine's input and result as the server computed them
// (in the hang's unit_system, as POST /calculations speaks). No hangs exist before this migration; the
// backfills only keep it correct on a database where some do.
const up = `
ALTER TABLE hangs ADD COLUMN revision integer;
UPDATE hangs SET revision = numbered.revision
  FROM (SELECT id, row_number() OVER (PARTITION BY lineset_id ORDER BY created_at, id) AS revision FROM hangs) numbered
  WHERE hangs.id = numbered.id;
ALTER TABLE hangs ALTER COLUMN revision SET NOT NULL;
ALTER TABLE hangs ADD CONSTRAINT hangs_revision_counts_from_one CHECK (revision >= 1);
-- Revisions count once per lineset, even when two saves race.
ALTER TABLE hangs ADD CONSTRAINT hangs_revision_per_lineset UNIQUE (lineset_id, revision);
ALTER TABLE hangs ADD COLUMN based_on_revision integer CHECK (based_on_revision >= 1);
ALTER TABLE hangs ADD COLUMN production_id uuid;
ALTER TABLE hangs ADD CONSTRAINT hangs_production_in_venue
  FOREIGN KEY (venue_id, production_id) REFERENCES productions (venue_id, id) ON DELETE RESTRICT;
-- Everything the lift lines carry, in kg, so lists need not open the stored result.
ALTER TABLE hangs ADD COLUMN total_load numeric CHECK (total_load >= 0);

-- One row per entry as typed: a weight at a point, a weight per length along a stretch, soft goods from
-- their fabric, library units at a point or spread along a stretch, or scenery on its own pick points.
ALTER TABLE hang_items ADD COLUMN venue_id uuid;
UPDATE hang_items SET venue_id = hangs.venue_id FROM hangs WHERE hangs.id = hang_items.hang_id;
ALTER TABLE hang_items ALTER COLUMN venue_id SET NOT NULL;
ALTER TABLE hang_items DROP CONSTRAINT hang_items_hang_id_fkey;
ALTER TABLE hang_items ADD CONSTRAINT hang_items_hang_in_venue
  FOREIGN KEY (venue_id, hang_id) REFERENCES hangs (venue_id, id) ON DELETE CASCADE;
ALTER TABLE hang_items ADD COLUMN entry_kind text;
UPDATE hang_items SET entry_kind = CASE WHEN weight IS NOT NULL THEN 'point' ELSE 'stretch' END;
ALTER TABLE hang_items ALTER COLUMN entry_kind SET NOT NULL;
ALTER TABLE hang_items ADD COLUMN category text NOT NULL DEFAULT 'other'
  CHECK (category IN ('lighting', 'audio-video', 'soft-goods', 'scenery', 'hardware', 'other'));
ALTER TABLE hang_items ADD COLUMN item_type_id uuid;
ALTER TABLE hang_items ADD CONSTRAINT hang_items_item_type_in_venue
  FOREIGN KEY (venue_id, item_type_id) REFERENCES item_types (venue_id, id) ON DELETE RESTRICT;
ALTER TABLE hang_items ADD COLUMN quantity integer CHECK (quantity >= 1);
ALTER TABLE hang_items ADD COLUMN points numeric[] CHECK (cardinality(points) >= 1);
-- Fabric grade is oz per linear yard of 54 in goods, how stage fabric is sold in either unit system.
ALTER TABLE hang_items ADD COLUMN fabric_grade numeric CHECK (fabric_grade > 0);
ALTER TABLE hang_items ADD COLUMN fabric_weight_per_area numeric CHECK (fabric_weight_per_area > 0);
ALTER TABLE hang_items ADD COLUMN fabric_height numeric CHECK (fabric_height > 0);
ALTER TABLE hang_items ADD COLUMN fabric_fullness_percent numeric CHECK (fabric_fullness_percent >= 0);
ALTER TABLE hang_items DROP CONSTRAINT hang_items_check;
ALTER TABLE hang_items ADD CONSTRAINT hang_items_shape CHECK (CASE entry_kind
  WHEN 'point' THEN weight IS NOT NULL AND at IS NOT NULL
  WHEN 'stretch' THEN weight_per_length IS NOT NULL AND from_position IS NOT NULL AND to_position > from_position
  WHEN 'fabric' THEN (fabric_grade IS NOT NULL) <> (fabric_weight_per_area IS NOT NULL)
    AND fabric_height IS NOT NULL AND fabric_fullness_percent IS NOT NULL
    AND from_position IS NOT NULL AND to_position > from_position
  WHEN 'library' THEN item_type_id IS NOT NULL AND quantity IS NOT NULL
    AND (at IS NOT NULL OR (from_position IS NOT NULL AND to_position > from_position))
  WHEN 'shared' THEN weight IS NOT NULL AND points IS NOT NULL
  ELSE false END);
`

const down = `
ALTER TABLE hang_items DROP CONSTRAINT hang_items_shape;
ALTER TABLE hang_items ADD CONSTRAINT hang_items_check CHECK ((weight IS NOT NULL AND at IS NOT NULL) OR (weight_per_length IS NOT NULL AND from_position IS NOT NULL AND to_position IS NOT NULL AND to_position > from_position));
ALTER TABLE hang_items DROP COLUMN fabric_fullness_percent, DROP COLUMN fabric_height,
  DROP COLUMN fabric_weight_per_area, DROP COLUMN fabric_grade, DROP COLUMN points, DROP COLUMN quantity;
ALTER TABLE hang_items DROP CONSTRAINT hang_items_item_type_in_venue;
ALTER TABLE hang_items DROP COLUMN item_type_id, DROP COLUMN category, DROP COLUMN entry_kind;
ALTER TABLE hang_items DROP CONSTRAINT hang_items_hang_in_venue;
ALTER TABLE hang_items ADD CONSTRAINT hang_items_hang_id_fkey FOREIGN KEY (hang_id) REFERENCES hangs (id) ON DELETE CASCADE;
ALTER TABLE hang_items DROP COLUMN venue_id;
ALTER TABLE hangs DROP COLUMN total_load;
ALTER TABLE hangs DROP CONSTRAINT hangs_production_in_venue;
ALTER TABLE hangs DROP COLUMN production_id, DROP COLUMN based_on_revision;
ALTER TABLE hangs DROP CONSTRAINT hangs_revision_per_lineset;
ALTER TABLE hangs DROP CONSTRAINT hangs_revision_counts_from_one;
ALTER TABLE hangs DROP COLUMN revision;
`

export default { name: '0004-hang-revisions', up, down }

// What is on each arbor, where every brick of the house is, and lock-outs. The stock identity
// (owned = on arbors + reserved + in storage, nothing below zero) is held by the database itself, so no
// code path, however it goes wrong, can lose or invent a brick.
const up = `
ALTER TABLE brick_types
  ADD COLUMN on_arbors integer NOT NULL DEFAULT 0 CONSTRAINT brick_types_on_arbors_not_negative CHECK (on_arbors >= 0),
  ADD COLUMN reserved integer NOT NULL DEFAULT 0 CONSTRAINT brick_types_reserved_not_negative CHECK (reserved >= 0),
  ADD COLUMN in_storage integer NOT NULL DEFAULT 0 CONSTRAINT brick_types_in_storage_not_negative CHECK (in_storage >= 0);
-- Nothing was on an arbor before: every brick owned is in storage.
UPDATE brick_types SET in_storage = quantity_owned;
ALTER TABLE brick_types ADD CONSTRAINT brick_types_stock_adds_up
  CHECK (quantity_owned = on_arbors + reserved + in_storage);

CREATE TABLE arbor_bricks (
  venue_id uuid NOT NULL,
  lineset_id uuid NOT NULL,
  brick_type_id uuid NOT NULL,
  count integer NOT NULL CONSTRAINT arbor_bricks_count_not_negative CHECK (count >= 0),
  PRIMARY KEY (lineset_id, brick_type_id),
  FOREIGN KEY (venue_id, lineset_id) REFERENCES linesets (venue_id, id) ON DELETE RESTRICT,
  FOREIGN KEY (venue_id, brick_type_id) REFERENCES brick_types (venue_id, id) ON DELETE RESTRICT
);
CREATE INDEX arbor_bricks_brick_type ON arbor_bricks (brick_type_id);

-- arbor_version is the contract's version for the arbor contents, apart from the lineset's own figures;
-- the felt balance is what the crew reported at the rail the last time weight moved.
ALTER TABLE linesets
  ADD COLUMN arbor_version integer NOT NULL DEFAULT 0,
  ADD COLUMN arbor_felt_balance text CHECK (arbor_felt_balance IN ('balanced', 'batten-heavy', 'arbor-heavy')),
  ADD COLUMN lockout_reason text,
  ADD COLUMN locked_out_at timestamptz,
  ADD COLUMN locked_out_by uuid REFERENCES users (id) ON DELETE SET NULL,
  ADD CONSTRAINT linesets_lockout_has_reason CHECK ((locked_out_at IS NULL) = (lockout_reason IS NULL));

-- At commit, each brick type touched must count on its arbors exactly what the arbor rows hold.
CREATE FUNCTION check_bricks_on_arbors() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  type_id uuid;
  recorded integer;
  counted integer;
BEGIN
  IF TG_TABLE_NAME = 'brick_types' THEN type_id := NEW.id;
  ELSIF TG_OP = 'DELETE' THEN type_id := OLD.brick_type_id;
  ELSE type_id := NEW.brick_type_id;
  END IF;
  SELECT on_arbors INTO recorded FROM brick_types WHERE id = type_id;
  SELECT coalesce(sum(count), 0) INTO counted FROM arbor_bricks WHERE brick_type_id = type_id;
  IF recorded IS NOT NULL AND recorded <> counted THEN
    RAISE EXCEPTION 'brick type % records % bricks on arbors but the arbors hold %', type_id, recorded, counted
      USING ERRCODE = 'check_violation';
  END IF;
  RETURN NULL;
END $$;
CREATE CONSTRAINT TRIGGER arbor_bricks_match_stock AFTER INSERT OR UPDATE OR DELETE ON arbor_bricks
  DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION check_bricks_on_arbors();
CREATE CONSTRAINT TRIGGER brick_types_match_arbors AFTER INSERT OR UPDATE ON brick_types
  DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION check_bricks_on_arbors();

-- Tickets move through loading between approval and completion.
ALTER TABLE weight_change_tickets DROP CONSTRAINT weight_change_tickets_state_check;
ALTER TABLE weight_change_tickets ADD CONSTRAINT weight_change_tickets_state_check
  CHECK (state IN ('requested', 'approved', 'declined', 'withdrawn', 'loading', 'loaded'));
ALTER TABLE weight_change_tickets
  ADD COLUMN felt_balance text CHECK (felt_balance IN ('balanced', 'batten-heavy', 'arbor-heavy'));

-- A ticket's bricks per type: the signed plan (+ on, - off), how many of them are held in reserve while it
-- waits to be loaded, and the signed count actually moved once it is.
CREATE TABLE ticket_bricks (
  venue_id uuid NOT NULL,
  ticket_id uuid NOT NULL,
  brick_type_id uuid NOT NULL,
  planned integer NOT NULL,
  reserved integer NOT NULL DEFAULT 0 CHECK (reserved >= 0),
  loaded integer,
  PRIMARY KEY (ticket_id, brick_type_id),
  FOREIGN KEY (venue_id, ticket_id) REFERENCES weight_change_tickets (venue_id, id) ON DELETE CASCADE,
  FOREIGN KEY (venue_id, brick_type_id) REFERENCES brick_types (venue_id, id) ON DELETE RESTRICT
);
`

const down = `
DROP TABLE ticket_bricks;
ALTER TABLE weight_change_tickets DROP COLUMN felt_balance;
ALTER TABLE weight_change_tickets DROP CONSTRAINT weight_change_tickets_state_check;
ALTER TABLE weight_change_tickets ADD CONSTRAINT weight_change_tickets_state_check
  CHECK (state IN ('requested', 'approved', 'declined', 'loaded', 'withdrawn'));
DROP TRIGGER brick_types_match_arbors ON brick_types;
DROP TRIGGER arbor_bricks_match_stock ON arbor_bricks;
DROP FUNCTION check_bricks_on_arbors();
ALTER TABLE linesets DROP CONSTRAINT linesets_lockout_has_reason;
ALTER TABLE linesets DROP COLUMN locked_out_by, DROP COLUMN locked_out_at, DROP COLUMN lockout_reason,
  DROP COLUMN arbor_felt_balance, DROP COLUMN arbor_version;
DROP TABLE arbor_bricks;
ALTER TABLE brick_types DROP CONSTRAINT brick_types_stock_adds_up;
ALTER TABLE brick_types DROP COLUMN in_storage, DROP COLUMN reserved, DROP COLUMN on_arbors;
`

export default { name: '0005-arbor-contents-brick-stock', up, down }

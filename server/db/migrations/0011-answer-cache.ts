// Stored answers for the lineset list and the board, kept per venue and valid for one "epoch": the id of the last
// transaction that changed anything those answers read. Every table they read carries a trigger that moves its
// venue's epoch to the changing transaction's id. Transaction ids (xid8) are never reused, so an entry stored under
// an old epoch can never match a later one, even after the epochs are emptied.
//
// The triggers are deferred constraint triggers: the epoch row is locked at commit, after every other lock the
// transaction takes, so writers cannot deadlock over it and writers of one venue wait on each other only for the
// instant of their commits. A transaction that changes many rows of one venue moves its epoch once; the others
// find it already theirs and stop at one indexed read.

// Every table the list's and the board's statements read besides users (whose names they show; see below).
const ANSWER_SOURCE_TABLES = [
  'venues',
  'linesets',
  'hangs',
  'weight_change_tickets',
  'arbor_bricks',
  'brick_types',
  'lineset_events',
  'pre_run_checks',
  'productions',
] as const

const rowTrigger = (table: string) => `
CREATE CONSTRAINT TRIGGER ${table}_answers_follow AFTER INSERT OR UPDATE OR DELETE ON ${table}
  DEFERRABLE INITIALLY DEFERRED FOR EACH ROW EXECUTE FUNCTION answers_follow_row();`

const up = `
CREATE TABLE answer_epochs (
  venue_id uuid PRIMARY KEY REFERENCES venues (id) ON DELETE CASCADE,
  epoch xid8 NOT NULL
);
-- A cache: losing it in a crash is harmless, so it skips the write-ahead log.
CREATE UNLOGGED TABLE answer_cache (
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE CASCADE,
  key text NOT NULL,
  epoch xid8 NOT NULL,
  body bytea NOT NULL,
  brotli bytea NOT NULL,
  gzip bytea NOT NULL,
  PRIMARY KEY (venue_id, key)
);
INSERT INTO answer_epochs (venue_id, epoch) SELECT id, pg_current_xact_id() FROM venues;

CREATE FUNCTION touch_venue_answers(venue uuid) RETURNS void LANGUAGE plpgsql AS $$
BEGIN
  -- Already this transaction's (a bulk change): nothing to write. A deleted venue has no answers to keep.
  IF venue IS NULL OR EXISTS (SELECT 1 FROM answer_epochs WHERE venue_id = venue AND epoch = pg_current_xact_id())
  THEN
    RETURN;
  END IF;
  INSERT INTO answer_epochs (venue_id, epoch)
    SELECT venue, pg_current_xact_id() WHERE EXISTS (SELECT 1 FROM venues WHERE id = venue)
    ON CONFLICT (venue_id) DO UPDATE SET epoch = EXCLUDED.epoch;
END $$;

CREATE FUNCTION answers_follow_row() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  old_venue uuid;
  new_venue uuid;
BEGIN
  IF TG_TABLE_NAME = 'venues' THEN
    IF TG_OP <> 'DELETE' THEN new_venue := NEW.id; END IF;
  ELSE
    IF TG_OP <> 'INSERT' THEN old_venue := OLD.venue_id; END IF;
    IF TG_OP <> 'DELETE' THEN new_venue := NEW.venue_id; END IF;
  END IF;
  -- A row moving venue (none should) touches both, always in the same order.
  IF old_venue <> new_venue THEN
    PERFORM touch_venue_answers(least(old_venue, new_venue));
    PERFORM touch_venue_answers(greatest(old_venue, new_venue));
  ELSE
    PERFORM touch_venue_answers(coalesce(new_venue, old_venue));
  END IF;
  RETURN NULL;
END $$;

-- A person's name shows wherever they acted: in every venue they belong to, and in any they have left whose
-- ledger, lock-outs, ticket decisions or pre-run checks name them. Renames are rare; in venue order, so two at
-- once cannot deadlock.
CREATE FUNCTION answers_follow_user_name() RETURNS trigger LANGUAGE plpgsql AS $$
DECLARE
  venue uuid;
BEGIN
  FOR venue IN
    SELECT venue_id FROM memberships WHERE user_id = NEW.id
    UNION SELECT venue_id FROM lineset_events WHERE actor_id = NEW.id
    UNION SELECT venue_id FROM linesets WHERE locked_out_by = NEW.id
    UNION SELECT venue_id FROM weight_change_tickets WHERE decided_by = NEW.id
    UNION SELECT venue_id FROM pre_run_checks WHERE checked_by = NEW.id
    ORDER BY 1
  LOOP
    PERFORM touch_venue_answers(venue);
  END LOOP;
  RETURN NULL;
END $$;
${ANSWER_SOURCE_TABLES.map(rowTrigger).join('')}
CREATE CONSTRAINT TRIGGER users_answers_follow AFTER UPDATE OF name ON users
  DEFERRABLE INITIALLY DEFERRED FOR EACH ROW WHEN (OLD.name IS DISTINCT FROM NEW.name)
  EXECUTE FUNCTION answers_follow_user_name();
`

const down = `
DROP TRIGGER users_answers_follow ON users;
${ANSWER_SOURCE_TABLES.map((table) => `DROP TRIGGER ${table}_answers_follow ON ${table};`).join('\n')}
DROP FUNCTION answers_follow_user_name();
DROP FUNCTION answers_follow_row();
DROP FUNCTION touch_venue_answers(uuid);
DROP TABLE answer_cache;
DROP TABLE answer_epochs;
`

export default { name: '0011-answer-cache', up, down }

// A pre-run check records, before a run, which linesets were ready and which were not, as they were at that
// moment (the statuses move on; the record must not). Its id is drawn from the ledger's own sequence so one
// number orders ledger entries and checks together: the board's live stream uses it as its event id, and
// "every change since the last check" is every ledger entry with a greater id.
const up = `
CREATE TABLE pre_run_checks (
  id bigint PRIMARY KEY DEFAULT nextval('lineset_events_id_seq'),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  production_id uuid,
  checked_by uuid REFERENCES users (id) ON DELETE RESTRICT,
  checked_at timestamptz NOT NULL,
  note text NOT NULL DEFAULT '',
  ready_count integer NOT NULL CHECK (ready_count >= 0),
  lineset_count integer NOT NULL CHECK (lineset_count >= ready_count),
  -- [{ id, number, name, operatingStatus }] of each lineset not ready, as recorded.
  not_ready jsonb NOT NULL DEFAULT '[]'::jsonb CHECK (jsonb_typeof(not_ready) = 'array'),
  FOREIGN KEY (venue_id, production_id) REFERENCES productions (venue_id, id) ON DELETE RESTRICT
);
CREATE INDEX pre_run_checks_venue_newest ON pre_run_checks (venue_id, id DESC);

CREATE FUNCTION refuse_pre_run_check_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'pre_run_checks is append-only';
END $$;
CREATE TRIGGER pre_run_checks_append_only BEFORE UPDATE OR DELETE ON pre_run_checks
  FOR EACH ROW EXECUTE FUNCTION refuse_pre_run_check_change();

-- The venue's ledger in order: what a reconnecting board missed, and the changes since a check.
CREATE INDEX lineset_events_venue ON lineset_events (venue_id, id);
`

const down = `
DROP INDEX lineset_events_venue;
DROP TABLE pre_run_checks;
DROP FUNCTION refuse_pre_run_check_change();
`

export default { name: '0008-pre-run-checks', up, down }

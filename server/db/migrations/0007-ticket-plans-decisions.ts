// Change tickets carry their plan, their decision and who moved them on; one lineset has at most one open
// ticket at a time, held by the database as well as the code, so two fly operators asking at once cannot
// both be waiting on the same arbor.
const up = `
ALTER TABLE weight_change_tickets
  ADD COLUMN expected_out_of_balance numeric,
  ADD COLUMN decision_comment text,
  ADD COLUMN started_by uuid REFERENCES users (id) ON DELETE SET NULL,
  ADD COLUMN started_at timestamptz,
  ADD COLUMN completed_by uuid REFERENCES users (id) ON DELETE SET NULL,
  ADD COLUMN completed_at timestamptz;
CREATE UNIQUE INDEX weight_change_tickets_one_open_per_lineset ON weight_change_tickets (lineset_id)
  WHERE state IN ('requested', 'approved', 'loading');

-- What the plan expects each arbor row to hold once loaded, beside the signed change.
ALTER TABLE ticket_bricks ADD COLUMN arbor_after integer CHECK (arbor_after >= 0);
`

const down = `
ALTER TABLE ticket_bricks DROP COLUMN arbor_after;
DROP INDEX weight_change_tickets_one_open_per_lineset;
ALTER TABLE weight_change_tickets DROP COLUMN completed_at, DROP COLUMN completed_by, DROP COLUMN started_at,
  DROP COLUMN started_by, DROP COLUMN decision_comment, DROP COLUMN expected_out_of_balance;
`

export default { name: '0007-ticket-plans-decisions', up, down }

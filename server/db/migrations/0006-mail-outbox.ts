// Outgoing e-mail is written here in the same transaction as the change that causes it and delivered after
// commit, with retries, so a mail outage never blocks or loses a change. A waiting row's next_attempt_at is
// also its claim: a sender moves it past the time a send can take before sending, so no other process
// picks the row up meanwhile, and a process that dies mid-send leaves it to be tried again later.
const up = `
CREATE TABLE mail_outbox (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE CASCADE,
  recipients text[] NOT NULL CHECK (cardinality(recipients) BETWEEN 1 AND 100),
  subject text NOT NULL,
  body_text text NOT NULL,
  state text NOT NULL DEFAULT 'waiting' CHECK (state IN ('waiting', 'sent', 'failed')),
  attempts integer NOT NULL DEFAULT 0 CHECK (attempts >= 0),
  next_attempt_at timestamptz NOT NULL,
  last_error text,
  -- What caused the message (an invitation, a ticket ...) and who, when someone did.
  cause_kind text,
  cause_id uuid,
  queued_by uuid REFERENCES users (id) ON DELETE SET NULL,
  sent_at timestamptz,
  created_at timestamptz NOT NULL,
  updated_at timestamptz NOT NULL,
  -- Sent says when; nothing else does.
  CHECK ((state = 'sent') = (sent_at IS NOT NULL)),
  CHECK ((cause_kind IS NULL) = (cause_id IS NULL))
);
-- What the sweep claims: the waiting rows that are due, oldest due first.
CREATE INDEX mail_outbox_due ON mail_outbox (next_attempt_at) WHERE state = 'waiting';
-- The outbox page: a venue's messages, newest first.
CREATE INDEX mail_outbox_venue_newest ON mail_outbox (venue_id, created_at DESC, id DESC);
`

const down = `
DROP TABLE mail_outbox;
`

export default { name: '0006-mail-outbox', up, down }

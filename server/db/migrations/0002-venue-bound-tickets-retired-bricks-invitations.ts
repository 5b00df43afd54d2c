// Tickets reference their hang within the venue; brick types are retired rather than deleted once anything
// refers to them; invitations are how a person joins a venue.
const up = `
-- A ticket names its hang by (venue_id, hang_id), like every child row, so it cannot point across venues.
ALTER TABLE weight_change_tickets DROP CONSTRAINT weight_change_tickets_hang_id_fkey;
ALTER TABLE weight_change_tickets
  ADD CONSTRAINT weight_change_tickets_hang_in_venue
  FOREIGN KEY (venue_id, hang_id) REFERENCES hangs (venue_id, id) ON DELETE RESTRICT;
-- So rows that will hang off a ticket can reference it within the venue too.
ALTER TABLE weight_change_tickets ADD CONSTRAINT weight_change_tickets_venue_id_id_key UNIQUE (venue_id, id);

-- Brick types leave the lists by retirement once anything refers to them. Nothing does yet; every table that
-- will (a lineset's pipe weight, a ticket's bricks) must reference brick_types (venue_id, id) with
-- ON DELETE RESTRICT: a delete the database refuses becomes a retirement. A retired name may be used again.
ALTER TABLE brick_types ADD COLUMN retired_at timestamptz;
ALTER TABLE brick_types DROP CONSTRAINT brick_types_venue_id_name_key;
CREATE UNIQUE INDEX brick_types_name_in_venue ON brick_types (venue_id, name) WHERE retired_at IS NULL;

-- An invitation to hold a role in a venue. Only a hash of its token is kept; the token itself travels once,
-- by e-mail. A person joins a venue only by accepting one.
CREATE TABLE invitations (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE CASCADE,
  email text NOT NULL CHECK (email = lower(email)),
  name text NOT NULL,
  role text NOT NULL CHECK (role IN ('administrator', 'technical-director', 'fly-operator', 'stage-manager')),
  token_hash text NOT NULL UNIQUE,
  state text NOT NULL DEFAULT 'pending' CHECK (state IN ('pending', 'accepted', 'withdrawn')),
  invited_by uuid REFERENCES users (id) ON DELETE SET NULL,
  expires_at timestamptz NOT NULL,
  accepted_by uuid REFERENCES users (id) ON DELETE SET NULL,
  decided_at timestamptz,
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  -- Accepted or withdrawn says when; pending never does.
  CHECK ((state = 'pending') = (decided_at IS NULL))
);
-- One open invitation per address and venue.
CREATE UNIQUE INDEX invitations_pending_per_address ON invitations (venue_id, email) WHERE state = 'pending';
`

const down = `
DROP TABLE invitations;
DROP INDEX brick_types_name_in_venue;
ALTER TABLE brick_types ADD CONSTRAINT brick_types_venue_id_name_key UNIQUE (venue_id, name);
ALTER TABLE brick_types DROP COLUMN retired_at;
ALTER TABLE weight_change_tickets DROP CONSTRAINT weight_change_tickets_venue_id_id_key;
ALTER TABLE weight_change_tickets DROP CONSTRAINT weight_change_tickets_hang_in_venue;
ALTER TABLE weight_change_tickets
  ADD CONSTRAINT weight_change_tickets_hang_id_fkey FOREIGN KEY (hang_id) REFERENCES hangs (id) ON DELETE RESTRICT;
`

export default { name: '0002-venue-bound-tickets-retired-bricks-invitations', up, down }

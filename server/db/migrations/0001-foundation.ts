// Quantities are unconstrained NUMERIC in SI units (kg, m, kg/m, m/s, m^4, m^3), converted exactly
// from what was entered; see shared/units. Every venue-owned table carries venue_id so isolation is
// one WHERE clause, and child tables reference (venue_id, id) so a row can never cross venues.
const up = `
CREATE TABLE venues (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  name text NOT NULL,
  unit_system text NOT NULL CHECK (unit_system IN ('imperial', 'metric')),
  balance_tolerance numeric NOT NULL CHECK (balance_tolerance >= 0),
  rope_lock_holding numeric NOT NULL CHECK (rope_lock_holding >= 0),
  wire_rope_design_factor numeric NOT NULL DEFAULT 8 CHECK (wire_rope_design_factor >= 1),
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);

CREATE TABLE users (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  email text NOT NULL UNIQUE CHECK (email = lower(email)),
  name text NOT NULL,
  password_hash text NOT NULL,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now()
);

CREATE TABLE memberships (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  user_id uuid NOT NULL REFERENCES users (id) ON DELETE CASCADE,
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE CASCADE,
  role text NOT NULL CHECK (role IN ('administrator', 'technical-director', 'fly-operator', 'stage-manager')),
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (user_id, venue_id)
);
CREATE INDEX memberships_venue ON memberships (venue_id);

CREATE TABLE linesets (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  number integer NOT NULL CHECK (number > 0),
  name text NOT NULL,
  kind text NOT NULL CHECK (kind IN ('counterweight-single', 'counterweight-double', 'hemp-single', 'hemp-multi', 'spot-line', 'motorized')),
  status text NOT NULL CHECK (status IN ('in-service', 'needs-inspection', 'out-of-service')),
  distance_from_plaster_line numeric CHECK (distance_from_plaster_line >= 0),
  batten_length numeric NOT NULL CHECK (batten_length > 0),
  pipe_size text NOT NULL,
  pipe_weight_per_length numeric NOT NULL CHECK (pipe_weight_per_length >= 0),
  pipe_moment_of_inertia numeric CHECK (pipe_moment_of_inertia > 0),
  pipe_section_modulus numeric CHECK (pipe_section_modulus > 0),
  pick_points numeric[] NOT NULL CHECK (cardinality(pick_points) >= 1),
  lift_line_weight_per_length numeric CHECK (lift_line_weight_per_length >= 0),
  lift_line_breaking_strength numeric CHECK (lift_line_breaking_strength > 0),
  arbor_empty_weight numeric CHECK (arbor_empty_weight >= 0),
  arbor_capacity numeric CHECK (arbor_capacity > 0),
  arbor_stack_length numeric CHECK (arbor_stack_length > 0),
  rated_load numeric CHECK (rated_load > 0),
  pipe_weight numeric CHECK (pipe_weight >= 0),
  travel numeric CHECK (travel > 0),
  sandbag_weight numeric CHECK (sandbag_weight >= 0),
  hoist_rated_capacity numeric CHECK (hoist_rated_capacity > 0),
  hoist_speed numeric CHECK (hoist_speed > 0),
  notes text NOT NULL DEFAULT '',
  -- A lineset with history is never deleted; it is retired and drops out of the lists.
  retired_at timestamptz,
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (venue_id, id)
);
CREATE UNIQUE INDEX linesets_number_in_venue ON linesets (venue_id, number) WHERE retired_at IS NULL;

CREATE TABLE brick_types (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  name text NOT NULL,
  material text NOT NULL,
  unit_weight numeric NOT NULL CHECK (unit_weight > 0),
  thickness numeric NOT NULL CHECK (thickness > 0),
  quantity_owned integer NOT NULL CHECK (quantity_owned >= 0),
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (venue_id, name),
  UNIQUE (venue_id, id)
);

-- What hangs on a batten for a show, and the engine's answer stored when it was saved.
CREATE TABLE hangs (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL,
  lineset_id uuid NOT NULL,
  title text NOT NULL,
  show_name text NOT NULL DEFAULT '',
  state text NOT NULL DEFAULT 'draft' CHECK (state IN ('draft', 'awaiting-approval', 'approved', 'loaded', 'struck')),
  created_by uuid REFERENCES users (id) ON DELETE SET NULL,
  unit_system text NOT NULL CHECK (unit_system IN ('imperial', 'metric')),
  calculation_input jsonb,
  calculation_result jsonb,
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  FOREIGN KEY (venue_id, lineset_id) REFERENCES linesets (venue_id, id) ON DELETE RESTRICT,
  UNIQUE (venue_id, id)
);
CREATE INDEX hangs_lineset ON hangs (lineset_id);

CREATE TABLE hang_items (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  hang_id uuid NOT NULL REFERENCES hangs (id) ON DELETE CASCADE,
  position integer NOT NULL,
  label text NOT NULL,
  weight numeric CHECK (weight >= 0),
  at numeric CHECK (at >= 0),
  from_position numeric CHECK (from_position >= 0),
  to_position numeric CHECK (to_position >= 0),
  weight_per_length numeric CHECK (weight_per_length >= 0),
  CHECK ((weight IS NOT NULL AND at IS NOT NULL) OR (weight_per_length IS NOT NULL AND from_position IS NOT NULL AND to_position IS NOT NULL AND to_position > from_position)),
  UNIQUE (hang_id, position)
);

-- A request to move weight, decided by a technical director.
CREATE TABLE weight_change_tickets (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL,
  lineset_id uuid NOT NULL,
  hang_id uuid REFERENCES hangs (id) ON DELETE RESTRICT,
  state text NOT NULL DEFAULT 'requested' CHECK (state IN ('requested', 'approved', 'declined', 'loaded', 'withdrawn')),
  requested_by uuid REFERENCES users (id) ON DELETE SET NULL,
  decided_by uuid REFERENCES users (id) ON DELETE SET NULL,
  decided_at timestamptz,
  required_weight numeric,
  loaded_weight numeric,
  note text NOT NULL DEFAULT '',
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  FOREIGN KEY (venue_id, lineset_id) REFERENCES linesets (venue_id, id) ON DELETE RESTRICT
);
CREATE INDEX weight_change_tickets_venue_state ON weight_change_tickets (venue_id, state);

-- The ledger: one row per thing that happened to a lineset, append-only (enforced below).
CREATE TABLE lineset_events (
  id bigint GENERATED ALWAYS AS IDENTITY PRIMARY KEY,
  venue_id uuid NOT NULL,
  lineset_id uuid NOT NULL,
  occurred_at timestamptz NOT NULL DEFAULT now(),
  actor_id uuid REFERENCES users (id) ON DELETE RESTRICT,
  event_type text NOT NULL,
  payload jsonb NOT NULL DEFAULT '{}'::jsonb,
  FOREIGN KEY (venue_id, lineset_id) REFERENCES linesets (venue_id, id) ON DELETE RESTRICT
);
CREATE INDEX lineset_events_lineset ON lineset_events (lineset_id, id);

CREATE FUNCTION refuse_ledger_change() RETURNS trigger LANGUAGE plpgsql AS $$
BEGIN
  RAISE EXCEPTION 'lineset_events is append-only';
END $$;
CREATE TRIGGER lineset_events_append_only BEFORE UPDATE OR DELETE ON lineset_events
  FOR EACH ROW EXECUTE FUNCTION refuse_ledger_change();

CREATE TABLE attachments (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  lineset_id uuid,
  file_name text NOT NULL,
  content_type text NOT NULL,
  byte_size bigint NOT NULL CHECK (byte_size >= 0),
  sha256 text NOT NULL,
  storage_key text NOT NULL UNIQUE,
  uploaded_by uuid REFERENCES users (id) ON DELETE SET NULL,
  created_at timestamptz NOT NULL DEFAULT now(),
  FOREIGN KEY (venue_id, lineset_id) REFERENCES linesets (venue_id, id) ON DELETE RESTRICT
);

-- express-session's store (connect-pg-simple's own layout).
CREATE TABLE sessions (
  sid varchar NOT NULL PRIMARY KEY,
  sess json NOT NULL,
  expire timestamp(6) NOT NULL
);
CREATE INDEX sessions_expire ON sessions (expire);

CREATE TABLE rate_limit_hits (
  key text PRIMARY KEY,
  hits integer NOT NULL,
  reset_at timestamptz NOT NULL
);
`

const down = `
DROP TABLE rate_limit_hits, sessions, attachments, lineset_events, weight_change_tickets, hang_items, hangs,
  brick_types, linesets, memberships, users, venues;
DROP FUNCTION refuse_ledger_change();
`

export default { name: '0001-foundation', up, down }

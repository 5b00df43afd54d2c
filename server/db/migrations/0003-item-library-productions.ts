// The venue's item library (generic things a crew hangs again and again) and its productions (the shows
// hangs belong to). Weights are SI like every table: unit_weight and allowance_per_unit in kg.
const up = `
CREATE TABLE item_types (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  name text NOT NULL,
  category text NOT NULL CHECK (category IN ('lighting', 'audio-video', 'soft-goods', 'scenery', 'hardware', 'other')),
  unit_weight numeric NOT NULL CHECK (unit_weight > 0),
  -- What goes with each unit: clamp, safety cable, a share of cable.
  allowance_per_unit numeric NOT NULL DEFAULT 0 CHECK (allowance_per_unit >= 0),
  notes text NOT NULL DEFAULT '',
  -- A type is retired, never deleted, so saved hangs that name it keep their meaning.
  retired_at timestamptz,
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  UNIQUE (venue_id, id)
);
CREATE UNIQUE INDEX item_types_name_in_venue ON item_types (venue_id, name) WHERE retired_at IS NULL;

CREATE TABLE productions (
  id uuid PRIMARY KEY DEFAULT gen_random_uuid(),
  venue_id uuid NOT NULL REFERENCES venues (id) ON DELETE RESTRICT,
  name text NOT NULL,
  first_performance date NOT NULL,
  last_performance date NOT NULL,
  state text NOT NULL DEFAULT 'planning' CHECK (state IN ('planning', 'running', 'closed')),
  version integer NOT NULL DEFAULT 0,
  created_at timestamptz NOT NULL DEFAULT now(),
  updated_at timestamptz NOT NULL DEFAULT now(),
  CHECK (last_performance >= first_performance),
  UNIQUE (venue_id, id)
);
CREATE UNIQUE INDEX productions_name_in_venue ON productions (venue_id, name);
`

const down = `
DROP TABLE productions;
DROP TABLE item_types;
`

export default { name: '0003-item-library-productions', up, down }

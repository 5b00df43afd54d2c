// Lift lines that stretch: each line's length from its head block (metres, in lift line order), the rope from the
// rope table, or the rope's axial stiffness EA (kg of force). All optional; a lineset without them is solved
// with rigid lines as before.
const up = `
ALTER TABLE linesets
  ADD COLUMN lift_line_lengths numeric[]
    CHECK (lift_line_lengths IS NULL OR (cardinality(lift_line_lengths) = cardinality(pick_points)
      AND 0 < ALL (lift_line_lengths))),
  ADD COLUMN lift_line_rope text CHECK (char_length(lift_line_rope) BETWEEN 1 AND 40),
  ADD COLUMN lift_line_axial_stiffness numeric CHECK (lift_line_axial_stiffness > 0);
`

const down = `
ALTER TABLE linesets
  DROP COLUMN lift_line_axial_stiffness,
  DROP COLUMN lift_line_rope,
  DROP COLUMN lift_line_lengths;
`

export default { name: '0010-lift-line-stretch', up, down }

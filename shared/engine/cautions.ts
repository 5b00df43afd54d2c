/** Cautions shown wherever the app tells someone to move weight. */
export const BALANCE_CAUTIONS: readonly string[] = Object.freeze([
  'Only trained people may operate or load a lineset.',
  'Know what a piece weighs before it is hung; never go past a posted capacity.',
  'Load the batten before the arbor, and unload the arbor before the batten.',
  'Call and answer between the rail, the loading gallery and the deck before any weight moves.',
  'Never let go of a set that is out of balance: the rope lock holds a balanced set, it is not a brake.',
  'If a set runs away, do not grab the line: shout a warning and get everyone clear.',
  'Rebalance every time anything on the batten changes.',
])

/** What the figures are, and what they defer to. */
export const FIGURES_DISCLAIMER =
  'These figures assist a qualified person; they do not replace the venue’s procedures, the manufacturer’s ratings, ' +
  'local codes, or ANSI E1.4-1 (manual counterweight rigging), ANSI E1.47 (inspection of entertainment rigging) ' +
  'and ANSI E1.6-1 (powered hoist systems).'

import { Dec, type DecimalInput } from '../units/decimal.js'
import type { LinesetStatus } from './lineset.js'
import type { FeltBalance, OperatingStatus } from './operating-status.js'
import type { TicketState } from './workflow-states.js'

// The rule apart from the statuses' names and looks: it needs exact decimals, and screens that only show a
// status should not load them.

/** What the operating status is decided from. */
export interface OperatingFacts {
  status: LinesetStatus
  lockedOut: boolean
  /** The state of the lineset's open change ticket (requested, approved or loading), if it has one. */
  openTicket: TicketState | null
  /** Whether the current hang's saved figures include a finding that says stop (over a rating, a slack line...). */
  hangSaysStop?: boolean
  /** What the crew felt at the rail the last time weight moved, if it has. */
  feltBalance: FeltBalance | null
  /** Signed out of balance at the batten for the current hang and the arbor as counted; null when unknown. */
  outOfBalance: DecimalInput | null
  /** The venue's balance tolerance, in the same units as `outOfBalance`. */
  tolerance: DecimalInput
}

/**
 * A lineset's operating status. Out of service and locked out come first (nobody operates it, whatever
 * else holds); then a current hang whose figures say stop (no ticket can balance it); then a ticket being loaded;
 * then an imbalance the rail reported or the figures show, even while a change for it awaits a decision (the
 * set must not fly meanwhile, and it reads the same before and after the approval); then a ticket awaiting a
 * decision on a set that balances as it stands; else ready.
 * A lineset needing inspection keeps its own status beside this one.
 *
 * @example
 * operatingStatus({ status: 'in-service', lockedOut: false, openTicket: null, feltBalance: null,
 *   outOfBalance: 12, tolerance: 10 }) // 'out-of-balance'
 */
export function operatingStatus(facts: OperatingFacts): OperatingStatus {
  if (facts.status === 'out-of-service') return 'out-of-service'
  if (facts.lockedOut) return 'locked-out'
  if (facts.hangSaysStop) return 'unsafe-hang'
  if (facts.openTicket === 'loading') return 'loading'
  if (facts.feltBalance && facts.feltBalance !== 'balanced') return 'out-of-balance'
  if (facts.outOfBalance !== null && Dec(facts.outOfBalance).abs().gt(Dec(facts.tolerance))) return 'out-of-balance'
  if (facts.openTicket === 'requested') return 'awaiting-approval'
  return 'ready'
}

import { Dec, type DecimalInput } from '../units/decimal.js'
import type { LinesetStatus } from './lineset.js'
import type { TicketState } from './workflow-states.js'

/**
 * Whether a lineset may be operated now, from most to least serious. Shown on every screen that lists
 * linesets, always in words with an icon, never by colour alone.
 */
export const OPERATING_STATUSES = [
  'out-of-service',
  'locked-out',
  'loading',
  'awaiting-approval',
  'out-of-balance',
  'ready',
] as const
export type OperatingStatus = (typeof OPERATING_STATUSES)[number]

/** How each operating status reads: plain words, an icon name (Material Design Icons) and a theme colour. */
export const OPERATING_STATUS_LOOK: Readonly<Record<OperatingStatus, { label: string; icon: string; color: string }>> =
  {
    ready: { label: 'Ready', icon: 'mdi-check-circle-outline', color: 'success' },
    'awaiting-approval': { label: 'Awaiting approval', icon: 'mdi-clock-outline', color: 'info' },
    loading: { label: 'Loading, do not operate', icon: 'mdi-weight', color: 'warning' },
    'out-of-balance': { label: 'Out of balance, do not operate', icon: 'mdi-scale-unbalanced', color: 'error' },
    'locked-out': { label: 'Locked out', icon: 'mdi-lock-outline', color: 'error' },
    'out-of-service': { label: 'Out of service', icon: 'mdi-cancel', color: 'secondary' },
  }

/** How the set felt at the rail when weight last moved. */
export const FELT_BALANCES = ['balanced', 'batten-heavy', 'arbor-heavy'] as const
export type FeltBalance = (typeof FELT_BALANCES)[number]

/** What the operating status is decided from. */
export interface OperatingFacts {
  status: LinesetStatus
  lockedOut: boolean
  /** The state of the lineset's open change ticket (requested, approved or loading), if it has one. */
  openTicket: TicketState | null
  /** What the crew felt at the rail the last time weight moved, if it has. */
  feltBalance: FeltBalance | null
  /** Signed out of balance at the batten for the current hang and the arbor as counted; null when unknown. */
  outOfBalance: DecimalInput | null
  /** The venue's balance tolerance, in the same units as `outOfBalance`. */
  tolerance: DecimalInput
}

/**
 * A lineset's operating status. Out of service and locked out come first (nobody operates it, whatever
 * else holds); then a ticket being loaded; then a ticket awaiting a decision, which explains why the arbor
 * does not yet match a newly saved hang; then an imbalance the rail reported or the figures show; else ready.
 * A lineset needing inspection keeps its own status beside this one.
 *
 * @example
 * operatingStatus({ status: 'in-service', lockedOut: false, openTicket: null, feltBalance: null,
 *   outOfBalance: 12, tolerance: 10 }) // 'out-of-balance'
 */
export function operatingStatus(facts: OperatingFacts): OperatingStatus {
  if (facts.status === 'out-of-service') return 'out-of-service'
  if (facts.lockedOut) return 'locked-out'
  if (facts.openTicket === 'loading') return 'loading'
  if (facts.openTicket === 'requested') return 'awaiting-approval'
  if (facts.feltBalance && facts.feltBalance !== 'balanced') return 'out-of-balance'
  if (facts.outOfBalance !== null && Dec(facts.outOfBalance).abs().gt(Dec(facts.tolerance))) return 'out-of-balance'
  return 'ready'
}

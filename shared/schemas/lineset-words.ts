import type { LinesetKind, LinesetStatus } from './lineset.js'

/** Plain names for each kind of lineset, as the screens and the printed papers show them. */
export const LINESET_KIND_WORDS: Readonly<Record<LinesetKind, string>> = {
  'counterweight-single': 'Counterweight, single purchase',
  'counterweight-double': 'Counterweight, double purchase',
  'hemp-single': 'Hemp, one line',
  'hemp-multi': 'Hemp, several lines',
  'spot-line': 'Spot line',
  motorized: 'Motorized',
}

/** Whether a set may be used, in words. */
export const LINESET_STATUS_WORDS: Readonly<Record<LinesetStatus, string>> = {
  'in-service': 'In service',
  'needs-inspection': 'Due for inspection',
  'out-of-service': 'Out of service',
}

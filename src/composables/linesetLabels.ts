import type { LinesetKind, LinesetStatus } from '../../shared/schemas/index.js'

/** Plain names for each kind of lineset, as the screens show them. */
export const KIND_LABELS: Readonly<Record<LinesetKind, string>> = {
  'counterweight-single': 'Counterweight, single purchase',
  'counterweight-double': 'Counterweight, double purchase',
  'hemp-single': 'Hemp, one line',
  'hemp-multi': 'Hemp, several lines',
  'spot-line': 'Spot line',
  motorized: 'Motorized',
}

export const STATUS_LABELS: Readonly<Record<LinesetStatus, string>> = {
  'in-service': 'In service',
  'needs-inspection': 'Due for inspection',
  'out-of-service': 'Out of service',
}

/** Theme colours for the status chip; the words carry the meaning, the colour only helps. */
export const STATUS_COLORS: Readonly<Record<LinesetStatus, string>> = {
  'in-service': 'success',
  'needs-inspection': 'warning',
  'out-of-service': 'error',
}

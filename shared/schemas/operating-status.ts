/**
 * Whether a lineset may be operated now, from most to least serious. Shown on every screen that lists
 * linesets, always in words with an icon, never by colour alone.
 */
export const OPERATING_STATUSES = [
  'out-of-service',
  'locked-out',
  'unsafe-hang',
  'loading',
  'out-of-balance',
  'awaiting-approval',
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
    'unsafe-hang': { label: 'Unsafe hang, do not operate', icon: 'mdi-alert-octagon-outline', color: 'error' },
    'out-of-service': { label: 'Out of service', icon: 'mdi-cancel', color: 'secondary' },
  }

/** How the set felt at the rail when weight last moved. */
export const FELT_BALANCES = ['balanced', 'batten-heavy', 'arbor-heavy'] as const
export type FeltBalance = (typeof FELT_BALANCES)[number]

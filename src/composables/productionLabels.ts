import type { ProductionState } from '../../shared/schemas/index.js'

/** An icon for each state; the state's word always stands beside it, so neither icon nor colour carries it alone. */
export const PRODUCTION_STATE_ICONS: Readonly<Record<ProductionState, string>> = {
  planning: 'mdi-pencil-ruler',
  running: 'mdi-play-circle-outline',
  closed: 'mdi-flag-checkered',
}

export const PRODUCTION_STATE_COLORS: Readonly<Record<ProductionState, string>> = {
  planning: 'info',
  running: 'success',
  closed: 'secondary',
}

/**
 * A performance day (`YYYY-MM-DD`, no time or zone) in words. Read as UTC so no time zone moves it a day.
 *
 * @example
 * performanceDay('2026-03-14') // 'Sat, 14 Mar 2026'
 */
export const performanceDay = (day: string) =>
  new Date(`${day}T00:00:00Z`).toLocaleDateString('en-GB', {
    weekday: 'short',
    day: 'numeric',
    month: 'short',
    year: 'numeric',
    timeZone: 'UTC',
  })

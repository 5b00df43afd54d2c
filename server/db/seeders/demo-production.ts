import type { ProductionInput } from '../../../shared/schemas/production.js'

const DAY_MS = 24 * 60 * 60 * 1000
const day = (from: Date, offset: number) => new Date(from.getTime() + offset * DAY_MS).toISOString().slice(0, 10)

/**
 * The demo venue's show, an invented play in performance: it opened two weeks before the demo was seeded and
 * runs six weeks more, so it reads as running whenever the demo starts.
 */
export function demoProduction(today: Date): ProductionInput {
  return {
    name: 'The Lamplighter’s Daughter',
    firstPerformance: day(today, -14),
    lastPerformance: day(today, 42),
    state: 'running',
  }
}

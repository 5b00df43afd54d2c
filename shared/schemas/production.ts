import { z } from 'zod'
import { versionField } from './quantity.js'
import { singleLineText } from './text.js'

/** Where a show stands: being planned, in performance, or over. */
export const PRODUCTION_STATES = ['planning', 'running', 'closed'] as const
export type ProductionState = (typeof PRODUCTION_STATES)[number]

export const PRODUCTION_STATE_LABELS: Readonly<Record<ProductionState, string>> = {
  planning: 'Planning',
  running: 'Running',
  closed: 'Closed',
}

/** A calendar day as `YYYY-MM-DD`, within years a theatre's records can mean. */
const performanceDay = () =>
  z.iso
    .date({ error: 'Enter a date as YYYY-MM-DD' })
    .refine((day) => day >= '1900-01-01' && day <= '2999-12-31', 'Enter a date between 1900 and 2999')

const productionFields = z.object({
  name: singleLineText('Name', 80, { required: true }),
  firstPerformance: performanceDay(),
  lastPerformance: performanceDay(),
  state: z.enum(PRODUCTION_STATES, { error: 'Choose planning, running or closed' }),
})

const lastNotBeforeFirst = (value: { firstPerformance: string; lastPerformance: string }, ctx: z.RefinementCtx) => {
  if (value.lastPerformance < value.firstPerformance)
    ctx.addIssue({ code: 'custom', path: ['lastPerformance'], message: 'Must not be before the first performance' })
}

/** A show the venue's hangs are grouped by. */
export const productionInputSchema = productionFields.superRefine(lastNotBeforeFirst)
export type ProductionInput = z.infer<typeof productionInputSchema>

export const productionUpdateSchema = productionFields
  .extend({ version: versionField() })
  .superRefine(lastNotBeforeFirst)
export type ProductionUpdate = z.infer<typeof productionUpdateSchema>

/** A production as the API returns it. */
export interface Production extends ProductionInput {
  id: string
  version: number
}

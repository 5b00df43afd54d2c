import { z } from 'zod'
import type { HangEntry } from '../hang/hang-items.js'
import type { UnitSystem } from '../units/systems.js'
import type { CalculationResult } from './calculation-result.js'
import { MAX_ITEMS, type CalculationInput } from './calculation.js'
import { hangEntrySchemaFor } from './hang-entry.js'
import { count, typedInField } from './quantity.js'
import { singleLineText } from './text.js'

/**
 * A new revision of a lineset's hang, as the fly operator saves it. `basedOnRevision` is the revision the form
 * started from (`null` for a lineset's first); the server refuses the save when a newer one exists. Any result
 * a client sends is not part of this: the server computes its own.
 */
const hangSaveFields = (units: UnitSystem) =>
  z.object({
    title: singleLineText('Title', 120, { required: true }),
    productionId: z.uuid({ error: 'Choose a production' }).nullable().optional(),
    basedOnRevision: count('revision', 'Based on revision').nullable(),
    items: z
      .array(hangEntrySchemaFor(units), { error: 'List the items' })
      .max(MAX_ITEMS, `At most ${MAX_ITEMS} items can hang on one batten`),
    unitSystem: typedInField(),
  })
const saveSchemas = { imperial: hangSaveFields('imperial'), metric: hangSaveFields('metric') }
export const hangSaveSchemaFor = (units: UnitSystem) => saveSchemas[units]
export type HangSave = z.infer<ReturnType<typeof hangSaveFields>>

/** `/linesets/:id/hangs/:hangId`. */
export const hangParamsSchema = z.object({ id: z.uuid(), hangId: z.uuid() })

/** One revision in a lineset's list of hangs, newest first; `totalLoad` in the venue's units. */
export interface HangSummary {
  id: string
  revision: number
  title: string
  productionId: string | null
  createdAt: string
  createdBy: { id: string; name: string } | null
  totalLoad: number
}

/**
 * A saved revision: the items as entered (in the venue's units) and the engine's result, exactly as
 * `POST /calculations` answers for the expanded input, in `result.units` (the venue's when it was saved).
 * `input` is that expanded input as it was saved (the lineset's batten, pipe and pick points then, the venue's
 * figures then, one load per item), in `result.units`; null when the revision has none that still reads.
 */
export interface HangRevision extends HangSummary {
  linesetId: string
  unitSystem: UnitSystem
  items: HangEntry[]
  input: CalculationInput | null
  result: CalculationResult
}

/** What the lineset list shows of each lineset's latest revision. */
export interface CurrentHang {
  id: string
  revision: number
  title: string
  totalLoad: number
}

import { calculationInputSchema, type CalculationInput } from '../../../shared/schemas/calculation.js'

/**
 * The engine input saved with a revision, read back through the schema the engine itself takes, so what a drawing
 * is made from is what was computed. Null when the row holds none, when it no longer reads as an input (a shape
 * from before a change to the schema), or when its units are not those of the result saved beside it.
 */
export function storedCalculationInput(stored: unknown, resultUnits: unknown): CalculationInput | null {
  if (stored === null || stored === undefined) return null
  const parsed = calculationInputSchema.safeParse(stored)
  return parsed.success && parsed.data.units === resultUnits ? parsed.data : null
}

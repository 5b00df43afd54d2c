import { calculationInputSchema, type CalculationInput } from '../../../shared/schemas/calculation.js'

/** A batten-only input (hemp-multi: no arbor needed) with the given lines and items, parsed. */
export function battenInput(options: {
  length: number
  pickPoints: number[]
  weightPerLength?: number
  items?: Array<Record<string, number>>
  extra?: Record<string, unknown>
}): CalculationInput {
  return calculationInputSchema.parse({
    units: 'imperial',
    kind: 'hemp-multi',
    batten: { length: options.length, weightPerLength: options.weightPerLength ?? 0, pickPoints: options.pickPoints },
    items: options.items ?? [],
    ...options.extra,
  })
}

/** The sample counterweight lineset from the issue. */
export const SAMPLE_INPUT = {
  units: 'imperial',
  kind: 'counterweight-single',
  batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40] },
  items: [
    { label: 'an item at a point', weight: 100, at: 5 },
    { label: 'an item along a span', weightPerLength: 25, from: 0, to: 40 },
  ],
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
  bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }],
  liftLine: { weightPerLength: 0.11, breakingStrength: 7000, designFactor: 8 },
  tolerance: 10,
}

import { Dec, roundTo, type DecimalInput, type Quantity, type UnitSystem } from '../../shared/units/index.js'

/** Decimals a form field shows: what a crew can measure in each unit, so 1200 lb reads 544.31 kg, not 544.310844. */
const ENTRY_PLACES: Readonly<Record<Quantity, Readonly<Record<UnitSystem, number>>>> = {
  weight: { imperial: 2, metric: 2 },
  length: { imperial: 3, metric: 3 },
  shortLength: { imperial: 3, metric: 1 },
  weightPerLength: { imperial: 3, metric: 3 },
  weightPerArea: { imperial: 4, metric: 3 },
  speed: { imperial: 1, metric: 3 },
  momentOfInertia: { imperial: 4, metric: 0 },
  sectionModulus: { imperial: 4, metric: 0 },
  stress: { imperial: 0, metric: 0 },
}

/**
 * Remembers the figure behind each rounded text a form shows, so a field left alone saves the figure it was read
 * with, not its rounding (and a setting switched to metric and back comes home unchanged).
 *
 * @example
 * const figures = exactFigures()
 * figures.show(544.310844, 'weight', 'metric') // '544.31'
 * figures.read('544.31', 'weight', 'metric') // 544.310844
 * figures.read('544.3', 'weight', 'metric') // 544.3 (typed, so taken as typed)
 */
export function exactFigures() {
  const exact = new Map<string, number>()
  const keyOf = (text: string, quantity: Quantity, system: UnitSystem) => `${quantity}:${system}:${text.trim()}`

  function show(value: DecimalInput, quantity: Quantity, system: UnitSystem): string {
    const shown = String(roundTo(value, ENTRY_PLACES[quantity][system]))
    exact.set(keyOf(shown, quantity, system), Dec(value).toNumber())
    return shown
  }

  /** The figure a text stands for; blank text stays blank (undefined) so the schema can ask for it. */
  function read(text: string, quantity: Quantity, system: UnitSystem): number | undefined {
    if (text.trim() === '') return undefined
    return exact.get(keyOf(text, quantity, system)) ?? Number(text)
  }

  return { show, read }
}

export type ExactFigures = ReturnType<typeof exactFigures>

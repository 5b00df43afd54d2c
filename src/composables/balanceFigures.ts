import type { CheckLevel } from '../../shared/schemas/calculation-result.js'
import type { Quantity, UnitSystem } from '../../shared/units/index.js'
import { formatFigure } from './figures'

/**
 * A result figure in the venue's units, by the app's one display rule (the same as lists and the engine's messages).
 *
 * @example
 * showFigure(1016.564, 'weight', 'imperial') // '1,016.56 lb'
 */
export const showFigure = (value: number, quantity: Quantity, units: UnitSystem) => formatFigure(value, quantity, units)

/**
 * The out-of-balance figure in words. The engine states it at the batten: positive when the batten side is heavier.
 *
 * @example
 * balanceInWords(-12.5, 'imperial') // { signed: '−12.5 lb', words: '12.5 lb arbor heavy' }
 */
export function balanceInWords(outOfBalance: number, units: UnitSystem) {
  const size = showFigure(Math.abs(outOfBalance), 'weight', units)
  if (outOfBalance === 0) return { signed: size, words: 'in balance' }
  const heavier = outOfBalance > 0 ? 'batten heavy' : 'arbor heavy'
  return { signed: `${outOfBalance > 0 ? '+' : '−'}${size}`, words: `${size} ${heavier}` }
}

/** How each level of finding looks: an icon and a word of our own, so colour is never the only cue. */
export const LEVEL_LOOK: Readonly<Record<CheckLevel, { icon: string; color: string; word: string }>> = {
  danger: { icon: 'mdi-hand-back-right-outline', color: 'error', word: 'Stop' },
  caution: { icon: 'mdi-eye-outline', color: 'warning', word: 'Look again' },
  info: { icon: 'mdi-information-slab-circle-outline', color: 'info', word: 'Note' },
}

import type { Decimal } from 'decimal.js'
import { unitLabel, type Quantity, type UnitSystem } from './labels.js'

/**
 * The one display-rounding rule: how many decimals a figure of each quantity is shown with, in lists, forms'
 * read-outs, results and the engine's own messages alike (trailing zeros dropped), so the same weight never
 * reads 19.5 lb on one screen and 19.50 lb or 20 lb on another.
 */
export const DISPLAY_PLACES: Readonly<Record<Quantity, number>> = {
  weight: 2,
  length: 2,
  shortLength: 2,
  weightPerLength: 3,
  weightPerArea: 4,
  speed: 2,
  momentOfInertia: 3,
  sectionModulus: 3,
  stress: 2,
}

const DECIMAL_TEXT = /^([+-]?)(\d*)(?:\.(\d*))?(?:e([+-]?\d+))?$/i
/** Beyond this many whole digits a figure is written as given: no venue's figure comes near it. */
const MAX_WHOLE_DIGITS = 400

/**
 * Rounds the decimal a text writes (a JS number's own shortest text, a decimal string, or a Decimal's) half away
 * from zero, digit by digit on the text, so no binary fraction creeps in: 2.005 rounds to 2.01 as written.
 * Works on strings, not on the decimal library, so screens that only show figures do not load it.
 */
function roundText(text: string, places: number): { negative: boolean; whole: string; fraction: string } | string {
  const parts = DECIMAL_TEXT.exec(text.trim())
  if (!parts || `${parts[2]}${parts[3] ?? ''}` === '') throw new TypeError(`Not a figure: ${text}`)
  const [, sign, whole = '', fraction = '', exponent = '0'] = parts
  // The figure is 0.<digits> x 10^point once the leading zeros are gone.
  const written = `${whole}${fraction}`
  const digits = written.replace(/^0+/, '')
  const point = whole.length + Number(exponent) - (written.length - digits.length)
  if (digits === '' || point < -places) return { negative: false, whole: '0', fraction: '' }
  if (point > MAX_WHOLE_DIGITS) return text
  // Every digit up to the one after the last kept place, zeros filled in; then cut there and carry.
  const padded = '0'.repeat(Math.max(0, -point)) + digits
  const at = Math.max(point, 0) + places
  const full = padded.padEnd(at + 1, '0')
  const kept = [...full.slice(0, at)].map(Number)
  if (Number(full[at]) >= 5) {
    let k = kept.length - 1
    while (k >= 0 && kept[k] === 9) kept[k--] = 0
    if (k >= 0) kept[k]! += 1
    else kept.unshift(1)
  }
  const all = kept.join('')
  const wholeDigits = all.slice(0, all.length - places).replace(/^0+(?=\d)/, '') || '0'
  const fractionDigits = all.slice(all.length - places)
  return { negative: sign === '-' && /[1-9]/.test(all), whole: wholeDigits, fraction: fractionDigits }
}

/**
 * A number rounded half away from zero to `places`, thousands separated, trailing zeros dropped.
 *
 * @example
 * displayNumber(1016.564, 2) // '1,016.56'
 * displayNumber('-1234.5', 2) // '-1,234.5'
 */
export function displayNumber(value: Decimal.Value, places: number): string {
  if (typeof value === 'number' && !Number.isFinite(value)) return String(value)
  const text = typeof value === 'number' ? String(value) : value.toString()
  const rounded = roundText(text, places)
  if (typeof rounded === 'string') return rounded
  const grouped = rounded.whole.replace(/\B(?=(\d{3})+(?!\d))/g, ',')
  const tail = rounded.fraction.replace(/0+$/, '')
  return `${rounded.negative ? '-' : ''}${grouped}${tail ? `.${tail}` : ''}`
}

/**
 * A figure of a quantity with its unit label, by the one display rule.
 *
 * @example
 * displayQuantity(19.5, 'weight', 'imperial') // '19.5 lb'
 * displayQuantity(1016.564, 'weight', 'imperial') // '1,016.56 lb'
 */
export function displayQuantity(value: Decimal.Value, quantity: Quantity, system: UnitSystem): string {
  return `${displayNumber(value, DISPLAY_PLACES[quantity])} ${unitLabel(quantity, system)}`
}

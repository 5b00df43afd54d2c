import { Dec, convert, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/** A lift-line rope the table knows: its axial stiffness EA (a force) and where that figure comes from. */
export interface RopeSize {
  key: string
  label: string
  /** Axial stiffness EA in lb (force per unit strain). */
  axialStiffnessPounds: number
}

/**
 * Basis of the table's stiffness figures. No published table was at hand: each EA is the rope's metallic area
 * (about 0.4·d² in² for a 7x19 strand rope) times a rope modulus of about 12,000 ksi, both from memory.
 */
export const ROPE_STIFFNESS_BASIS =
  'rope table: metallic area about 0.4·d² times a rope modulus of about 12,000 ksi (from memory, unverified)'

/** The basis named when the lineset gives its own EA. */
export const ENTERED_STIFFNESS_BASIS = 'rope stiffness (EA) as entered for the lineset'

/** 7x19 galvanized aircraft cable, the usual counterweight lift line (sizes as in TRADE.md). */
export const ROPE_SIZES: readonly RopeSize[] = [
  { key: '7x19-galvanized-1/8', label: '1/8 in 7x19 galvanized', axialStiffnessPounds: 75_000 },
  { key: '7x19-galvanized-3/16', label: '3/16 in 7x19 galvanized', axialStiffnessPounds: 168_750 },
  { key: '7x19-galvanized-1/4', label: '1/4 in 7x19 galvanized', axialStiffnessPounds: 300_000 },
]

export const ROPE_SIZE_KEYS = ROPE_SIZES.map((rope) => rope.key)

/**
 * A rope's axial stiffness EA in the venue's weight unit (lb or kg of force), or undefined for an unknown key.
 *
 * @example
 * ropeAxialStiffness('7x19-galvanized-1/4', 'imperial')?.toString() // '300000'
 */
export function ropeAxialStiffness(key: string, units: UnitSystem): Decimal | undefined {
  const rope = ROPE_SIZES.find((size) => size.key === key)
  return rope && convert(Dec(rope.axialStiffnessPounds), 'weight', 'imperial', units)
}

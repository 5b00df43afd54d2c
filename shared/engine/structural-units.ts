import { Dec, STANDARD_GRAVITY, UNIT_SYSTEMS, fromSI, toSI, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/**
 * Per unit system, worked out once: newtons in one weight unit (lbf or kgf), metres in one length
 * unit, and its cube. The same values as computing them on every call, without the repeated work.
 */
const FACTORS = Object.fromEntries(
  UNIT_SYSTEMS.map((units) => {
    const metres = toSI(1, 'length', units)
    return [units, { newtons: toSI(1, 'weight', units).times(STANDARD_GRAVITY), metres, cubicMetres: metres.pow(3) }]
  }),
) as Record<UnitSystem, { newtons: Decimal; metres: Decimal; cubicMetres: Decimal }>

/**
 * Bending stress M/S in ksi or MPa, from a moment in lb·ft or kg·m and S in in³ or mm³.
 *
 * @example
 * bendingStress(100, 0.326, 'imperial').toFixed(3) // '3.681' (100 lb·ft = 1,200 lb·in over 0.326 in³)
 */
export function bendingStress(moment: Decimal.Value, sectionModulus: Decimal.Value, units: UnitSystem): Decimal {
  const { newtons, metres } = FACTORS[units]
  const newtonMetres = Dec(moment).times(newtons).times(metres)
  return fromSI(newtonMetres.div(toSI(sectionModulus, 'sectionModulus', units)), 'stress', units)
}

/**
 * Turns EI·y (weight · length³ in the input's units) into a deflection in in or mm.
 *
 * @example
 * deflectionFromEIy(1728, 29000, 1, 'imperial').toFixed(4) // '0.1030' (1 lb·ft³ = 1,728 lb·in³; EI = 29e6 lb·in²)
 */
export function deflectionFromEIy(
  eiy: Decimal.Value,
  elasticModulus: Decimal.Value,
  momentOfInertia: Decimal.Value,
  units: UnitSystem,
): Decimal {
  return deflectionConverter(elasticModulus, momentOfInertia, units)(eiy)
}

/**
 * {@link deflectionFromEIy} for one pipe: the stiffness in SI is worked out once for all its figures.
 *
 * @example
 * const toInches = deflectionConverter(29000, 1, 'imperial')
 * toInches(1728).toFixed(4) // '0.1030'
 */
export function deflectionConverter(
  elasticModulus: Decimal.Value,
  momentOfInertia: Decimal.Value,
  units: UnitSystem,
): (eiy: Decimal.Value) => Decimal {
  const { newtons, cubicMetres } = FACTORS[units]
  const stiffness = toSI(elasticModulus, 'stress', units).times(toSI(momentOfInertia, 'momentOfInertia', units))
  return (eiy) => fromSI(Dec(eiy).times(newtons).times(cubicMetres).div(stiffness), 'shortLength', units)
}

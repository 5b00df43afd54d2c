import { Dec, STANDARD_GRAVITY, fromSI, toSI, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'

/** Newtons in one weight unit (lbf or kgf). */
function newtonsPerWeight(units: UnitSystem): Decimal {
  return toSI(1, 'weight', units).times(STANDARD_GRAVITY)
}

/**
 * Bending stress M/S in ksi or MPa, from a moment in lb·ft or kg·m and S in in³ or mm³.
 *
 * @example
 * bendingStress(100, 0.326, 'imperial').toFixed(3) // '3.681' (100 lb·ft = 1,200 lb·in over 0.326 in³)
 */
export function bendingStress(moment: Decimal.Value, sectionModulus: Decimal.Value, units: UnitSystem): Decimal {
  const newtonMetres = Dec(moment).times(newtonsPerWeight(units)).times(toSI(1, 'length', units))
  return fromSI(newtonMetres.div(toSI(sectionModulus, 'sectionModulus', units)), 'stress', units)
}

/**
 * Turns EI·y (weight · length³ in the input's units) into a deflection in in or mm.
 *
 * @example
 * deflectionFromEIy(1728, 29000, 1, 'imperial').toFixed(4) // '0.1030' (1 lb·ft³ = 1,728 lb·in³; EI = 29e6 lb·in²)
 */
export function deflectionFromEIy(eiy: Decimal.Value, elasticModulus: Decimal.Value, momentOfInertia: Decimal.Value, units: UnitSystem): Decimal {
  const metres = toSI(1, 'length', units)
  const numerator = Dec(eiy).times(newtonsPerWeight(units)).times(metres.pow(3))
  const stiffness = toSI(elasticModulus, 'stress', units).times(toSI(momentOfInertia, 'momentOfInertia', units))
  return fromSI(numerator.div(stiffness), 'shortLength', units)
}

import { Dec, KILOGRAMS_PER_POUND, METRES_PER_FOOT, type DecimalInput, type UnitSystem } from '../units/index.js'

/**
 * Stage fabric is sold by its weight per running (linear) yard of goods 54 in wide, so 1 oz per linear yard
 * covers 1 yd x 1.5 yd = 1.5 sq yd: 36/54 oz per sq yd. In pounds per square foot that is exactly
 * 1/216 (36/54 oz / 9 sq ft / 16 oz per lb).
 */
const SQUARE_FEET_PER_LINEAR_YARD_OF_GOODS = Dec(3).times(Dec(54).dividedBy(12)) // 3 ft x 4.5 ft = 13.5 sq ft
const POUNDS_PER_OUNCE = Dec(1).dividedBy(16)

/**
 * Weight per area of fabric sold at `grade` oz per linear yard of 54 in goods, in the venue's units
 * (lb/ft² or kg/m²).
 *
 * @example
 * fabricWeightPerArea(25, 'imperial').toFixed(4) // '0.1157' (lb/ft²)
 */
export function fabricWeightPerArea(gradeOzPerLinearYard: DecimalInput, units: UnitSystem): Dec {
  const poundsPerSquareFoot = Dec(gradeOzPerLinearYard)
    .times(POUNDS_PER_OUNCE)
    .dividedBy(SQUARE_FEET_PER_LINEAR_YARD_OF_GOODS)
  if (units === 'imperial') return poundsPerSquareFoot
  return poundsPerSquareFoot.times(KILOGRAMS_PER_POUND).dividedBy(METRES_PER_FOOT.pow(2))
}

/** How a piece of soft goods is described: its fabric (by grade or by weight per area), finished height and fullness. */
export interface FabricDescription {
  gradeOzPerLinearYard?: number
  weightPerArea?: number
  height: number
  fullnessPercent: number
}

/**
 * Weight per length along the batten of a piece of soft goods: weight per area x finished height x
 * (1 + fullness / 100), in the venue's units (lb/ft or kg/m). Fabric only: webbing, hems and chain are extra.
 *
 * @example
 * // A 20 ft high drop of 25 oz goods at 100 % fullness: 0.1157 x 20 x 2 = 4.63 lb/ft
 * fabricWeightPerLength({ gradeOzPerLinearYard: 25, height: 20, fullnessPercent: 100 }, 'imperial')
 */
export function fabricWeightPerLength(fabric: FabricDescription, units: UnitSystem): Dec {
  const perArea =
    fabric.weightPerArea !== undefined
      ? Dec(fabric.weightPerArea)
      : fabricWeightPerArea(fabric.gradeOzPerLinearYard ?? 0, units)
  return perArea.times(fabric.height).times(Dec(1).plus(Dec(fabric.fullnessPercent).dividedBy(100)))
}

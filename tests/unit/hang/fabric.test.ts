import { describe, expect, it } from 'vitest'
import { fabricWeightPerArea, fabricWeightPerLength } from '../../../shared/hang/fabric.js'

describe('soft goods by their fabric', () => {
  it('when velour is sold at 25 oz per linear yard of 54 in goods, then it weighs 0.1157 lb/ft²', () => {
    // The trade's conversion (1 oz per linear yard of 54 in goods = 36/54 oz/yd²), as the handbook derives it.
    expect(fabricWeightPerArea(25, 'imperial').toDecimalPlaces(4).toNumber()).toBe(0.1157)
  })

  it('when a 40 ft x 20 ft drop of 25 oz velour hangs at 100 % fullness, then the fabric weighs about 185.2 lb', () => {
    // Worked check from the team handbook (TRADE.md, "Velour by area (derived)"): about 185.2 lb, fabric only.
    const perFoot = fabricWeightPerLength({ gradeOzPerLinearYard: 25, height: 20, fullnessPercent: 100 }, 'imperial')
    expect(perFoot.times(40).toDecimalPlaces(1).toNumber()).toBe(185.2)
  })

  it('when the same fabric is described in metric, then it is the same weight converted by the NIST SP 811 factors', () => {
    // 25 oz goods: (25 / 216) lb/ft² x 0.45359237 kg/lb / 0.09290304 m²/ft² = 0.565096 kg/m²
    expect(fabricWeightPerArea(25, 'metric').toDecimalPlaces(6).toNumber()).toBe(0.565096)
    const metres = 40 * 0.3048
    const perMetre = fabricWeightPerLength(
      { gradeOzPerLinearYard: 25, height: 20 * 0.3048, fullnessPercent: 100 },
      'metric',
    )
    expect(perMetre.times(metres).dividedBy(0.45359237).toDecimalPlaces(1).toNumber()).toBe(185.2)
  })

  it('when the weight per area is given instead of a grade, then it is used as given; no fullness means flat', () => {
    expect(fabricWeightPerLength({ weightPerArea: 0.2, height: 10, fullnessPercent: 0 }, 'imperial').toNumber()).toBe(2)
    expect(fabricWeightPerLength({ weightPerArea: 0.2, height: 10, fullnessPercent: 50 }, 'imperial').toNumber()).toBe(
      3,
    )
  })
})

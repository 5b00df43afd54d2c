/**
 * The heaviest calculations the schemas accept, for `npm run bench` and the work-budget tests: every count at
 * its limit, figures at the edges of their ranges, positions with as many digits as a double carries (so the
 * engine's exact sums fall back to decimals), and brick stocks the plan search cannot finish.
 */
import { COUNT_RANGES } from '../../shared/schemas/ranges.js'
import { figureRange } from '../../shared/schemas/quantity.js'
import type { UnitSystem } from '../../shared/units/index.js'

/** A small fixed-seed generator: the same worst case on every run. */
function numbers(seed: number) {
  let state = seed >>> 0
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0
    return state / 2 ** 32
  }
}

const sixPlaces = (value: number) => Math.round(value * 1e6) / 1e6

/** Brick types with awkward six-decimal weights and thicknesses, every one in the largest stock allowed. */
export function awkwardBricks(units: UnitSystem) {
  const weight = figureRange('brickWeight', units)
  const thickness = figureRange('brickThickness', units)
  const next = numbers(7)
  return Array.from({ length: COUNT_RANGES.brickTypes.max }, (_, k) => ({
    name: `brick ${k + 1}`,
    weight: sixPlaces(weight.max / 25 + next() * (weight.max / 10)),
    thickness: sixPlaces(thickness.max / 20 + next() * (thickness.max / 10)),
    available: COUNT_RANGES.bricks.max,
  }))
}

/** An item at a point or along a span. */
type Item =
  { label: string; weight: number; at: number } | { label: string; weightPerLength: number; from: number; to: number }

/** The most lift lines, evenly along the longest batten. */
function longestBatten(units: UnitSystem) {
  const length = figureRange('battenLength', units).max
  const lines = COUNT_RANGES.pickPoints.max
  const pickPoints = Array.from({ length: lines }, (_, k) => (k * length) / (lines - 1))
  pickPoints[lines - 1] = length
  return { length, pickPoints, pipeSize: 'nps-1-1/2-sch80' }
}

/**
 * The most items, weighing `total` together, with figures as long as a double carries. Spreads that cross every
 * line cost the engine most (each span carries a piece of each), so most items are such spreads; every tenth is
 * a point load.
 */
function manyItems(length: number, total: number) {
  const next = numbers(11)
  const raw = Array.from({ length: COUNT_RANGES.items.max }, (_, k): Item => {
    if (k % 10 === 9) return { label: `fixture ${k}`, weight: next(), at: next() * length }
    const from = next() * length * 0.05
    const to = length - next() * length * 0.05
    return { label: `run ${k}`, weightPerLength: next(), from, to }
  })
  const rawTotal = raw.reduce(
    (sum, item) => sum + ('weight' in item ? item.weight : item.weightPerLength * (item.to - item.from)),
    0,
  )
  const scale = total / rawTotal
  return raw.map((item) =>
    'weight' in item
      ? { ...item, weight: item.weight * scale }
      : { ...item, weightPerLength: item.weightPerLength * scale },
  )
}

/**
 * The worst case known: the most lift lines and items with long-digit figures, the pipe's stress and deflection,
 * every check, and a requirement within the arbor's capacity that the awkward bricks cannot meet, so the brick
 * plan and the shortfall's relaxed plan each spend their whole work limit.
 */
export function worstCalculation(units: UnitSystem = 'imperial') {
  const batten = longestBatten(units)
  const capacity = figureRange('arborCapacity', units).max
  // Sch 80 pipe, 3.63 lb/ft (ASME B36.10M), converted: the batten's own share of the requirement.
  const pipe = units === 'imperial' ? 3.63 : 5.402
  const items = manyItems(batten.length, capacity * 0.9137 - pipe * batten.length)
  return {
    units,
    kind: 'counterweight-single',
    batten,
    items,
    arbor: { emptyWeight: 0, capacity, stackLength: figureRange('arborStackLength', units).max },
    bricks: awkwardBricks(units),
    liftLine: {
      weightPerLength: figureRange('liftLineWeightPerLength', units).max,
      breakingStrength: figureRange('ratedLoad', units).min,
      designFactor: 8,
    },
    tolerance: 0,
    ratedLoad: figureRange('ratedLoad', units).min,
    trims: { in: 0, out: figureRange('travel', units).max },
    ropeLockHolding: 0,
  }
}

/** The heaviest hang accepted: the most items, each at the heaviest weight, double purchase. */
export function heaviestCalculation(units: UnitSystem = 'imperial') {
  const worst = worstCalculation(units)
  const batten = longestBatten(units)
  const itemWeight = figureRange('itemWeight', units).max
  return {
    ...worst,
    kind: 'counterweight-double',
    items: Array.from({ length: COUNT_RANGES.items.max }, (_, k) => ({
      weight: itemWeight,
      at: (k * batten.length) / COUNT_RANGES.items.max,
    })),
    hardwareWeight: itemWeight,
  }
}

import fc from 'fast-check'
import type { FloatLoads } from './float-beam.js'

export const twoPlaces = (min: number, max: number) =>
  fc.integer({ min: Math.round(min * 100), max: Math.round(max * 100) }).map((n) => n / 100)

/** A batten with 2 to 8 lines, overhangs, point loads and spread loads, on two-decimal positions. */
export const battenLoads: fc.Arbitrary<FloatLoads> = fc
  .tuple(
    twoPlaces(8, 60),
    fc.integer({ min: 2, max: 8 }),
    fc.double({ min: 0, max: 0.2, noNaN: true }),
    fc.double({ min: 0, max: 0.2, noNaN: true }),
  )
  .chain(([length, lines, startFraction, endFraction]) => {
    const first = Math.round(length * startFraction * 100) / 100
    const last = Math.round(length * (1 - endFraction) * 100) / 100
    const pickPoints = Array.from(
      { length: lines },
      (_, k) => Math.round((first + ((last - first) * k) / (lines - 1)) * 100) / 100,
    )
    const position = twoPlaces(0, length).map((x) => Math.min(x, length))
    return fc.record({
      length: fc.constant(length),
      pickPoints: fc.constant([...new Set(pickPoints)]),
      points: fc.array(fc.record({ at: position, weight: twoPlaces(0, 500) }), { maxLength: 12 }),
      spreads: fc.array(
        fc
          .tuple(position, position, twoPlaces(0, 30))
          .filter(([a, b]) => a !== b)
          .map(([a, b, w]) => ({ from: Math.min(a, b), to: Math.max(a, b), weightPerLength: w })),
        { maxLength: 4 },
      ),
    })
  })
  .map((loads) => ({ ...loads, pickPoints: [...loads.pickPoints] }))
  .filter((loads) => loads.pickPoints.length >= 2)

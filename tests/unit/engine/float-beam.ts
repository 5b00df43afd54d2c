import { lusolve } from 'mathjs'

export interface FloatLoads {
  length: number
  pickPoints: number[]
  points: Array<{ at: number; weight: number }>
  spreads: Array<{ from: number; to: number; weightPerLength: number }>
}

/**
 * An independent solve in floating point: the batten as a free beam with unknown line reactions and
 * rigid-body terms C1 + C2·x (Macaulay's method over the whole length); deflection zero at every
 * line, plus vertical and moment equilibrium, solved with mathjs lusolve.
 */
export function floatReactions(loads: FloatLoads): number[] {
  return floatBeam(loads).reactions
}

/**
 * The same solve, with the deflected shape as EI·y (up positive, zero at every line) from the rigid-body terms:
 * y(x) = Σ R·<x − xj>³/6 + C1 + C2·x − the loads' own terms.
 */
export function floatBeam(loads: FloatLoads): { reactions: number[]; shape: (x: number) => number } {
  const xs = loads.pickPoints
  const n = xs.length
  const ramp = (x: number, a: number, power: number) => (x > a ? (x - a) ** power : 0)
  const loadShape = (x: number) => {
    let value = 0
    for (const p of loads.points) value -= (p.weight * ramp(x, p.at, 3)) / 6
    for (const s of loads.spreads) value -= (s.weightPerLength * (ramp(x, s.from, 4) - ramp(x, s.to, 4))) / 24
    return value
  }
  const matrix: number[][] = []
  const rhs: number[] = []
  xs.forEach((x) => {
    matrix.push([...xs.map((xj) => ramp(x, xj, 3) / 6), 1, x])
    rhs.push(-loadShape(x))
  })
  const weight =
    loads.points.reduce((s, p) => s + p.weight, 0) +
    loads.spreads.reduce((s, d) => s + d.weightPerLength * (d.to - d.from), 0)
  const moment =
    loads.points.reduce((s, p) => s + p.weight * p.at, 0) +
    loads.spreads.reduce((s, d) => s + (d.weightPerLength * (d.to ** 2 - d.from ** 2)) / 2, 0)
  matrix.push([...xs.map(() => 1), 0, 0])
  rhs.push(weight)
  matrix.push([...xs, 0, 0])
  rhs.push(moment)
  const solution = (lusolve(matrix, rhs) as number[][]).map((row) => row[0]!)
  const reactions = solution.slice(0, n)
  const [c1, c2] = [solution[n]!, solution[n + 1]!]
  const shape = (x: number) =>
    xs.reduce((y, xj, j) => y + (reactions[j]! * ramp(x, xj, 3)) / 6, c1 + c2 * x + loadShape(x))
  return { reactions, shape }
}

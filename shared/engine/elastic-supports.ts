import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'

const ZERO = Dec(0)

/**
 * Line loads of a continuous beam whose lines are springs, from the loads the same beam gives on rigid lines.
 *
 * Superposition: the real state is the beam on rigid lines (reactions R) plus the unloaded beam pushed by extra
 * forces at the lines only. With the beam's stiffness K (Euler-Bernoulli beam elements between lines; a vertical
 * displacement w, upward, and a rotation at each line; the overhangs carry no stiffness) and the springs
 * D = diag(k), a line's load is -k·w, so (K + D)·u = [-R at each w, 0 at each rotation] and the loads are -D·w.
 * K's rows sum to zero (its rigid-body modes), so the loads still sum to the total; as k grows the loads tend
 * to R. With one or two lines the beam is statically determinate and stretching changes nothing.
 *
 * @param supports line positions (length units), increasing
 * @param rigid loads on rigid lines (weight units), one per line
 * @param springs each line's stiffness k = EA / length (weight per length unit), all above zero
 * @param flexuralRigidity the batten's EI (weight · length unit²)
 * @example
 * // two spans of 10 under 1 per length, EI 1000, k 1: 6.375, 7.25, 6.375 (see the unit test's derivation)
 * solveElasticSupports([0, 10, 20].map(Dec), [3.75, 12.5, 3.75].map(Dec), [1, 1, 1].map(Dec), Dec(1000))
 */
export function solveElasticSupports(
  supports: readonly Decimal[],
  rigid: readonly Decimal[],
  springs: readonly Decimal[],
  flexuralRigidity: Decimal,
): Decimal[] {
  const n = supports.length
  if (n <= 2) return [...rigid]
  const size = 2 * n
  const matrix = Array.from({ length: size }, () => new Array<Decimal>(size).fill(ZERO))
  const add = (row: number, column: number, value: Decimal) =>
    (matrix[row]![column] = matrix[row]![column]!.plus(value))
  for (let i = 0; i + 1 < n; i++) {
    const length = supports[i + 1]!.minus(supports[i]!)
    const c = flexuralRigidity.div(length.pow(3))
    const [l, l2] = [length, length.pow(2)]
    const element = [
      [12, l.times(6), -12, l.times(6)],
      [l.times(6), l2.times(4), l.times(-6), l2.times(2)],
      [-12, l.times(-6), 12, l.times(-6)],
      [l.times(6), l2.times(2), l.times(-6), l2.times(4)],
    ]
    const dofs = [2 * i, 2 * i + 1, 2 * i + 2, 2 * i + 3]
    element.forEach((row, a) => row.forEach((value, b) => add(dofs[a]!, dofs[b]!, Dec(value).times(c))))
  }
  springs.forEach((k, i) => add(2 * i, 2 * i, k))
  const rhs = new Array<Decimal>(size).fill(ZERO)
  rigid.forEach((load, i) => (rhs[2 * i] = load.neg()))
  const u = solveDense(matrix, rhs)
  return springs.map((k, i) => k.times(u[2 * i]!).neg())
}

/** Gaussian elimination with partial pivoting (the matrix is small: at most twice the most lines). */
function solveDense(matrix: Decimal[][], rhs: Decimal[]): Decimal[] {
  const size = rhs.length
  for (let col = 0; col < size; col++) {
    let pivot = col
    for (let row = col + 1; row < size; row++) if (matrix[row]![col]!.abs().gt(matrix[pivot]![col]!.abs())) pivot = row
    if (matrix[pivot]![col]!.isZero()) throw new Error('The batten on stretching lines has no unique solution')
    ;[matrix[col], matrix[pivot]] = [matrix[pivot]!, matrix[col]!]
    ;[rhs[col], rhs[pivot]] = [rhs[pivot]!, rhs[col]!]
    const head = matrix[col]!
    for (let row = col + 1; row < size; row++) {
      const line = matrix[row]!
      if (line[col]!.isZero()) continue
      const factor = line[col]!.div(head[col]!)
      for (let k = col; k < size; k++) line[k] = line[k]!.minus(factor.times(head[k]!))
      rhs[row] = rhs[row]!.minus(factor.times(rhs[col]!))
    }
  }
  const x = new Array<Decimal>(size).fill(ZERO)
  for (let row = size - 1; row >= 0; row--) {
    let sum = rhs[row]!
    for (let k = row + 1; k < size; k++) sum = sum.minus(matrix[row]![k]!.times(x[k]!))
    x[row] = sum.div(matrix[row]![row]!)
  }
  return x
}

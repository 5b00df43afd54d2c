import type { BattenModel } from './batten-model.js'
import { floatOf } from './decimal-float.js'
import { regionMoments, type RegionMoments } from './region-sums.js'

/**
 * The tension-only search run in floating point, to choose which lines hold before one exact solve confirms it.
 *
 * Every line of the batten cuts it into regions whose load moments the rigid model already holds. A beam on some
 * of the lines only needs, per stretch between two holding lines, the first four load moments about one end: the
 * sum of the regions and the loads at released lines in it, shifted to that end. So each trial costs a few dozen
 * float operations instead of sorting every item into regions again. The answer is a guess: the caller solves the
 * chosen lines exactly and keeps the result only when it meets the exact search's own end condition.
 */

/** Σ P·xᵏ plus ∫ w·xᵏ dx over a piece of the batten, k = 0..3, about x = 0. */
type Moments = [number, number, number, number]

/** The rigid model's loads as pieces in batten order, each with its moments about x = 0. */
export interface FloatBatten {
  lines: number[]
  /** pieces[0] the start overhang; then, for each line k, its direct load (2k + 1) and the span after it (2k + 2). */
  pieces: Moments[]
}

const BINOMIAL = [[1], [1, 1], [1, 2, 1], [1, 3, 3, 1]]

/** Moments about x = 0 of loads whose moments about `origin` (u = sense·(x − origin)) are given. */
function fromLocal(local: RegionMoments, origin: number, sense: 1 | -1): Moments {
  const m = [local.m0, local.m1, local.m2, local.m3].map((value, i) => floatOf(value) * sense ** i)
  // x = origin + sense·u: xᵏ = Σ C(k, i) originᵏ⁻ⁱ (sense·u)ⁱ.
  return BINOMIAL.map((row) =>
    row.reduce((sum, c, i) => sum + c * origin ** (row.length - 1 - i) * m[i]!, 0),
  ) as Moments
}

/** Moments about `at`, u = sense·(x − at), of loads whose moments about x = 0 are given. */
function toLocal(global: Moments, at: number, sense: 1 | -1): Moments {
  return BINOMIAL.map(
    (row, k) => sense ** k * row.reduce((sum, c, i) => sum + c * (-at) ** (k - i) * global[i]!, 0),
  ) as Moments
}

const add = (a: Moments, b: Moments): Moments => [a[0] + b[0], a[1] + b[1], a[2] + b[2], a[3] + b[3]]

/**
 * The rigid model's pieces as floats.
 *
 * @example
 * floatBatten(buildBattenModel(loads)).pieces.length // 2 × lines + 1
 */
export function floatBatten(model: BattenModel): FloatBatten {
  const lines = model.supports.map(floatOf)
  const last = lines.length - 1
  const pieces: Moments[] = [fromLocal(regionMoments(model.startOverhang), lines[0]!, -1)]
  lines.forEach((x, k) => {
    const direct = floatOf(model.direct[k]!)
    pieces.push([direct, direct * x, direct * x * x, direct * x * x * x])
    pieces.push(
      k < last ? fromLocal(regionMoments(model.spans[k]!), x, 1) : fromLocal(regionMoments(model.endOverhang), x, 1),
    )
  })
  return { lines, pieces }
}

/** The pieces from index `from` up to (not including) `to`, summed. */
function sum(batten: FloatBatten, from: number, to: number): Moments {
  let total: Moments = [0, 0, 0, 0]
  for (let i = from; i < to; i++) total = add(total, batten.pieces[i]!)
  return total
}

/** A float beam on the held lines: loads per line of the batten, and what the drop at a released line needs. */
interface FloatBeam {
  loads: number[]
  held: number[]
  supportMoments: number[]
}

/** The continuous beam on the held lines (three-moment equation, as the exact solve), in floats. */
function solveFloat(batten: FloatBatten, held: number[]): FloatBeam {
  const n = held.length
  const xs = held.map((k) => batten.lines[k]!)
  // The direct load of held line k is piece 2k + 1; what lies between held lines a and b is pieces 2a + 2 .. 2b.
  const start = toLocal(sum(batten, 0, 2 * held[0]! + 1), xs[0]!, -1)
  const end = toLocal(sum(batten, 2 * held[n - 1]! + 2, batten.pieces.length), xs[n - 1]!, 1)
  const spans = held.slice(1).map((k, i) => toLocal(sum(batten, 2 * held[i]! + 2, 2 * k + 1), xs[i]!, 1))
  const lengths = xs.slice(1).map((x, i) => x - xs[i]!)
  const moments = new Array<number>(n).fill(0)
  moments[0] = -start[1]
  moments[n - 1] = -end[1]
  const terms = spans.map((m, i) => {
    const L = lengths[i]!
    return { right: (L * L * m[1] - m[3]) / L, left: (2 * L * L * m[1] - 3 * L * m[2] + m[3]) / L }
  })
  const unknowns = n - 2
  const diagonal: number[] = []
  const rhs: number[] = []
  for (let k = 1; k <= unknowns; k++) {
    let value = -(terms[k - 1]!.right + terms[k]!.left)
    if (k === 1) value -= moments[0]! * lengths[0]!
    if (k === unknowns) value -= moments[n - 1]! * lengths[k]!
    diagonal.push(2 * (lengths[k - 1]! + lengths[k]!))
    rhs.push(value)
  }
  for (let i = 1; i < unknowns; i++) {
    const factor = lengths[i]! / diagonal[i - 1]!
    diagonal[i] = diagonal[i]! - factor * lengths[i]!
    rhs[i] = rhs[i]! - factor * rhs[i - 1]!
  }
  for (let i = unknowns - 1; i >= 0; i--) {
    const next = i + 1 < unknowns ? lengths[i + 1]! * moments[i + 2]! : 0
    moments[i + 1] = (rhs[i]! - next) / diagonal[i]!
  }
  const loads = new Array<number>(batten.lines.length).fill(0)
  held.forEach((k) => (loads[k] = batten.pieces[2 * k + 1]![0]))
  loads[held[0]!]! += start[0]
  loads[held[n - 1]!]! += end[0]
  spans.forEach((m, i) => {
    const L = lengths[i]!
    const left = (moments[i + 1]! - moments[i]! + m[0] * L - m[1]) / L
    loads[held[i]!]! += left
    loads[held[i + 1]!]! += m[0] - left
  })
  return { loads, held, supportMoments: moments }
}

/**
 * EI times the drop of the batten at released line j below its line's level (positive: it sinks), from the same
 * beam theory as the exact `battenDropAt`: in a span, the end moments' and the loads' simple-span deflections; beyond
 * an end line, the end slope times the distance plus the overhang bending as a cantilever.
 */
function dropAt(batten: FloatBatten, beam: FloatBeam, j: number): number {
  const { held, supportMoments: M } = beam
  const x = batten.lines[j]!
  const n = held.length
  // The loads between two positions as pieces: up to and including line j's own load, and from after it.
  const through = 2 * j + 2
  if (j < held[0]!) return overhangDrop(batten, beam, j, 0)
  if (j > held[n - 1]!) return overhangDrop(batten, beam, j, n - 1)
  const i = held.findIndex((k) => k > j) - 1
  const [a, b] = [held[i]!, held[i + 1]!]
  const [xa, xb] = [batten.lines[a]!, batten.lines[b]!]
  const L = xb - xa
  const u = x - xa
  const left = toLocal(sum(batten, 2 * a + 2, through), xa, 1)
  const right = toLocal(sum(batten, through, 2 * b + 1), xb, -1)
  const linear = (u * (L * L - u * u)) / (6 * L)
  const ends = M[i]! * ((u * (L - u)) / 2 - linear) + M[i + 1]! * linear
  const fromLeft = ((L - u) / (6 * L)) * ((2 * L * u - u * u) * left[1] - left[3])
  const fromRight = (u / (6 * L)) * ((L * L - u * u) * right[1] - right[3])
  return ends + fromLeft + fromRight
}

/** Drop at a released line beyond the first (end = 0) or last (end = n − 1) held line. */
function overhangDrop(batten: FloatBatten, beam: FloatBeam, j: number, end: number): number {
  const { held, supportMoments: M } = beam
  const n = held.length
  const atStart = end === 0
  const line = held[end]!
  const xl = batten.lines[line]!
  const a = Math.abs(batten.lines[j]! - xl)
  // Loads between the end line and line j (j's own included), and those beyond line j, about the end line, outward.
  const near = atStart
    ? toLocal(sum(batten, 2 * j + 1, 2 * line + 1), xl, -1)
    : toLocal(sum(batten, 2 * line + 2, 2 * j + 2), xl, 1)
  const far = atStart
    ? toLocal(sum(batten, 0, 2 * j + 1), xl, -1)
    : toLocal(sum(batten, 2 * j + 2, batten.pieces.length), xl, 1)
  const cantilever = (3 * a * near[2] - near[3]) / 6 + ((a * a) / 6) * (3 * far[1] - a * far[0])
  // The slope of the neighbouring span at the end line, rising outward where the span sags.
  const k = atStart ? 0 : n - 2
  const [xa, xb] = [batten.lines[held[k]!]!, batten.lines[held[k + 1]!]!]
  const L = xb - xa
  const m = toLocal(sum(batten, 2 * held[k]! + 2, 2 * held[k + 1]! + 1), xa, 1)
  const slope = atStart
    ? (M[0]! * L) / 3 + (M[1]! * L) / 6 + (2 * L * L * m[1] - 3 * L * m[2] + m[3]) / L / 6
    : (M[n - 2]! * L) / 6 + (M[n - 1]! * L) / 3 + (L * L * m[1] - m[3]) / L / 6
  return cantilever - slope * a
}

/**
 * The lines that hold, found by the same active-set search as the exact solve but in floats, or undefined when the
 * floats cannot tell (the batten tips, or the search does not settle): the caller then runs the exact search.
 *
 * @example
 * chooseHeldLines(floatBatten(rigidModel), rigidLoads.map(Number)) // e.g. [0, 1, 4, 5, 6]
 */
export function chooseHeldLines(batten: FloatBatten, rigid: readonly number[]): number[] | undefined {
  const n = rigid.length
  const total = rigid.reduce((s, load) => s + load, 0)
  const span = n + 1
  const xs = batten.lines
  const reach = Math.max(1, Math.abs(xs[n - 1]! - xs[0]!), ...xs.map(Math.abs))
  // Much coarser than the exact search's noise: a float this close to zero is left to the exact solve.
  const loadNoise = Math.abs(total) * 1e-9
  const dropNoise = Math.abs(total) * reach ** 3 * span * 1e-9
  const feasible = (loads: number[], held: number[]) => held.every((k) => loads[k]! >= -loadNoise)
  let held = rigid.flatMap((load, k) => (load > 0 ? [k] : []))
  let current = held.length >= 2 ? solveFloat(batten, held) : undefined
  while (current && !feasible(current.loads, held)) {
    const pulling = held.filter((k) => current!.loads[k]! > 0)
    held = pulling
    current = pulling.length >= 2 ? solveFloat(batten, pulling) : undefined
  }
  if (!current) return undefined
  for (let round = 0; round < 64 * n; round++) {
    held = held.filter((k) => current!.loads[k]! > loadNoise)
    if (held.length < 2) return undefined
    if (held.length < current.held.length) current = solveFloat(batten, held)
    let sinking: { line: number; drop: number } | undefined
    for (let j = 0; j < n; j++) {
      if (held.includes(j)) continue
      const drop = dropAt(batten, current, j)
      if (drop > dropNoise && (!sinking || drop > sinking.drop)) sinking = { line: j, drop }
    }
    if (!sinking) return held
    let trial = [...held, sinking.line].sort((a, b) => a - b)
    let loadsNow = current.loads
    for (let step = 0; step <= n; step++) {
      const next = solveFloat(batten, trial)
      if (feasible(next.loads, trial)) {
        current = next
        held = trial
        break
      }
      const ratio = trial.reduce((smallest, k) => {
        const to = next.loads[k]!
        if (!(to < 0)) return smallest
        return Math.min(smallest, loadsNow[k]! / (loadsNow[k]! - to))
      }, 1)
      loadsNow = loadsNow.map((load, k) => load + (next.loads[k]! - load) * ratio)
      trial = trial.filter((k) => loadsNow[k]! > loadNoise)
      if (trial.length < 2) return undefined
      if (step === n) return undefined
    }
  }
  return undefined
}

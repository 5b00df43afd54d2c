import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { buildBattenModel, type BattenLoads, type BattenModel } from './batten-model.js'
import { battenDropAt } from './batten-drop.js'
import { solveContinuousBeam, type BeamSolution } from './continuous-beam.js'
import { heldModel } from './held-model.js'
import { chooseHeldLines, floatBatten } from './held-lines-float.js'
import { floatOf } from './decimal-float.js'

/** The batten on tension-only lines: a load per line (zero where slack), and whether it hangs level. */
export interface TensionOnlySolution {
  loads: Decimal[]
  /** Indices of the lines carrying no load. */
  slack: number[]
  /** False when fewer than two lines hold or the load's centre falls outside the lines: the batten tips. */
  stable: boolean
  /** The beam on the holding lines, for the moment, stress and deflection checks (present when stable). */
  held?: { model: BattenModel; solution: BeamSolution }
  /** Beam solves the search took (for the bench and the tests). */
  solves: number
}

const ZERO = Dec(0)

/**
 * Solves the batten on lift lines that can pull but never push, given the rigid solution's loads.
 *
 * The method is a primal active-set method on the line loads (the bounded least-squares scheme of Lawson and
 * Hanson, with equilibrium as equality constraints). The true loads minimise the batten's complementary energy
 * ½∫M²/EI over all loads ≥ 0 in equilibrium with the items: a strictly convex problem, since two different sets of
 * loads in equilibrium give different moment diagrams. For a set of holding lines the minimum is the continuous
 * beam on those lines alone; the multiplier of a released line's bound is how far the batten there sinks below the
 * line. Each round either moves to the beam on the current lines (when its loads are all ≥ 0) and re-engages the
 * line that sinks most, or steps part way toward it until a line's load reaches zero and releases that line.
 * Every full step strictly lowers the energy, so no set of holding lines comes back; there are finitely many sets,
 * so the search ends. In practice it takes two or three beam solves. When no loads ≥ 0 balance the items (the
 * centre of load outside the lines) or one line is left holding, the batten tips.
 *
 * @example
 * // lines at 0, 10, 20 with 320 at 5: the line at 20 goes slack and the others carry 160 each
 * solveTensionOnly(loads, [Dec(130), Dec(220), Dec(-30)]).loads.map(String) // ['160', '160', '0']
 */
export function solveTensionOnly(
  loads: BattenLoads,
  rigid: readonly Decimal[],
  rigidModel?: BattenModel,
): TensionOnlySolution {
  const n = rigid.length
  const total = rigid.reduce((sum, load) => sum.plus(load), ZERO)
  const span = Dec(loads.length).abs().plus(1)
  // Below these the decimal solve's last digits are noise, not a load or a sinking batten.
  const loadNoise = total.abs().times('1e-24')
  const dropNoise = total.abs().times(span.pow(3)).times('1e-24')
  let solves = 0
  const solve = (held: number[]) => {
    solves++
    const beam = heldBeam(loads, held, rigidModel)
    const full = new Array<Decimal>(n).fill(ZERO)
    beam.solution.reactions.forEach((load, k) => (full[held[k]!] = load))
    return { beam, full }
  }
  const feasible = (loadsNow: Decimal[], held: number[]) => held.every((k) => !loadsNow[k]!.lt(loadNoise.neg()))
  // The same search in floats on the rigid model's regions usually names the holding lines; one exact solve on
  // them is kept only when it meets this search's own end condition below (every load above the noise, no
  // released line sinking), so the answer is the one the exact search settles on.
  const guess = rigidModel && chooseHeldLines(floatBatten(rigidModel), rigid.map(floatOf))
  if (guess) {
    const exact = solve(guess)
    const holds = guess.every((k) => exact.full[k]!.gt(loadNoise))
    if (holds && mostSinking(exact.beam, loads.pickPoints, guess, dropNoise) === undefined)
      return settled(exact.full, exact.beam, solves)
  }
  // Warm start: release the lines that push, again on the beam that is left, until none does (each pass drops a
  // line, so at most n passes); else the two end lines, which balance any load whose centre lies between them.
  let held = rigid.flatMap((load, k) => (load.gt(0) ? [k] : []))
  let current = held.length >= 2 ? solve(held) : undefined
  while (current && !feasible(current.full, held)) {
    const pulling = held.filter((k) => current!.full[k]!.gt(0))
    held = pulling
    current = pulling.length >= 2 ? solve(pulling) : undefined
  }
  if (!current) {
    held = [0, n - 1]
    current = solve(held)
    if (!feasible(current.full, held)) return tipped(n, total, current.full, solves)
  }
  for (let round = 0; round < 64 * n; round++) {
    held = held.filter((k) => current!.full[k]!.gt(loadNoise))
    if (held.length < 2) return tipped(n, total, current.full, solves)
    // A line whose load came out zero is released: the beam on the others carries the same loads.
    if (held.length < current.beam.model.supports.length) current = solve(held)
    const sinking = mostSinking(current.beam, loads.pickPoints, held, dropNoise)
    if (sinking === undefined) return settled(current.full, current.beam, solves)
    let trial = [...held, sinking].sort((a, b) => a - b)
    let loadsNow = current.full
    for (;;) {
      const next = solve(trial)
      if (feasible(next.full, trial)) {
        current = next
        held = trial
        break
      }
      // Step toward the new beam's loads until the first held load reaches zero, and release that line.
      const step = trial.reduce((smallest, k) => {
        const to = next.full[k]!
        if (!to.lt(0)) return smallest
        const ratio = loadsNow[k]!.div(loadsNow[k]!.minus(to))
        return ratio.lt(smallest) ? ratio : smallest
      }, Dec(1))
      loadsNow = loadsNow.map((load, k) => load.plus(next.full[k]!.minus(load).times(step)))
      trial = trial.filter((k) => loadsNow[k]!.gt(loadNoise))
      if (trial.length < 2) return tipped(n, total, loadsNow, solves)
    }
  }
  throw new Error('The tension-only search did not settle; the active-set method guarantees it does')
}

/** The beam on the given lines only; hardware at a released line still hangs on the batten there. */
function heldBeam(loads: BattenLoads, held: number[], rigidModel?: BattenModel) {
  if (rigidModel) {
    const model = heldModel(loads, held, rigidModel)
    return { model, solution: solveContinuousBeam(model) }
  }
  const isHeld = new Set(held)
  const released = loads.pickPoints.filter((_, k) => !isHeld.has(k))
  const hardware = loads.atEachLine === undefined ? [] : released.map((at) => ({ at, weight: loads.atEachLine! }))
  const model = buildBattenModel({
    ...loads,
    pickPoints: held.map((k) => loads.pickPoints[k]!),
    points: hardware.length ? [...loads.points, ...hardware] : loads.points,
  })
  return { model, solution: solveContinuousBeam(model) }
}

/** The released line where the batten sinks furthest below its line, if any does. */
function mostSinking(
  beam: { model: BattenModel; solution: BeamSolution },
  pickPoints: readonly number[],
  held: number[],
  noise: Decimal,
): number | undefined {
  const isHeld = new Set(held)
  let best: { line: number; drop: Decimal } | undefined
  pickPoints.forEach((x, line) => {
    if (isHeld.has(line)) return
    const drop = battenDropAt(beam.model, beam.solution, Dec(x))
    if (drop.gt(noise) && (!best || drop.gt(best.drop))) best = { line, drop }
  })
  return best?.line
}

function settled(loads: Decimal[], held: TensionOnlySolution['held'], solves: number): TensionOnlySolution {
  const clean = loads.map((load) => (load.gt(0) ? load : ZERO))
  const slack = clean.flatMap((load, k) => (load.isZero() ? [k] : []))
  return { loads: clean, slack, stable: true, held, solves }
}

/** The batten swings about the line nearest the load's centre, which then carries it all. */
function tipped(n: number, total: Decimal, last: Decimal[], solves: number): TensionOnlySolution {
  let pivot = 0
  last.forEach((load, k) => {
    if (load.gt(last[pivot]!)) pivot = k
  })
  const loads = new Array<Decimal>(n).fill(ZERO)
  loads[pivot] = total
  return { loads, slack: loads.flatMap((load, k) => (load.isZero() ? [k] : [])), stable: false, solves }
}

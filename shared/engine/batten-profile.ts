import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { CalculationInput } from '../schemas/calculation.js'
import { buildBattenModel, type BattenLoads } from './batten-model.js'
import { solveContinuousBeam } from './continuous-beam.js'
import { resolvePipe } from './pipe-properties.js'
import { deflectionConverter } from './structural-units.js'
import { solveTensionOnly } from './tension-only.js'

/** One place along the batten: its bending moment (sagging positive) and, when the pipe is known, its drop. */
export interface BattenProfileSample {
  /** Position from the batten's one end, in the input's length unit. */
  at: number
  /** Bending moment in weight·length (lb·ft or kg·m); negative is hogging (over a line). */
  moment: number
  /** Downward deflection in in or mm (negative lifts); absent without a pipe or with one line. */
  drop?: number
}

/** The bending moment and deflected shape sampled along the whole batten, for drawing. */
export interface BattenProfile {
  length: number
  samples: BattenProfileSample[]
  /** True when `drop` is given at every sample. */
  hasShape: boolean
  /** Positions of the lines the batten hangs from: every line, or only those still pulling when some go slack. */
  heldLines: number[]
}

/** A downward load as the singularity functions see it: a point, or a uniform stretch. */
type Load = { kind: 'point'; at: number; weight: number } | { kind: 'spread'; from: number; to: number; w: number }

const positive = (value: number) => (value > 0 ? value : 0)

/**
 * Samples the moment and the deflected shape along the batten, in floating point: a picture of the engine's
 * answer, never a figure to act on (the engine states those exactly). The line loads come from the engine's own
 * continuous-beam solution; between the lines M(x) and EI·y(x) follow from statics with Macaulay's brackets
 * (each load's term starts where it acts), and the shape is pinned to zero at the end lines; the lines between
 * land on zero because the solution already satisfies them. Samples fall evenly along the batten, plus every
 * line and point load (where the moment has its corners). When a line goes slack the batten hangs from the
 * others alone (the engine's tension-only solution): the curves follow that beam, so they agree with the line
 * loads drawn above them. A batten that tips has no such state; it keeps the rigid curves, as the engine does.
 *
 * @example
 * // a simple span of 10 under 1 per length: 0.125wL² = 12.5 at mid-span (AISC beam diagram, case 1)
 * battenProfile({ units: 'imperial', kind: 'spot-line', batten: { length: 10, weightPerLength: 1,
 *   pickPoints: [0, 10] }, items: [] }).samples.find((s) => s.at === 5)?.moment // 12.5
 */
export function battenProfile(input: CalculationInput, sampleCount = 160): BattenProfile {
  const { batten, units } = input
  const length = batten.length
  const loads = collectLoads(input)
  const { lines, reactions } = holdingLines(loads, {
    length,
    pickPoints: batten.pickPoints,
    points: loads.flatMap((l) => (l.kind === 'point' ? [{ at: l.at, weight: l.weight }] : [])),
    spreads: loads.flatMap((l) => (l.kind === 'spread' ? [{ from: l.from, to: l.to, weightPerLength: l.w }] : [])),
  })
  const moment = (x: number) => sumTerms(x, lines, reactions, loads, 1)
  const places = samplePlaces(length, batten.pickPoints, loads, sampleCount)
  const pipe = resolvePipe(batten, units)
  const toDrop = pipe && lines.length >= 2 ? dropScale(pipe.elasticModulus, pipe.momentOfInertia, units) : undefined
  const heldLines = [...lines]
  if (!toDrop) return { length, samples: places.map((at) => ({ at, moment: moment(at) })), hasShape: false, heldLines }
  // EI·y upward, from the double integral; a straight line through the end lines takes out the two constants.
  const rise = (x: number) => sumTerms(x, lines, reactions, loads, 3)
  const [first, last] = [lines[0]!, lines[lines.length - 1]!]
  const [riseFirst, riseLast] = [rise(first), rise(last)]
  const chord = (x: number) => riseFirst + ((riseLast - riseFirst) * (x - first)) / (last - first)
  const samples = places.map((at) => ({ at, moment: moment(at), drop: -toDrop * (rise(at) - chord(at)) }))
  return { length, samples, hasShape: true, heldLines }
}

/**
 * The lines that hold the batten and what each carries: the continuous beam on every line, or, when one would
 * push (a slack line), the beam on the lines the tension-only solution keeps.
 */
function holdingLines(loads: Load[], beam: BattenLoads): { lines: number[]; reactions: number[] } {
  const rigid = solveContinuousBeam(buildBattenModel(beam)).reactions
  const anyLoad = loads.some((l) => (l.kind === 'point' ? l.weight > 0 : l.w > 0 && l.to > l.from))
  const slack = rigid.length >= 2 && anyLoad && rigid.some((load) => load.lte(0))
  const held = slack ? solveTensionOnly(beam, rigid).held : undefined
  if (!held) return { lines: [...beam.pickPoints], reactions: rigid.map((r) => r.toNumber()) }
  return {
    lines: held.model.supports.map((at) => at.toNumber()),
    reactions: held.solution.reactions.map((r) => r.toNumber()),
  }
}

/** Every downward load on the batten as the engine places it: its own weight, hardware at each line, the items. */
function collectLoads(input: CalculationInput): Load[] {
  const { batten, units } = input
  const loads: Load[] = []
  const pipe = resolvePipe(batten, units)
  const own = batten.weightPerLength ?? pipe?.weightPerLength?.toNumber() ?? 0
  if (own > 0) loads.push({ kind: 'spread', from: 0, to: batten.length, w: own })
  const hardware = input.hardwareWeight ?? 0
  if (hardware > 0)
    for (const at of batten.pickPoints) loads.push({ kind: 'point', at, weight: hardware / batten.pickPoints.length })
  for (const item of input.items) {
    if (item.at !== undefined && item.weight !== undefined)
      loads.push({ kind: 'point', at: item.at, weight: item.weight })
    else if (item.weightPerLength !== undefined)
      loads.push({ kind: 'spread', from: item.from ?? 0, to: item.to ?? batten.length, w: item.weightPerLength })
  }
  return loads
}

/**
 * order 1: the moment at x; order 3: EI times the upward deflection, without its two constants. A line pushes up
 * R·<x−s>ⁿ/n!, a point load down P·<x−a>ⁿ/n!, a stretch down w·(<x−a>ⁿ⁺¹ − <x−b>ⁿ⁺¹)/(n+1)!.
 */
function sumTerms(x: number, lines: readonly number[], reactions: number[], loads: Load[], order: 1 | 3): number {
  const f = order === 1 ? 1 : 6
  const g = order === 1 ? 2 : 24
  let sum = 0
  lines.forEach((s, k) => (sum += (reactions[k]! * positive(x - s) ** order) / f))
  for (const load of loads) {
    if (load.kind === 'point') sum -= (load.weight * positive(x - load.at) ** order) / f
    else sum -= (load.w * (positive(x - load.from) ** (order + 1) - positive(x - load.to) ** (order + 1))) / g
  }
  return sum
}

function samplePlaces(length: number, lines: readonly number[], loads: Load[], count: number): number[] {
  const places = new Set<number>(lines)
  for (let k = 0; k <= count; k++) places.add((length * k) / count)
  for (const load of loads) if (load.kind === 'point') places.add(load.at)
  return [...places].filter((x) => x >= 0 && x <= length).sort((a, b) => a - b)
}

/** In or mm of drop per unit of EI·y in the input's units, worked out once. */
function dropScale(elasticModulus: Decimal, momentOfInertia: Decimal, units: CalculationInput['units']): number {
  return deflectionConverter(elasticModulus, momentOfInertia, units)(Dec(1)).toNumber()
}

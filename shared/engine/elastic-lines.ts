import { Dec, STANDARD_GRAVITY, toSI, type UnitSystem } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import type { BattenModel } from './batten-model.js'
import type { BeamSolution } from './continuous-beam.js'
import { solveElasticSupports } from './elastic-supports.js'
import type { PipeProperties } from './pipe-properties.js'
import { ENTERED_STIFFNESS_BASIS, ROPE_STIFFNESS_BASIS, ropeAxialStiffness } from './ropes.js'

/** What the lineset says about its lift lines' stretch. */
export interface LineStretchInput {
  /** Each line's length from its head block, in pick point order (ft or m). */
  lengths?: number[]
  /** Axial stiffness EA of one line (lb or kg of force); wins over `rope`. */
  axialStiffness?: number
  /** A key of the rope table. */
  rope?: string
}

/** The loads with stretching lines, beside the rigid ones. */
export interface ElasticLines {
  /** One per line, zero on a slack line. */
  loads: Decimal[]
  /** Each line's spring stiffness EA / length (weight per length unit). */
  stiffness: Decimal[]
  /** Where EA came from, in words. */
  basis: string
}

/** Why no elastic solution was worked out though line lengths were given. */
export type ElasticUnavailable = { reason: string }

/**
 * The batten's loads on lift lines that stretch (k = EA / length per line), on the lines that hold: where a line
 * is slack (tension only) its load stays zero and the others are solved as springs on the beam without it. A
 * stretching line only ever moves load toward the stiffer (shorter) lines, which the caution reports; a line
 * that would then push is left to the tension-only figures (its elastic load is reported as worked out).
 * Undefined when the lineset gives no line lengths; a reason when it gives them but something else is missing.
 *
 * @example
 * elasticLines({ lengths: [60, 70, 80], rope: '7x19-galvanized-1/4' }, held, [0, 1, 2], pipe, 'imperial')
 */
export function elasticLines(
  stretch: LineStretchInput | undefined,
  held: { model: BattenModel; solution: BeamSolution } | undefined,
  heldLines: readonly number[],
  pipe: PipeProperties | undefined,
  units: UnitSystem,
): ElasticLines | ElasticUnavailable | undefined {
  if (!stretch?.lengths) return undefined
  const entered = stretch.axialStiffness === undefined ? undefined : Dec(stretch.axialStiffness)
  const fromTable = stretch.rope === undefined ? undefined : ropeAxialStiffness(stretch.rope, units)
  const axial = entered ?? fromTable
  if (!axial) return { reason: 'no rope size or rope stiffness (EA) is given' }
  if (!pipe)
    return { reason: "the batten's stiffness is not known (choose a pipe size or enter its moment of inertia)" }
  if (!held) return { reason: 'the batten cannot hang level' }
  const n = stretch.lengths.length
  const stiffness = stretch.lengths.map((length) => axial.div(length))
  const heldLoads = solveElasticSupports(
    held.model.supports,
    held.solution.reactions,
    heldLines.map((k) => stiffness[k]!),
    flexuralRigidity(pipe, units),
  )
  const loads = new Array<Decimal>(n).fill(Dec(0))
  heldLines.forEach((line, k) => (loads[line] = heldLoads[k]!))
  return { loads, stiffness, basis: entered ? ENTERED_STIFFNESS_BASIS : ROPE_STIFFNESS_BASIS }
}

/** EI in the engine's units: lb·ft² or kg·m² (weight · length²), from E in ksi / MPa and I in in⁴ / mm⁴. */
function flexuralRigidity(pipe: PipeProperties, units: UnitSystem): Decimal {
  const newtonSquareMetres = toSI(pipe.elasticModulus, 'stress', units).times(
    toSI(pipe.momentOfInertia, 'momentOfInertia', units),
  )
  const newtons = toSI(1, 'weight', units).times(STANDARD_GRAVITY)
  return newtonSquareMetres.div(newtons.times(toSI(1, 'length', units).pow(2)))
}

import { findPipeSize } from '../engine/pipes.js'
import type { BrickType } from '../schemas/brick-type.js'
import type { CalculationInput } from '../schemas/calculation.js'
import { isCounterweightKind, isHempKind, type Lineset } from '../schemas/lineset.js'
import type { Venue } from '../schemas/venue.js'
import { figureRange } from '../schemas/quantity.js'

/** One thing hung on a batten: at a point, or spread over a stretch (the whole batten when from/to are left out). */
export type HangItem =
  { label: string; weight: number; at: number } | { label: string; weightPerLength: number; from?: number; to?: number }

const present = <T>(value: T | null | undefined): value is T => value !== null && value !== undefined

/**
 * The engine input for a lineset as the API gives it (figures in the venue's units), the venue's
 * policies, its brick stock and what hangs on the batten. Client (live figures as someone types) and
 * server (the figures stored with a hang) build it here, so both compute from the same input.
 *
 * @example
 * linesetCalculationInput({ lineset, venue, brickTypes, items: [{ label: 'Drop', weight: 120, at: 20 }] }).kind
 * // 'counterweight-single'
 */
export function linesetCalculationInput(options: {
  lineset: Lineset
  venue: Pick<Venue, 'unitSystem' | 'balanceTolerance' | 'ropeLockHolding' | 'wireRopeDesignFactor'>
  brickTypes: ReadonlyArray<Pick<BrickType, 'name' | 'unitWeight' | 'thickness' | 'quantityOwned'>>
  items: ReadonlyArray<HangItem>
}): CalculationInput {
  const { lineset, venue } = options
  const counterweight = isCounterweightKind(lineset.kind)
  const knownPipe = findPipeSize(lineset.pipeSize) ? lineset.pipeSize : undefined
  const handEnteredPipe =
    !knownPipe && present(lineset.pipeMomentOfInertia) && present(lineset.pipeSectionModulus)
      ? { momentOfInertia: lineset.pipeMomentOfInertia, sectionModulus: lineset.pipeSectionModulus }
      : undefined
  const input: CalculationInput = {
    units: venue.unitSystem,
    kind: lineset.kind,
    batten: {
      length: lineset.battenLength,
      weightPerLength: lineset.pipeWeightPerLength,
      pickPoints: [...lineset.pickPoints],
      ...(knownPipe ? { pipeSize: knownPipe } : {}),
      ...(handEnteredPipe ? { pipe: handEnteredPipe } : {}),
    },
    items: options.items.map((item) => ({ ...item })),
    tolerance: venue.balanceTolerance,
    ropeLockHolding: venue.ropeLockHolding,
    liftLine: {
      designFactor: venue.wireRopeDesignFactor,
      ...(present(lineset.liftLineWeightPerLength) ? { weightPerLength: lineset.liftLineWeightPerLength } : {}),
      ...(present(lineset.liftLineBreakingStrength) ? { breakingStrength: lineset.liftLineBreakingStrength } : {}),
      // Lengths only count when there is one per line; then the rope's stiffness says how far each stretches.
      ...(lineset.liftLineLengths?.length === lineset.pickPoints.length
        ? { lengths: [...lineset.liftLineLengths] }
        : {}),
      ...(present(lineset.liftLineRope) ? { rope: lineset.liftLineRope } : {}),
      ...(present(lineset.liftLineAxialStiffness) ? { axialStiffness: lineset.liftLineAxialStiffness } : {}),
    },
  }
  if (present(lineset.ratedLoad)) input.ratedLoad = lineset.ratedLoad
  if (present(lineset.travel)) input.travel = lineset.travel
  if (counterweight && present(lineset.arborEmptyWeight) && present(lineset.arborCapacity)) {
    input.arbor = {
      emptyWeight: lineset.arborEmptyWeight,
      capacity: lineset.arborCapacity,
      // Without a stack length the stack is not what limits the plan (the longest stack there is); the capacity still does.
      stackLength: lineset.arborStackLength ?? figureRange('arborStackLength', venue.unitSystem).max,
    }
    if (present(lineset.pipeWeight)) input.pipeWeightAboard = lineset.pipeWeight
    // Until venue-wide stock lands, every brick the house owns counts as free.
    input.bricks = options.brickTypes.map((brick) => ({
      name: brick.name,
      weight: brick.unitWeight,
      thickness: brick.thickness,
      available: brick.quantityOwned,
    }))
  }
  if (isHempKind(lineset.kind) && present(lineset.sandbagWeight)) input.sandbag = { weight: lineset.sandbagWeight }
  if (lineset.kind === 'motorized' && present(lineset.hoistRatedCapacity))
    input.hoist = { ratedCapacity: lineset.hoistRatedCapacity }
  return input
}

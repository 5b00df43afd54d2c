import type { BrickTypeInput } from '../../../shared/schemas/brick-type.js'
import type { LinesetInput, LinesetKind } from '../../../shared/schemas/lineset.js'

// An invented house, the Fennwick Street Playhouse: a 48 ft batten on five lift lines 10 ft apart
// with 4 ft overhangs, 1-1/2 in schedule 40 pipe, 1/4 in lift lines. Every figure below is demo data.
const FIVE_LINES = [4, 14, 24, 34, 44]
const SIX_LINES = [2, 11, 20, 29, 38, 47]

const PIPE = {
  pipeSize: 'nps-1-1/2-sch40',
  pipeWeightPerLength: 2.72,
  pipeMomentOfInertia: 0.31,
  pipeSectionModulus: 0.326,
}
const LIFT_LINE = { liftLineWeightPerLength: 0.11, liftLineBreakingStrength: 7000 }
// The hemp sets' fibre rope, about a 3/8 in manila line (weight and breaking strength from memory, demo data):
// far lighter and weaker than the wire rope, so a hemp set never reads a wire rope's working load limit.
export const HEMP_LINE = { liftLineWeightPerLength: 0.04, liftLineBreakingStrength: 1400 }

interface Plan {
  name: string
  kind?: LinesetKind
  status?: LinesetInput['status']
  lines?: number[]
  notes?: string
  /** Each lift line's length to its head block at the working trim, for a set whose lines are worked out stretching. */
  lengths?: number[]
}

// The cyclorama electric's lines at its working trim: 54 ft up to the loft blocks, then across to the head block
// 3 ft past the batten's stage-right end, so the line at 2 ft is 45 ft longer than the one at 47 ft.
const CYC_LINE_LENGTHS = SIX_LINES.map((at) => 54 + (52 - at))

const HOUSE: Plan[] = [
  { name: 'Main valance' },
  { name: 'House curtain', notes: 'Guillotine; tied to the grand-drape stop at the deck' },
  { name: 'Border 1' },
  { name: 'Legs 1' },
  { name: 'First electric', kind: 'counterweight-double', lines: SIX_LINES },
  { name: 'Spare' },
  { name: 'Border 2' },
  { name: 'Legs 2' },
  { name: 'Show drop A' },
  { name: 'Second electric', kind: 'counterweight-double', lines: SIX_LINES },
  { name: 'Spare', status: 'needs-inspection', notes: 'Rope lock sticks at the top of travel; inspection booked' },
  { name: 'Border 3' },
  { name: 'Legs 3' },
  { name: 'Mid-stage traveller', kind: 'counterweight-double', lines: SIX_LINES },
  { name: 'Show drop B' },
  { name: 'Spare' },
  { name: 'Third electric', kind: 'counterweight-double', lines: SIX_LINES },
  { name: 'Border 4' },
  { name: 'Legs 4' },
  { name: 'Scrim' },
  { name: 'Spare' },
  { name: 'Show drop C' },
  { name: 'Border 5' },
  { name: 'Legs 5' },
  { name: 'Fourth electric', kind: 'counterweight-double', lines: SIX_LINES },
  { name: 'Spare', status: 'out-of-service', notes: 'Lift line at 24 ft frayed; do not use until re-roped' },
  { name: 'Upstage border' },
  { name: 'Black-out traveller' },
  { name: 'Cyclorama electric', kind: 'counterweight-double', lines: SIX_LINES, lengths: CYC_LINE_LENGTHS },
  { name: 'Sky cloth' },
  { name: 'Upstage spare' },
  { name: 'Bounce drop' },
  { name: 'Lighting truss', kind: 'motorized' },
  { name: 'Sound cluster', kind: 'motorized' },
  { name: 'Orchestra shell ceiling', kind: 'motorized' },
  { name: 'Downstage hemp pipe', kind: 'hemp-multi', lines: [4, 24, 44] },
  { name: 'Upstage hemp pipe', kind: 'hemp-multi', lines: [4, 24, 44], notes: 'Sandbag on the purchase line' },
  { name: 'Chandelier line', kind: 'hemp-single', lines: [0.5] },
  { name: 'Spot line stage left', kind: 'spot-line', lines: [0.5] },
  { name: 'Spot line centre', kind: 'spot-line', lines: [0.5] },
  { name: 'Spot line stage right', kind: 'spot-line', lines: [0.5], status: 'out-of-service' },
  { name: 'Far upstage spare' },
]

function figuresFor(plan: Plan, index: number): Omit<LinesetInput, 'number' | 'name' | 'status'> {
  const kind = plan.kind ?? 'counterweight-single'
  const distanceFromPlasterLine = Math.round((1.5 + index * 0.75) * 100) / 100
  const stretching = plan.lengths ? { liftLineLengths: plan.lengths, liftLineRope: '7x19-galvanized-1/4' } : {}
  const base = {
    kind,
    distanceFromPlasterLine,
    notes: plan.notes ?? '',
    unitSystem: 'imperial' as const,
    ...LIFT_LINE,
    ...stretching,
  }
  switch (kind) {
    case 'counterweight-single':
      return {
        ...base,
        ...PIPE,
        battenLength: 48,
        pickPoints: plan.lines ?? FIVE_LINES,
        arborEmptyWeight: 90,
        arborCapacity: 1400,
        arborStackLength: 72,
        ratedLoad: 1200,
        // Pipe weight balances the empty batten: 48 ft x 2.72 lb/ft = 130.56 lb, less the 90 lb arbor frame.
        pipeWeight: 40,
        travel: 56,
      }
    case 'counterweight-double':
      return {
        ...base,
        ...PIPE,
        battenLength: 49,
        pickPoints: plan.lines ?? SIX_LINES,
        arborEmptyWeight: 110,
        arborCapacity: 3000,
        arborStackLength: 84,
        ratedLoad: 1400,
        // Twice the empty batten (2 x 49 ft x 2.72 lb/ft = 266.56 lb), less the 110 lb arbor frame.
        pipeWeight: 155,
        travel: 56,
      }
    case 'motorized':
      return {
        ...base,
        ...PIPE,
        battenLength: 40,
        pickPoints: [2, 14, 26, 38],
        ratedLoad: 2000,
        hoistRatedCapacity: 2000,
        hoistSpeed: 180,
        travel: 56,
      }
    case 'hemp-multi':
      return {
        ...base,
        ...PIPE,
        battenLength: 48,
        pickPoints: plan.lines ?? [4, 24, 44],
        ratedLoad: 250,
        sandbagWeight: plan.notes ? 60 : null,
        travel: 50,
        ...HEMP_LINE,
      }
    case 'hemp-single':
    case 'spot-line':
      return {
        ...base,
        // A spot line is rigged on wire rope; a single hemp line is the house's fibre rope.
        ...(kind === 'hemp-single' ? HEMP_LINE : {}),
        pipeSize: 'custom',
        pipeWeightPerLength: 0,
        battenLength: 1,
        pickPoints: plan.lines ?? [0.5],
        ratedLoad: kind === 'spot-line' ? 500 : 150,
        travel: 50,
      }
  }
}

/** Forty-two linesets of every kind, numbered from the plaster line upstage. */
export const DEMO_LINESETS: LinesetInput[] = HOUSE.map((plan, index) => ({
  number: index + 1,
  name: plan.name,
  status: plan.status ?? 'in-service',
  ...figuresFor(plan, index),
}))

export const DEMO_BRICK_TYPES: BrickTypeInput[] = [
  { name: 'Full steel brick', material: 'Steel', unitWeight: 19.5, thickness: 2, quantityOwned: 1400 },
  { name: 'Half steel brick', material: 'Steel', unitWeight: 9.75, thickness: 1, quantityOwned: 420 },
  { name: 'Lead trim brick', material: 'Lead', unitWeight: 5, thickness: 0.5, quantityOwned: 300 },
].map((brick) => ({ ...brick, unitSystem: 'imperial' }))

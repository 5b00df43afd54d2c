import type { Quantity } from '../units/systems.js'

/**
 * Every figure Loftledger accepts lies in a range a real venue could have. The ranges live here and nowhere
 * else: the lineset, brick type and venue forms, their routes and the calculation input are all built from
 * them, so a figure one of them accepts the others accept too. Ranges are physical, so they are written in
 * SI (kg, m, kg/m, m/s, m⁴, m³, Pa) and stated to people in the units they typed in (see `figureRange`).
 *
 * They are generous: each upper bound is well past anything a real house hangs, yet low enough that no
 * accepted figure can make a calculation run long or a figure print in exponent notation.
 */
export interface FigureRange {
  quantity: Quantity
  /** Smallest figure in SI; '0' means zero is allowed (then any other figure must survive the API's rounding). */
  min: string
  /** Largest figure in SI. */
  max: string
  /** At most this many decimals in the input's units (only where an exact search scales figures to integers). */
  places?: number
}

const range = (quantity: Quantity, min: string, max: string, places?: number): FigureRange =>
  places === undefined ? { quantity, min, max } : { quantity, min, max, places }

/** The named figure ranges, in SI. */
export const FIGURE_RANGES = {
  // The widest prosceniums are about 20 m and their battens run 25 to 30 m; 40 m leaves room for any house.
  battenLength: range('length', '0.01', '40'),
  // Along the batten: lift lines, items and spans (each is also held within the batten's own length).
  position: range('length', '0', '40'),
  // Deep stages with a rear stage run about 50 m from the plaster line.
  distanceFromPlasterLine: range('length', '0', '100'),
  // Batten travel and trim heights: the tallest fly towers have their grid about 40 m above the deck.
  travel: range('length', '0', '60'),
  // Schedule 80 pipe is 5.4 kg/m; heavy ladder and truss battens stay under 50 kg/m.
  pipeWeightPerLength: range('weightPerLength', '0', '200'),
  // 1/4 in aircraft cable is about 0.16 kg/m; the largest hoist ropes stay near 2 kg/m.
  liftLineWeightPerLength: range('weightPerLength', '0', '10'),
  // A drape, cable run or video wall along the batten: a 10 m tall LED wall is about 300 kg per metre.
  itemWeightPerLength: range('weightPerLength', '0', '2000'),
  // One thing hung, hardware, or what a hoist's counterweight offsets: no lineset carries 20 t.
  itemWeight: range('weight', '0', '20000'),
  // Rated loads, hoist capacities, breaking strengths and block ratings: the largest hoist wire ropes break
  // near 40 t.
  ratedLoad: range('weight', '1', '50000'),
  // Manual arbors carry up to about 2 t of bricks (double purchase); 5 t is past any of them.
  arborCapacity: range('weight', '1', '5000'),
  arborEmptyWeight: range('weight', '0', '2000'),
  // Pipe weight kept on the arbor: never more than an arbor holds.
  pipeWeightAboard: range('weight', '0', '5000'),
  // Sandbags are a few tens of kilograms; a hemp set's counterweight never approaches 1 t.
  sandbagWeight: range('weight', '0', '1000'),
  // Arbor stacks are 1 to 4 m tall; 10 m is past the tallest.
  arborStackLength: range('shortLength', '0.01', '10'),
  // Steel bricks are about 9 kg, lead ones up to about 25 kg; trim weights are a few hundred grams.
  // Six decimals keep the brick plan's exact search within whole numbers a double holds exactly.
  brickWeight: range('weight', '0.01', '100', 6),
  brickThickness: range('shortLength', '0.001', '0.5', 6),
  // Stage fabric: scrim is about 0.1 kg/m², heavy velour about 0.9 kg/m²; 20 kg/m² is past any soft goods.
  fabricWeightPerArea: range('weightPerArea', '0.001', '20'),
  // A drape's finished height: the tallest cycloramas and house curtains stay under 30 m.
  fabricHeight: range('length', '0.01', '60'),
  // A lift line from the batten up to its loft block and across to the head block: a short run is a metre or two,
  // the tallest towers and widest stages together stay under 120 m; 200 m is past any of them.
  liftLineLength: range('length', '0.1', '200'),
  // A lift line's axial stiffness EA (force per unit strain, stated as a weight): 1/8 in aircraft cable is about
  // 34,000 kg; a 40 mm hoist rope about 8,000,000 kg. Stiffer than 1e8 kg is no rope.
  ropeAxialStiffness: range('weight', '100', '1e8'),
  // Balance tolerance and rope lock holding: a lock holds about 23 kg; a tolerance is a few kilograms.
  tolerance: range('weight', '0', '100'),
  ropeLockHolding: range('weight', '0', '500'),
  // Theatre hoists run up to about 2 m/s; 5 m/s is past any of them.
  hoistSpeed: range('speed', '0.001', '5'),
  // Batten sections: 1-1/2 in Schedule 40 pipe has I = 1.29e-7 m⁴ and S = 5.3e-6 m³; a large truss is
  // about 1e-4 m⁴ and 1e-3 m³.
  momentOfInertia: range('momentOfInertia', '1e-10', '1e-2'),
  sectionModulus: range('sectionModulus', '1e-9', '1e-2'),
  // Structural metals: aluminium 69 GPa and steel 200 GPa; yield strengths from 35 MPa to high-strength steel.
  elasticModulus: range('stress', '1e9', '1e12'),
  yieldStrength: range('stress', '1e6', '5e9'),
} as const satisfies Record<string, FigureRange>

export type FigureName = keyof typeof FIGURE_RANGES

/** Whole-number ranges (no unit): counts, numbers and the like. */
export interface CountRange {
  min: number
  max: number
}

/** The named whole-number ranges. */
export const COUNT_RANGES = {
  // Lift lines about 1.5 m apart along the longest batten, and then some.
  pickPoints: { min: 1, max: 24 },
  // Items on one batten in one calculation: a full lighting pipe with its cable runs is about 100; 250 is one
  // every 16 cm along the longest batten. The engine's work grows with it (see DEVELOPERS.md, work limits).
  items: { min: 0, max: 250 },
  // Brick types a calculation may weigh at once.
  brickTypes: { min: 0, max: 20 },
  // Bricks of one type: the largest houses own a few thousand.
  bricks: { min: 0, max: 100_000 },
  linesetNumber: { min: 1, max: 9999 },
  // Units one hang entry stands for, or the revision a save was based on.
  entryQuantity: { min: 1, max: 250 },
  revision: { min: 1, max: 2_147_483_646 },
  // Optimistic-lock versions live in a PostgreSQL integer; one more must still fit (2³¹ − 1).
  version: { min: 0, max: 2_147_483_646 },
} as const satisfies Record<string, CountRange>

/**
 * Wire-rope design factor (breaking strength ÷ working load): 8 is common practice; below 1 a line would be
 * loaded past breaking, and no rule asks for more than 20.
 */
export const DESIGN_FACTOR_RANGE = { min: 1, max: 20 } as const

/**
 * The API reads figures back rounded to this many decimals (in the venue's units), so a non-zero figure must be
 * at least one step of it: anything smaller would read back as 0.
 */
export const API_DECIMALS = 6
export const SMALLEST_STEP = 10 ** -API_DECIMALS

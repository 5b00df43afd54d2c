import type { UnitSystem } from '../units/index.js'

/** How serious a finding is: worth knowing, worth a second look, or stop. */
export type CheckLevel = 'info' | 'caution' | 'danger'

/** One finding, in plain words naming the figures. */
export interface Check {
  code: string
  level: CheckLevel
  message: string
}

/** The load one lift line carries, in pick point order. */
export interface LineLoad {
  /** Position from the batten's one end. */
  at: number
  load: number
}

/**
 * The loads when lift lines can only pull: a line the rigid solution has pushing (zero load or below) goes slack
 * and the batten's weight moves onto the others. `stable` is false when the batten then cannot hang level (fewer
 * than two lines hold, or the load's centre lies beyond the lines): it tips, and the loads shown are the line it
 * swings about carrying everything.
 */
export interface TensionOnlyResult {
  lineLoads: LineLoad[]
  /** Indices (in pick point order) of the lines carrying no load. */
  slackLines: number[]
  stable: boolean
}

/**
 * The loads when the lift lines stretch (each a spring EA / length), on the lines that hold: present when the
 * lineset gives its lines' lengths and a rope stiffness, and the batten's stiffness is known.
 */
export interface ElasticLinesResult {
  lineLoads: LineLoad[]
  /** Each line's stiffness EA / length, in weight per `unitLabels.length`. */
  stiffness: Array<{ at: number; stiffness: number }>
  /** Largest difference from the rigid figure the crew reads (tension-only when a line is slack), in %. */
  largestDifference: number
  /** Where the stiffness figures come from. */
  basis: string
}

/** Unit labels for every figure in a result. */
export interface ResultUnitLabels {
  weight: string
  length: string
  shortLength: string
  moment: string
  stress: string
}

/** The weight the brick plan puts on the arbor. */
export interface BrickCount {
  name: string
  count: number
  weight: number
}

export interface CounterweightResult {
  /** 1 single purchase, 2 double purchase. */
  ratio: number
  /** Everything the lift lines carry (batten, hardware, items). */
  battenSide: number
  /** Brick weight the arbor needs beyond its empty weight and any pipe weight aboard. */
  required: number
  bricks: BrickCount[]
  loaded: number
  /** Stack length the planned bricks take (in / mm). */
  stackUsed: number
  /** Arbor frame + pipe weight aboard + planned bricks. */
  arborSide: number
  /** Signed, stated at the batten: positive when the batten side is heavier. */
  outOfBalance: number
}

export interface CalculationResult {
  units: UnitSystem
  kind: string
  /** The figures assist a qualified person; shown wherever the result is. */
  notice: string
  unitLabels: ResultUnitLabels
  battenWeight: number
  hardwareWeight: number
  itemsWeight: number
  totalLoad: number
  /** Loads with every line rigid (a line may come out pushing: negative). */
  lineLoads: LineLoad[]
  /** Present whenever a rigid line load is zero or below; moment, stress and deflection then follow it when stable. */
  tensionOnly?: TensionOnlyResult
  /** Present when the lines' lengths and stiffness are given: the loads with lines that stretch. */
  elasticLines?: ElasticLinesResult
  /** Working load limit of one lift line (breaking strength / design factor), when given. */
  lineWorkingLoadLimit?: number
  /** Largest bending moment along the batten; negative is hogging (over a line), positive sagging. */
  moment: { max: number; at: number }
  /** Bending stress at the largest moment, present when the pipe is known. */
  bending?: { stress: number; allowable: number; utilisation: number; basis: string }
  /** Deflections (in / mm), downward positive, present when the pipe is known and there are two lines or more. */
  deflection?: {
    spans: Array<{ from: number; to: number; max: number; at: number }>
    overhangs: Array<{ end: 'start' | 'end'; length: number; tip: number }>
  }
  counterweight?: CounterweightResult
  /** Travel between trims, the arbor's travel and the lift lines' balance shift. */
  travel?: { batten: number; arbor?: number; shift?: number }
  haul?: { load: number; sandbag: number; force: number }
  motor?: { ratedCapacity: number; load: number; counterweightAssist: number }
  checks: Check[]
}

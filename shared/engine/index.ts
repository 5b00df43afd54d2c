export { calculate, runCalculation } from './calculate.js'
export { BALANCE_CAUTIONS, FIGURES_DISCLAIMER } from './cautions.js'
export { PIPE_SIZES, PIPE_SIZE_KEYS, findPipeSize, pipeSection, type PipeSize, type PipeSection } from './pipes.js'
export { planBricks, type BrickPlan, type BrickStock } from './brick-plan.js'
export { travelShift, battenTravel, arborTravel } from './travel-shift.js'
export { purchaseRatio, balanceCounterweight } from './counterweight.js'
export { workingLoadLimit, DEFAULT_DESIGN_FACTOR } from './capacity-checks.js'
export {
  analyseBatten,
  ALLOWABLE_BENDING_BASIS,
  ALLOWABLE_BENDING_FACTOR,
  type BattenAnalysis,
} from './batten-analysis.js'
export { buildBattenModel, type BattenModel, type BattenLoads } from './batten-model.js'
export { solveContinuousBeam, type BeamSolution } from './continuous-beam.js'
export { formatFigure, formatQuantity } from './format.js'
export type { Check, CheckLevel } from './checks.js'
export { battenProfile, type BattenProfile, type BattenProfileSample } from './batten-profile.js'
export { travelBalance, type TravelBalancePoint } from './travel-balance.js'

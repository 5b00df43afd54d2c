import type { CalculationInput } from '../../shared/schemas/calculation.js'
import type { CalculationResult, LineLoad } from '../../shared/schemas/calculation-result.js'
import type { UnitSystem } from '../../shared/units/index.js'
import { showFigure } from './balanceFigures'

/**
 * What a tension-only analysis adds to a result once the engine gives it: the loads with slack lines taken out,
 * which lines (by index in pick point order) went slack, and whether the batten still hangs steady without them.
 */
export interface TensionOnlyFigures {
  lineLoads: ReadonlyArray<LineLoad | number>
  slackLines: readonly number[]
  stable: boolean
}

/** The drawing's own frame: a fixed view box the SVG scales to its width, so nothing is re-laid out as figures change. */
export const DIAGRAM = { width: 800, left: 48, right: 752, battenY: 104 } as const

/** One lift line as drawn: where, its load in words, and what is wrong with it, if anything. */
export interface DiagramLine {
  index: number
  at: number
  x: number
  load: number
  loadText: string
  atText: string
  /** 'slack' (zero or less, or found slack), 'over' (beyond its working load limit), or null. */
  problem: 'slack' | 'over' | null
  problemText: string
  /** Its load once the lines stretch (when the lineset gives their lengths and rope), and whether that is over the limit. */
  stretching: { load: number; text: string; over: boolean } | null
}

export interface DiagramItem {
  key: string
  label: string
  kind: 'point' | 'stretch'
  x: number
  x2: number
  text: string
}

/** The length the drawing spans: the input's batten, else the one given, else the farthest line. */
export function diagramLength(result: CalculationResult, input?: CalculationInput | null, battenLength?: number) {
  const farthest = Math.max(0, ...result.lineLoads.map((line) => line.at))
  return input?.batten.length ?? battenLength ?? (farthest || 1)
}

/** x in the view box for a position along the batten: to scale, end to end. */
export const scaleX = (length: number) => (at: number) =>
  DIAGRAM.left + ((DIAGRAM.right - DIAGRAM.left) * Math.min(Math.max(at, 0), length)) / length

const loadOf = (entry: LineLoad | number) => (typeof entry === 'number' ? entry : entry.load)

/**
 * The lines as drawn: loads from the tension-only figures when given (slack lines named there), else the result's.
 *
 * @example
 * diagramLines(result, x).map((l) => l.problem) // [null, null, 'slack']
 */
export function diagramLines(
  result: CalculationResult,
  x: (at: number) => number,
  tensionOnly?: TensionOnlyFigures | null,
): DiagramLine[] {
  const units = result.units
  const limit = result.lineWorkingLoadLimit
  return result.lineLoads.map((line, index) => {
    const load = tensionOnly ? loadOf(tensionOnly.lineLoads[index] ?? line.load) : line.load
    const slack = load <= 0 || !!tensionOnly?.slackLines.includes(index)
    const over = !slack && limit !== undefined && load > limit
    const problem = slack ? 'slack' : over ? 'over' : null
    const stretchLoad = result.elasticLines?.lineLoads[index]?.load
    const stretching =
      stretchLoad === undefined
        ? null
        : {
            load: stretchLoad,
            text: showFigure(stretchLoad, 'weight', units),
            over: limit !== undefined && stretchLoad > limit,
          }
    return {
      index,
      at: line.at,
      x: x(line.at),
      load,
      loadText: showFigure(load, 'weight', units),
      atText: showFigure(line.at, 'length', units),
      problem,
      problemText: slack ? 'Slack' : over ? 'Over limit' : '',
      stretching,
    }
  })
}

/** Every item of the input as drawn: points as markers, stretches as bands, with words for hover and print. */
export function diagramItems(input: CalculationInput, x: (at: number) => number, units: UnitSystem): DiagramItem[] {
  return input.items.flatMap((item, k): DiagramItem[] => {
    const label = item.label ?? `Item ${k + 1}`
    if (item.at !== undefined && item.weight !== undefined) {
      const text = `${label}: ${showFigure(item.weight, 'weight', units)} at ${showFigure(item.at, 'length', units)}`
      return [{ key: `p${k}`, label, kind: 'point', x: x(item.at), x2: x(item.at), text }]
    }
    if (item.weightPerLength === undefined) return []
    const from = item.from ?? 0
    const to = item.to ?? input.batten.length
    const text = `${label}: ${showFigure(item.weightPerLength, 'weightPerLength', units)} from ${showFigure(from, 'length', units)} to ${showFigure(to, 'length', units)}`
    return [{ key: `s${k}`, label, kind: 'stretch', x: x(from), x2: x(to), text }]
  })
}

/** The text alternative: what the picture says, load by load, dangers in words. */
export function diagramLabel(lines: DiagramLine[], length: number, units: UnitSystem, bendingBeyond: boolean) {
  const loads = lines
    .map(
      (l) =>
        `line ${l.index + 1} at ${l.atText}: ${l.loadText}${l.problem ? ` (${l.problemText.toLowerCase()})` : ''}` +
        (l.stretching
          ? `, ${l.stretching.text} with the lines stretching${l.stretching.over ? ' (over limit)' : ''}`
          : ''),
    )
    .join('; ')
  const bending = bendingBeyond ? ' The bending stress is beyond the allowable.' : ''
  return `Batten diagram: a ${showFigure(length, 'length', units)} batten on ${lines.length} lift ${lines.length === 1 ? 'line' : 'lines'}. Line loads: ${loads}.${bending}`
}

import type { LinesetInput, LinesetKind, LinesetStatus } from '../../shared/schemas/index.js'
import { isCounterweightKind, isHempKind, LINESET_FIGURE_QUANTITIES } from '../../shared/schemas/index.js'
import { roundTo, type UnitSystem } from '../../shared/units/index.js'
import type { ExactFigures } from './exactFigures'

/** The figures of a lineset and the quantity each is entered in. */
export const FIGURE_QUANTITIES = LINESET_FIGURE_QUANTITIES

export type FigureKey = keyof typeof FIGURE_QUANTITIES
const FIGURE_KEYS = Object.keys(FIGURE_QUANTITIES) as FigureKey[]

/** The form as typed: every figure is kept as the text the person entered until it is checked. */
export type LinesetDraft = {
  number: string
  name: string
  kind: LinesetKind
  status: LinesetStatus
  pipeSize: string
  pickPoints: string[]
  /** Each line's length from its head block, one per pick point (all blank when not known). */
  liftLineLengths: string[]
  /** A key of the rope table, or '' for none. */
  liftLineRope: string
  notes: string
} & Record<FigureKey, string>

export type DraftTextKey = Exclude<keyof LinesetDraft, 'pickPoints' | 'liftLineLengths' | 'kind' | 'status'>

const asText = (value: number | null | undefined) => (value === null || value === undefined ? '' : String(value))

export function emptyDraft(): LinesetDraft {
  const figures = Object.fromEntries(FIGURE_KEYS.map((key) => [key, ''])) as Record<FigureKey, string>
  return {
    ...figures,
    number: '',
    name: '',
    kind: 'counterweight-single',
    status: 'in-service',
    pipeSize: '',
    pickPoints: [''],
    liftLineLengths: [''],
    liftLineRope: '',
    notes: '',
  }
}

/** The draft for a saved lineset: figures rounded for the eye, their exact values remembered in `figures`. */
export function draftFrom(lineset: LinesetInput, figures: ExactFigures, system: UnitSystem): LinesetDraft {
  const show = (key: FigureKey | 'pickPoints', value: number | null | undefined) =>
    value === null || value === undefined
      ? ''
      : figures.show(value, key === 'pickPoints' ? 'length' : FIGURE_QUANTITIES[key], system)
  const texts = Object.fromEntries(FIGURE_KEYS.map((key) => [key, show(key, lineset[key])])) as Record<
    FigureKey,
    string
  >
  return {
    ...texts,
    number: asText(lineset.number),
    name: lineset.name,
    kind: lineset.kind,
    status: lineset.status,
    pipeSize: lineset.pipeSize,
    pickPoints: lineset.pickPoints.map((at) => show('pickPoints', at)),
    liftLineLengths: lineset.pickPoints.map((_, index) => show('pickPoints', lineset.liftLineLengths?.[index])),
    liftLineRope: lineset.liftLineRope ?? '',
    notes: lineset.notes ?? '',
  }
}

/** Blank text is "not entered": absent for a required figure (so the schema asks for it), null for an optional one. */
const required = (text: string) => (text.trim() === '' ? undefined : Number(text))

/** Fields each kind does not use; they are sent empty so a changed kind leaves nothing stale behind. */
function unusedFigures(kind: LinesetKind): FigureKey[] {
  const unused: FigureKey[] = []
  if (!isCounterweightKind(kind)) unused.push('arborEmptyWeight', 'arborCapacity', 'arborStackLength', 'pipeWeight')
  if (!isHempKind(kind)) unused.push('sandbagWeight')
  if (kind !== 'motorized') unused.push('hoistRatedCapacity', 'hoistSpeed')
  return unused
}

/** The request body the draft stands for; it is checked with the shared schema, never trusted. */
export function bodyFrom(draft: LinesetDraft, figures: ExactFigures, system: UnitSystem): Record<string, unknown> {
  const unused = new Set(unusedFigures(draft.kind))
  const figure = (key: FigureKey) => figures.read(draft[key], FIGURE_QUANTITIES[key], system)
  const texts = Object.fromEntries(
    FIGURE_KEYS.filter((key) => !['battenLength', 'pipeWeightPerLength'].includes(key)).map((key) => [
      key,
      unused.has(key) ? null : (figure(key) ?? null),
    ]),
  )
  return {
    ...texts,
    number: required(draft.number),
    name: draft.name,
    kind: draft.kind,
    status: draft.status,
    battenLength: figure('battenLength'),
    pipeSize: draft.pipeSize,
    pipeWeightPerLength: figure('pipeWeightPerLength'),
    pickPoints: draft.pickPoints.map((text) => figures.read(text, 'length', system)),
    // No lengths at all is "not known"; some but not all is a mistake the schema names.
    liftLineLengths: draft.liftLineLengths.every((text) => text.trim() === '')
      ? null
      : draft.liftLineLengths.map((text) => figures.read(text, 'length', system)),
    liftLineRope: draft.liftLineRope === '' ? null : draft.liftLineRope,
    notes: draft.notes,
    // The server refuses figures typed in units the venue has since left.
    unitSystem: system,
  }
}

/**
 * Lift line positions spread evenly: between the first and last line when both are set sensibly,
 * otherwise each line at the middle of an equal share of the batten.
 *
 * @example
 * spreadPickPoints(['', '', '', ''], 40) // ['5', '15', '25', '35']
 */
export function spreadPickPoints(points: readonly string[], battenLength: number): string[] {
  const count = points.length
  if (!(battenLength > 0) || count === 0) return [...points]
  const first = Number(points[0])
  const last = Number(points[count - 1])
  const keepEnds =
    count >= 2 && points[0]?.trim() && points[count - 1]?.trim() && first >= 0 && last > first && last <= battenLength
  if (keepEnds) {
    const step = (last - first) / (count - 1)
    return points.map((_, index) => String(roundTo(first + step * index, 2)))
  }
  const share = battenLength / count
  return points.map((_, index) => String(roundTo(share * (index + 0.5), 2)))
}

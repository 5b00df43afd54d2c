import { findPipeSize } from '../../shared/engine/pipes.js'
import type { CalculationInput } from '../../shared/schemas/calculation.js'
import type { HangRevision, Lineset } from '../../shared/schemas/index.js'
import { convert, type UnitSystem } from '../../shared/units/index.js'
import { showFigure } from './balanceFigures'

/** What the batten diagram of one saved revision is drawn from, and what its caption must say. */
export interface RevisionDrawing {
  /** The engine input saved with the revision, in its result's units; null draws the lines and loads alone. */
  input: CalculationInput | null
  /** The lineset's batten length now, in the result's units: the span when there is no input. */
  battenLength?: number
  note: string | null
}

export type LinesetBatten = Pick<Lineset, 'battenLength' | 'pickPoints' | 'pipeSize'>

const joined = (words: string[]) =>
  words.length < 2 ? words.join('') : `${words.slice(0, -1).join(', ')} and ${words[words.length - 1]}`

/** Which of the batten's figures the lineset holds differently now than when `input` was computed. */
function changedSince(input: CalculationInput, now: { length: number; pickPoints: number[]; pipeSize?: string }) {
  // Figures read back through a unit change may differ in their last places; a thousandth of the span is no change.
  const near = (a: number, b: number) => Math.abs(a - b) <= input.batten.length / 1000
  const picks = input.batten.pickPoints
  return [
    ...(near(input.batten.length, now.length) ? [] : ['batten length']),
    ...(picks.length === now.pickPoints.length && picks.every((at, k) => near(at, now.pickPoints[k]!))
      ? []
      : ['pick points']),
    ...((input.batten.pipeSize ?? undefined) === now.pipeSize ? [] : ['pipe']),
  ]
}

/**
 * A saved revision drawn from what it stored: its own engine input (items, batten, pipe and pick points as they
 * were), so the markers, bands and moment are the ones that were computed. When the lineset has changed since,
 * the note says so and what it was then; without a stored input, the note says only the lines are drawn.
 */
export function revisionDrawing(
  revision: HangRevision,
  lineset: LinesetBatten | null | undefined,
  venueUnits: UnitSystem,
): RevisionDrawing {
  const units = revision.result.units
  const length = (value: number) => convert(value, 'length', venueUnits, units).toNumber()
  const input = revision.input && revision.input.units === units ? revision.input : null
  const battenLength = lineset ? length(lineset.battenLength) : undefined
  if (!input)
    return {
      input,
      battenLength,
      note: `Revision ${revision.revision} kept no engine input that can still be read, so only its lift lines and their loads as saved are drawn, not its items or the moment along the batten.`,
    }
  if (!lineset) return { input, note: null }
  const now = {
    length: length(lineset.battenLength),
    pickPoints: lineset.pickPoints.map(length),
    pipeSize: findPipeSize(lineset.pipeSize) ? lineset.pipeSize : undefined,
  }
  const changed = changedSince(input, now)
  if (!changed.length) return { input, note: null }
  const lines = input.batten.pickPoints.map((at) => showFigure(at, 'length', units))
  const then = `a ${showFigure(input.batten.length, 'length', units)} batten on lines at ${joined(lines)}`
  const has = changed.length === 1 && changed[0] !== 'pick points' ? 'has' : 'have'
  return {
    input,
    note: `Drawn as revision ${revision.revision} was saved, with the lineset as it was then: ${then}. The lineset's ${joined(changed)} ${has} changed since.`,
  }
}

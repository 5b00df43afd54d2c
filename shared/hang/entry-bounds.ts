import type { ExpansionProblem, HangEntry } from './hang-items.js'

/** Every position an entry names, by its field (points by their index). */
function positionsOf(entry: HangEntry): Array<[string, number]> {
  const named: Array<[string, number | undefined]> = []
  if ('points' in entry) entry.points.forEach((at, index) => named.push([`points.${index}`, at]))
  if ('at' in entry) named.push(['at', entry.at])
  if ('from' in entry) named.push(['from', entry.from], ['to', entry.to])
  return named.filter((pair): pair is [string, number] => pair[1] !== undefined)
}

/**
 * Positions beyond the far end of a batten `battenLength` long (positions run from 0 at one end). The
 * schemas already refuse negative positions and reversed stretches; only the batten knows its length.
 *
 * @example
 * positionsBeyondBatten([{ label: 'Drop', category: 'other', weight: 10, at: 50 }], 48)
 * // [{ index: 0, field: 'at', message: 'Beyond the end of the batten (48 long)' }]
 */
export function positionsBeyondBatten(entries: readonly HangEntry[], battenLength: number): ExpansionProblem[] {
  return entries.flatMap((entry, index) =>
    positionsOf(entry)
      .filter(([, at]) => at > battenLength)
      .map(([field]) => ({ index, field, message: `Beyond the end of the batten (${battenLength} long)` })),
  )
}

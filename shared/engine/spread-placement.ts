import { Dec } from '../units/index.js'
import type { Decimal } from 'decimal.js'
import { place, type BattenFrame, type Place, type RegionDraft } from './batten-frame.js'

const ZERO = Dec(0)

/**
 * Places a spread load from `from` to `to` (0 ≤ from < to ≤ length). Each edge is converted once
 * and becomes one intensity step: in the region it falls in, or on its line, where the running
 * intensity carries it across (so a spread over many spans costs no decimal work in the middle
 * ones). Each region it covers also gets the piece for the float searches, in input order.
 * Returns where the edges fell.
 *
 * @example
 * const frame = battenFrame(20, [0, 10, 20])
 * placeSpread(frame, 5, 20, Dec(2), 2) // steps: +2 at u = 5 in span 0, −2 on line 2
 */
export function placeSpread(
  frame: BattenFrame,
  from: number,
  to: number,
  w: Decimal,
  wFloat: number,
): { start: Place; end: Place } {
  const start = place(frame, from)
  const end = place(frame, to)
  if (!w.isZero()) {
    addEdge(frame, start, w, true)
    addEdge(frame, end, w, false)
  }
  const { xs, spans } = frame
  const last = xs.length - 1
  const inside = (edge: Place, region: RegionDraft) => ('region' in edge && edge.region === region ? edge : undefined)
  const piece = (region: RegionDraft, u1: Place | undefined, u2: Place | undefined) =>
    region.spreads.push({
      u1: u1 && 'u' in u1 ? u1.u : ZERO,
      u2: u2 && 'u' in u2 ? u2.u : region.length,
      weightPerLength: w,
      float: {
        u1: u1 && 'u' in u1 ? u1.float : 0,
        u2: u2 && 'u' in u2 ? u2.float : region.lengthFloat,
        weightPerLength: wFloat,
      },
    })
  // In the start overhang u runs toward x = 0, so the far edge (to) is its u1 and from its u2.
  if (from < xs[0]!) piece(frame.start, inside(end, frame.start), start)
  if (to > xs[last]!) piece(frame.end, inside(start, frame.end), end)
  for (let k = 0; k < last; k++) {
    if (Math.min(to, xs[k + 1]!) > Math.max(from, xs[k]!))
      piece(spans[k]!, inside(start, spans[k]!), inside(end, spans[k]!))
  }
  return { start, end }
}

/** One edge: a step in its region (reversed in the start overhang, where u runs the other way), or on its line. */
function addEdge(frame: BattenFrame, edge: Place, w: Decimal, up: boolean): void {
  if ('line' in edge) frame.lineEdges[edge.line]!.push({ w, up })
  else edge.region.steps.push({ at: edge.u, float: edge.float, w, up: edge.region.outward ? !up : up })
}

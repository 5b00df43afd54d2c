import type { Decimal } from 'decimal.js'
import { buildBattenModel, type BattenLoads, type BattenModel } from './batten-model.js'

/**
 * The batten model on some of its lines only (the others released), the very model `buildBattenModel` gives for
 * those lines, made without sorting every load again.
 *
 * A region between two holding lines that were neighbours already, or an overhang beyond an end line that still
 * holds, has the same loads, origin and entering intensity as in the model on every line: it is taken from that
 * model as it is. Only the stretches across a released line are built afresh, from the loads that reach into them,
 * in their input order. Every spread that starts before the last such stretch ends is kept, so the intensity
 * entering a stretch is summed from the same edges in the same order as in a full build (a long decimal figure would
 * otherwise round differently); points elsewhere add nothing to it. Loads exactly at a holding line go straight into
 * it, as in the model on every line.
 *
 * @example
 * heldModel(loads, [0, 1, 3], buildBattenModel(loads)).spans.length // 2
 */
export function heldModel(loads: BattenLoads, held: readonly number[], every: BattenModel): BattenModel {
  const xs = loads.pickPoints
  const last = xs.length - 1
  const n = held.length
  const isHeld = new Set(held)
  // [from, to] of each stretch built afresh, by its place in the held model: -1 the start overhang, n - 1 the end.
  const stretches: Array<{ region: number; from: number; to: number }> = []
  if (held[0]! > 0) stretches.push({ region: -1, from: 0, to: xs[held[0]!]! })
  for (let i = 0; i + 1 < n; i++)
    if (held[i + 1]! > held[i]! + 1) stretches.push({ region: i, from: xs[held[i]!]!, to: xs[held[i + 1]!]! })
  if (held[n - 1]! < last) stretches.push({ region: n - 1, from: xs[held[n - 1]!]!, to: loads.length })
  // The batten's ends belong to their overhangs; a holding line's own point goes into the line.
  const inside = (at: number) =>
    stretches.some(
      ({ region, from, to }) => (region === -1 ? at >= from : at > from) && (region === n - 1 ? at <= to : at < to),
    )
  const end = stretches.reduce((far, s) => Math.max(far, s.to), -Infinity)
  const released = xs.filter((_, k) => !isHeld.has(k))
  const hardware = loads.atEachLine === undefined ? [] : released.map((at) => ({ at, weight: loads.atEachLine! }))
  const fresh = buildBattenModel({
    ...loads,
    pickPoints: held.map((k) => xs[k]!),
    points: [...loads.points, ...hardware].filter((point) => inside(point.at)),
    spreads: loads.spreads.filter((spread) => spread.from < end),
  })
  const rebuilt = new Set(stretches.map((s) => s.region))
  const spans = held.slice(1).map((k, i) => (rebuilt.has(i) ? fresh.spans[i]! : every.spans[k - 1]!))
  return {
    length: every.length,
    supports: held.map((k) => every.supports[k]!),
    direct: held.map((k) => every.direct[k]!),
    spans,
    startOverhang: rebuilt.has(-1) ? fresh.startOverhang : every.startOverhang,
    endOverhang: rebuilt.has(n - 1) ? fresh.endOverhang : every.endOverhang,
    itemsWeight: hardware.reduce((sum: Decimal, item) => sum.plus(item.weight), every.itemsWeight),
  }
}

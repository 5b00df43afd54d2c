import { describe, expect, it } from 'vitest'
import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import {
  buildBattenModel,
  type BattenLoads,
  type BattenModel,
  type Region,
} from '../../../shared/engine/batten-model.js'
import { heldModel } from '../../../shared/engine/held-model.js'
import { slackBattens } from './slack-arbitraries.js'

// Seeded: the same battens on every run.
const SEED = 130015

/** Everything a region holds, as text, so two models compare digit for digit. */
function regionText(region: Region) {
  const { sums } = region
  const rows = (columns: typeof sums.pointSums) =>
    Array.from({ length: columns.rows }, (_, i) => columns.row(i).map(String))
  return {
    length: String(region.length),
    points: region.points.map((p) => [String(p.u), String(p.weight), p.float.u, p.float.weight]),
    spreads: region.spreads.map((s) => [String(s.u1), String(s.u2), String(s.weightPerLength), s.float]),
    pointAt: sums.pointAt.map(String),
    pointSums: rows(sums.pointSums),
    stepAt: sums.stepAt.map(String),
    stepSums: rows(sums.stepSums),
  }
}

function modelText(model: BattenModel) {
  return {
    length: String(model.length),
    supports: model.supports.map(String),
    direct: model.direct.map(String),
    spans: model.spans.map(regionText),
    start: regionText(model.startOverhang),
    end: regionText(model.endOverhang),
  }
}

/** The model built from scratch on the held lines, hardware at each released line hanging there as a point. */
function freshHeld(loads: BattenLoads, held: number[]) {
  const released = loads.pickPoints.filter((_, k) => !held.includes(k))
  const hardware = loads.atEachLine === undefined ? [] : released.map((at) => ({ at, weight: loads.atEachLine! }))
  return buildBattenModel({
    ...loads,
    pickPoints: held.map((k) => loads.pickPoints[k]!),
    points: [...loads.points, ...hardware],
  })
}

// Subsets of two lines or more, by a mask over the lines.
const withHeldLines = slackBattens.chain((loads) =>
  fc
    .array(fc.boolean(), { minLength: loads.pickPoints.length, maxLength: loads.pickPoints.length })
    .map((mask) => mask.flatMap((keep, k) => (keep ? [k] : [])))
    .filter((held) => held.length >= 2)
    .map((held) => ({ loads, held })),
)

describe('the model on the holding lines, reusing the regions that did not change', () => {
  it('when random battens are held on random lines, then it is the fresh build digit for digit', () => {
    fc.assert(
      fc.property(withHeldLines, ({ loads, held }) => {
        expect(modelText(heldModel(loads, held, buildBattenModel(loads)))).toEqual(modelText(freshHeld(loads, held)))
      }),
      { seed: SEED, numRuns: 150 },
    )
  }, 60_000)

  it('when the batten weighs a long decimal per length and hardware hangs at every line, then it is still the fresh build', () => {
    fc.assert(
      fc.property(withHeldLines, ({ loads, held }) => {
        // A weight per length converted between units: every one of its 40 digits counts.
        const heavy = { ...loads, selfWeightPerLength: Dec(2.72).div(Dec('0.3048')), atEachLine: Dec(25).div(3) }
        expect(modelText(heldModel(heavy, held, buildBattenModel(heavy)))).toEqual(modelText(freshHeld(heavy, held)))
      }),
      { seed: SEED, numRuns: 100 },
    )
  }, 60_000)
})

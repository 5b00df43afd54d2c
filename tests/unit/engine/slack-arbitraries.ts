import fc from 'fast-check'
import { Dec } from '../../../shared/units/index.js'
import { buildBattenModel } from '../../../shared/engine/batten-model.js'
import { solveContinuousBeam } from '../../../shared/engine/continuous-beam.js'
import { battenLoads, twoPlaces } from './arbitraries.js'

/**
 * A batten (see `battenLoads`) with one to three heavy point loads added, kept when the rigid solution leaves
 * some line at zero load or pushing: the cases the tension-only solve is for.
 */
export const slackBattens = battenLoads
  .chain((loads) =>
    fc
      .array(
        fc.record({
          at: twoPlaces(0, loads.length).map((x) => Math.min(x, loads.length)),
          weight: twoPlaces(200, 2000),
        }),
        {
          minLength: 1,
          maxLength: 3,
        },
      )
      .map((heavy) => ({ ...loads, points: [...loads.points, ...heavy] })),
  )
  .filter((loads) => solveContinuousBeam(buildBattenModel(loads)).reactions.some((load) => load.lte(Dec(0))))

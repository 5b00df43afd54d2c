import { runCalculation } from '../../../shared/engine/calculate.js'
import type { CalculationInput } from '../../../shared/schemas/calculation.js'
import type { TransactionContext } from '../../context.js'
import { countArbor } from '../../modules/arbors/arbor.service.js'
import { listBrickStock } from '../../modules/brick-stock/brick-stock-list.js'
import { rows } from '../../modules/brick-stock/stock-sql.js'
import { lockOut } from '../../modules/lockouts/lockout.service.js'

/**
 * Loads each hung counterweight arbor of the demo with the engine's brick plan for its current hang, planned
 * against what is still in storage (lineset by lineset, as a crew would load them), and records it as a count
 * at the rail through the same service as the API, so the first start shows a balanced house and its stock.
 */
export async function seedDemoArbors(asDirector: TransactionContext) {
  const hung = await rows<{ linesetId: string; input: CalculationInput }>(
    asDirector,
    `SELECT DISTINCT ON (l.number) l.id AS "linesetId", h.calculation_input AS input
       FROM hangs h JOIN linesets l ON l.id = h.lineset_id
      WHERE l.venue_id = $1 AND l.kind LIKE 'counterweight-%'
      ORDER BY l.number, h.revision DESC`,
    [asDirector.actor.venueId],
  )
  for (const { linesetId, input } of hung) {
    const stock = new Map((await listBrickStock(asDirector)).map((line) => [line.name, line]))
    const bricks = (input.bricks ?? []).map((brick) => ({ ...brick, available: stock.get(brick.name)?.inStorage ?? 0 }))
    const outcome = runCalculation({ ...input, bricks })
    if (!outcome.ok) throw new Error(`The demo hang on lineset ${linesetId} does not calculate`)
    const plan = outcome.result.counterweight?.bricks ?? []
    await countArbor(asDirector, linesetId, {
      version: 0,
      bricks: plan
        .filter((brick) => brick.count > 0)
        .map((brick) => ({ brickTypeId: stock.get(brick.name)!.brickTypeId, count: brick.count })),
      note: 'Counted at the rail when the show was loaded in',
    })
  }
}

/** The demo's one lock-out: the spare whose rope lock sticks stays locked out until it is inspected. */
export async function seedDemoLockout(asDirector: TransactionContext, linesetsByNumber: ReadonlyMap<number, string>) {
  await lockOut(asDirector, linesetsByNumber.get(11)!, {
    reason: 'Rope lock sticks at the top of travel; inspection booked',
  })
}

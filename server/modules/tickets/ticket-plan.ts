import type { CalculationInput } from '../../../shared/schemas/calculation.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { TransactionContext } from '../../context.js'
import { apiFromStored, storedFromApi } from '../../db/quantities.js'
import { AppError } from '../../http/errors.js'
import { rows } from '../brick-stock/stock-sql.js'
import { dangersOf } from './ticket-dangers.js'

/** One brick type in a plan: what the arbor holds now, what it should hold after, and the signed change. */
export interface PlannedBrick {
  brickTypeId: string
  name: string
  before: number
  after: number
  change: number
}

export interface TicketPlan {
  bricks: PlannedBrick[]
  /** Signed, at the batten, in kg (SI string): positive when the batten side is heavier. */
  expectedOutOfBalance: string
}

interface StockRow {
  id: string
  name: string
  unitWeight: string
  thickness: string
  inStorage: number
  aboard: number
  retired: boolean
}

/**
 * Works out a change with the shared engine on the calculation thread: the saved revision's own input, with
 * the venue's brick types as they are now, each free to use as far as this arbor holds it already plus what
 * is in storage (never what is owned: bricks on other arbors or reserved are not free). The arbor after is
 * the engine's plan; the change is the plan less what the arbor holds. Runs while the lineset is locked.
 */
export async function planTicket(
  tx: TransactionContext,
  lineset: { id: string; number: number },
  hang: { input: CalculationInput; units: UnitSystem },
): Promise<TicketPlan> {
  const stock = await rows<StockRow>(
    tx,
    `SELECT b.id, b.name, b.unit_weight AS "unitWeight", b.thickness, b.in_storage AS "inStorage",
            coalesce(a.count, 0) AS aboard, b.retired_at IS NOT NULL AS retired
       FROM brick_types b LEFT JOIN arbor_bricks a ON a.brick_type_id = b.id AND a.lineset_id = $2
      WHERE b.venue_id = $1 AND (b.retired_at IS NULL OR a.count > 0)
      ORDER BY b.name, b.id`,
    [tx.actor.venueId, lineset.id],
  )
  const usable = stock.filter((type) => !type.retired)
  const input: CalculationInput = {
    ...hang.input,
    bricks: usable.map((type) => ({
      name: type.name,
      weight: apiFromStored(type.unitWeight, 'weight', hang.units)!,
      thickness: apiFromStored(type.thickness, 'shortLength', hang.units)!,
      available: type.inStorage + type.aboard,
    })),
  }
  const outcome = await tx.calculations.run(input)
  // A batten that cannot hang level has no plan to load: say why rather than that the figures are missing.
  const tips = outcome.ok ? outcome.result.checks.find((found) => found.code === 'batten-tips') : undefined
  if (tips) throw new AppError(409, 'batten_tips', `No ticket can open on lineset ${lineset.number}: ${tips.message}`)
  // A finding that says stop (a line or the batten over its rating, the arbor unable to balance it with the
  // bricks free now, a slack line...) means nobody should load this hang: no ticket, so nobody can approve one.
  const stops = outcome.ok ? dangersOf(outcome.result.checks) : []
  if (stops.length)
    throw new AppError(
      409,
      'hang_has_dangers',
      `No ticket can open on lineset ${lineset.number} while its hang has ${stops.length === 1 ? 'a finding that says' : `${stops.length} findings that say`} stop: ${stops.join(' ')} Change the hang or the lineset, or free the bricks it needs, and save a new revision.`,
    )
  const counterweight = outcome.ok ? outcome.result.counterweight : undefined
  if (!counterweight)
    throw new AppError(
      409,
      'no_brick_plan',
      `No brick plan can be made for lineset ${lineset.number}: its arbor figures (empty weight, capacity) are missing or the hang does not calculate`,
    )
  // The engine answers its plan in the order of the stock it was given.
  const planned = new Map(usable.map((type, index) => [type.id, counterweight.bricks[index]?.count ?? 0]))
  return {
    bricks: stock.map((type) => {
      const after = planned.get(type.id) ?? 0
      return { brickTypeId: type.id, name: type.name, before: type.aboard, after, change: after - type.aboard }
    }),
    expectedOutOfBalance: storedFromApi(counterweight.outOfBalance, 'weight', hang.units)!,
  }
}

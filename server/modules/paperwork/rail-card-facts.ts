import { QueryTypes } from 'sequelize'
import { arborWeight, outOfBalanceAtBatten } from '../../../shared/engine/arbor-balance.js'
import type { HangRevision } from '../../../shared/schemas/hang.js'
import { isCounterweightKind, type LinesetDetail } from '../../../shared/schemas/lineset.js'
import type { Venue } from '../../../shared/schemas/venue.js'
import { convert } from '../../../shared/units/systems.js'
import type { ServiceContext } from '../../context.js'
import { apiFromStored } from '../../db/quantities.js'
import { getHang, listHangs } from '../hangs/hang.service.js'
import { getLineset } from '../linesets/lineset.service.js'
import { getVenue } from '../venues/venue.service.js'

/** Bricks of one type on the arbor, with one brick's weight in the venue's units. */
export interface CardBricks {
  name: string
  count: number
  unitWeight: number
}

/** Everything a lineset's rail card prints, figures in the venue's units. */
export interface RailCardFacts {
  venue: Venue
  lineset: LinesetDetail
  hang: HangRevision | null
  bricks: CardBricks[]
  /** The arbor as counted against the current hang, at the batten (+ batten heavy); null when it does not apply. */
  outOfBalance: number | null
  /** Who approved the last weight change that went ahead, if any did. */
  approvedBy: { name: string; at: Date } | null
  printedAt: Date
  linkUrl: string
}

async function query<T extends object>(ctx: ServiceContext, sql: string, bind: unknown[]) {
  return ctx.db.sequelize.query<T>(sql, { bind, type: QueryTypes.SELECT, transaction: ctx.transaction })
}

/** Reads a lineset's rail card: 404 for another venue's or a retired lineset, like the lineset itself. */
export async function railCardFacts(ctx: ServiceContext, linesetId: string): Promise<RailCardFacts> {
  const venue = await getVenue(ctx)
  const lineset = await getLineset(ctx, linesetId)
  const [latest] = await listHangs(ctx, linesetId)
  const hang = latest ? await getHang(ctx, linesetId, latest.id) : null
  const stored = await query<{ name: string; count: number; unitWeight: string }>(
    ctx,
    `SELECT b.name, a.count, b.unit_weight AS "unitWeight"
       FROM arbor_bricks a JOIN brick_types b ON b.id = a.brick_type_id
      WHERE a.venue_id = $1 AND a.lineset_id = $2 AND a.count > 0 ORDER BY b.name, b.id`,
    [ctx.actor.venueId, linesetId],
  )
  const bricks = stored.map((brick) => ({
    name: brick.name,
    count: Number(brick.count),
    unitWeight: apiFromStored(brick.unitWeight, 'weight', venue.unitSystem) ?? 0,
  }))
  const [approval] = await query<{ name: string; at: Date }>(
    ctx,
    `SELECT u.name, t.decided_at AS at FROM weight_change_tickets t JOIN users u ON u.id = t.decided_by
      WHERE t.venue_id = $1 AND t.lineset_id = $2 AND t.state IN ('approved', 'loading', 'loaded')
      ORDER BY t.decided_at DESC LIMIT 1`,
    [ctx.actor.venueId, linesetId],
  )
  return {
    venue,
    lineset,
    hang,
    bricks,
    outOfBalance: countedOutOfBalance(lineset, hang, bricks),
    approvedBy: approval ? { name: approval.name, at: new Date(approval.at) } : null,
    printedAt: ctx.clock.now(),
    linkUrl: `${ctx.publicUrl}/linesets/${linesetId}`,
  }
}

/** The current hang's batten side against the arbor as counted, as the lineset's operating status reads it. */
function countedOutOfBalance(lineset: LinesetDetail, hang: HangRevision | null, bricks: CardBricks[]) {
  const battenSide = hang?.result.counterweight?.battenSide
  if (!isCounterweightKind(lineset.kind) || battenSide === undefined || lineset.arborEmptyWeight == null) return null
  const side = convert(battenSide, 'weight', hang!.result.units, lineset.unitSystem)
  const arbor = arborWeight({ emptyWeight: lineset.arborEmptyWeight, pipeWeightAboard: lineset.pipeWeight, bricks })
  return outOfBalanceAtBatten(lineset.kind === 'counterweight-double' ? 2 : 1, side, arbor).toNumber()
}

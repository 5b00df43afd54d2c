import { isDeepStrictEqual } from 'node:util'
import type { CalculationInput } from '../../../shared/schemas/calculation.js'
import type { HangEntry } from '../../../shared/hang/hang-items.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { entryFromStored } from './hang-entry.mapper.js'

// Both sides as JSON would carry them: no undefined members, and key order is not compared.
const plain = (value: unknown) => JSON.parse(JSON.stringify(value)) as unknown

/**
 * Refuses a save that would only repeat the latest revision: the same title and production, the same items as
 * stored, and the same engine input (so the lineset has not changed since either). A revision that differs in
 * any way, even only by float noise in a converted figure, is saved as before.
 */
export async function refuseUnchangedHang(
  tx: TransactionContext,
  latest: number | null,
  next: { linesetId: string; title: string; productionId: string | null; items: HangEntry[]; input: CalculationInput },
  system: UnitSystem,
) {
  if (latest === null) return
  const row = await tx.db.models.Hang.findOne({
    where: { linesetId: next.linesetId, revision: latest, venueId: tx.actor.venueId },
    transaction: tx.transaction,
  })
  if (!row || row.title !== next.title || (row.productionId ?? null) !== next.productionId) return
  if (row.unitSystem !== system || !isDeepStrictEqual(plain(row.calculationInput), plain(next.input))) return
  const items = await tx.db.models.HangItem.findAll({
    where: { hangId: row.id, venueId: tx.actor.venueId },
    order: [['position', 'ASC']],
    transaction: tx.transaction,
  })
  const stored = items.map((item) => entryFromStored(item, system))
  if (!isDeepStrictEqual(plain(stored), plain(next.items))) return
  throw new AppError(
    409,
    'hang_unchanged',
    `Nothing has changed since revision ${latest}: the same title, production and items give the same figures. Change something before saving a new revision.`,
  )
}

import type { CurrentHang } from '../../../shared/schemas/hang.js'
import type { LinesetOperating } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { ServiceContext } from '../../context.js'
import { apiFromStored } from '../../db/quantities.js'
import { boardLockout, boardOperatingStatus } from '../board/board-linesets.js'
import { boardRows } from '../board/board-rows.js'

/** What the list adds to each lineset's own fields: its operating status, lock-out and current hang. */
export type ListedState = LinesetOperating & { currentHang: CurrentHang | null }

/**
 * Each lineset's listed state, by id: one statement (the board's, which finds every lineset's latest hang,
 * open ticket, arbor and lock-out through indexes) instead of one read per kind of fact, and its status decided
 * by the same shared rules and exact figures. `tolerance` is the venue's (kg, exact text).
 */
export async function listedStates(
  ctx: ServiceContext,
  system: UnitSystem,
  tolerance: string,
): Promise<Map<string, ListedState>> {
  const found = await boardRows(ctx, {}, { lastChange: false })
  return new Map(
    found.map((row) => [
      row.id,
      {
        operatingStatus: boardOperatingStatus(row, tolerance),
        lockout: boardLockout(row),
        currentHang:
          row.hangId === null
            ? null
            : {
                id: row.hangId,
                revision: row.hangRevision!,
                title: row.hangTitle!,
                totalLoad: apiFromStored(row.hangTotalLoadExact, 'weight', system) ?? 0,
              },
      },
    ]),
  )
}

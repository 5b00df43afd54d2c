import { outOfBalanceAtBatten } from '../../../shared/engine/arbor-balance.js'
import { purchaseRatio } from '../../../shared/engine/counterweight.js'
import type { BoardLineset } from '../../../shared/schemas/board.js'
import { isCounterweightKind } from '../../../shared/schemas/lineset.js'
import { operatingStatus } from '../../../shared/schemas/operating-status-rule.js'
import { KILOGRAMS_PER_POUND } from '../../../shared/units/factors.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import { storedFromApi } from '../../db/quantities.js'
import type { BoardRow } from './board-rows.js'

// Total loads are shown, never computed with: a plain number, rounded to the API's six decimals, will do.
const POUNDS_PER_KILOGRAM = 1 / KILOGRAMS_PER_POUND.toNumber()
const shownWeight = (kg: number, system: UnitSystem) =>
  Math.round((system === 'imperial' ? kg * POUNDS_PER_KILOGRAM : kg) * 1e6) / 1e6

/**
 * A board row's operating status, decided exactly as every lineset read decides it (the same shared rules,
 * the same figures: the current hang's batten side against the arbor as counted, at the venue's tolerance).
 * Only counterweight sets with a computed hang and an arbor need decimal arithmetic, a few steps each.
 */
export function boardOperatingStatus(row: BoardRow, tolerance: string) {
  const outOfBalance =
    isCounterweightKind(row.kind) && row.battenSide !== null && row.hangUnits !== null && row.arborSide !== null
      ? outOfBalanceAtBatten(
          purchaseRatio(row.kind),
          storedFromApi(row.battenSide, 'weight', row.hangUnits)!,
          row.arborSide,
        )
      : null
  return operatingStatus({
    status: row.status,
    lockedOut: row.lockedOutAt !== null,
    openTicket: row.openTicket,
    hangSaysStop: row.hangStops > 0,
    feltBalance: row.feltBalance,
    outOfBalance,
    tolerance,
  })
}

/** A board row's lock-out as the API shows it, or null. */
export function boardLockout(row: BoardRow) {
  return row.lockedOutAt === null
    ? null
    : {
        reason: row.lockoutReason!,
        at: row.lockedOutAt.toISOString(),
        by: row.lockedOutBy ? { id: row.lockedOutBy, name: row.lockedOutByName ?? '' } : null,
      }
}

/** A board row as the API shows it, figures in the venue's units. */
export function boardLineset(row: BoardRow, tolerance: string, system: UnitSystem): BoardLineset {
  return {
    id: row.id,
    number: row.number,
    name: row.name,
    kind: row.kind,
    status: row.status,
    operatingStatus: boardOperatingStatus(row, tolerance),
    hang:
      row.hangId === null
        ? null
        : {
            id: row.hangId,
            title: row.hangTitle!,
            revision: row.hangRevision!,
            totalLoad: shownWeight(row.hangTotalLoad ?? 0, system),
            productionId: row.hangProductionId,
          },
    lastChange:
      row.changeId === null
        ? null
        : {
            id: row.changeId,
            type: row.changeType!,
            at: row.changeAt!.toISOString(),
            by: row.changeById ? { id: row.changeById, name: row.changeByName ?? '' } : null,
          },
    lockout: boardLockout(row),
  }
}

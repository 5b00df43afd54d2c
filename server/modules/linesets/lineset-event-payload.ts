import { UNIT_SYSTEMS, type UnitSystem } from '../../../shared/units/systems.js'
import type { LinesetInput } from '../../../shared/schemas/lineset.js'
import { apiFromStored } from '../../db/quantities.js'
import { linesetFromApi, storedToApi, type StoredLineset } from './lineset.mapper.js'

const isSavedHang = (value: unknown): value is { totalLoad: string } & Record<string, unknown> =>
  !!value && typeof value === 'object' && typeof (value as { totalLoad?: unknown }).totalLoad === 'string'

const isUnitSystem = (value: unknown): value is UnitSystem => UNIT_SYSTEMS.includes(value as UnitSystem)

/**
 * A ledger payload with its figures in the venue's current units. Entries keep SI figures; the first entries
 * ever written kept the figures as typed with the `unitSystem` they were typed in, and the ledger is never
 * rewritten, so those are read through that system instead.
 */
export function payloadInUnits(payload: Record<string, unknown>, system: UnitSystem): Record<string, unknown> {
  if (isSavedHang(payload.hang))
    return { ...payload, hang: { ...payload.hang, totalLoad: apiFromStored(payload.hang.totalLoad, 'weight', system) } }
  const { lineset, unitSystem: typedIn, ...rest } = payload
  if (!lineset || typeof lineset !== 'object') return payload
  const stored = isUnitSystem(typedIn)
    ? linesetFromApi(lineset as Omit<LinesetInput, 'unitSystem'>, typedIn)
    : (lineset as StoredLineset)
  return { ...rest, lineset: storedToApi(stored, system) }
}

import { positionsBeyondBatten } from '../../../shared/hang/entry-bounds.js'
import { expandHangEntries, loadCount, type ExpansionProblem, type HangEntry } from '../../../shared/hang/hang-items.js'
import { linesetCalculationInput } from '../../../shared/hang/lineset-calculation.js'
import { MAX_ITEMS, type CalculationInput, type CalculationResult } from '../../../shared/schemas/calculation.js'
import type { Lineset } from '../../../shared/schemas/lineset.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import { listBrickTypes } from '../brick-types/brick-type.service.js'
import { libraryWeights } from '../item-types/item-type.service.js'
import { getVenue } from '../venues/venue.service.js'

function refused(fields: Record<string, string>): AppError {
  const names = Object.keys(fields)
  return new AppError(
    400,
    'validation_failed',
    `Check ${names.length === 1 ? 'this field' : 'these fields'}: ${names.join(', ')}`,
    fields,
  )
}

const fieldsOf = (problems: readonly ExpansionProblem[]) => {
  const fields: Record<string, string> = {}
  for (const { index, field, message } of problems) fields[index < 0 ? field : `items.${index}.${field}`] ??= message
  return fields
}

/** The engine names its loads by their place among the expanded ones; say which entry each came from. */
function engineFieldsByEntry(entries: readonly HangEntry[], fields: Record<string, string>) {
  const owners = entries.flatMap((entry, index) => Array<number>(loadCount(entry)).fill(index))
  const named: Record<string, string> = {}
  for (const [path, message] of Object.entries(fields)) {
    const load = /^items\.(\d+)/.exec(path)
    named[load ? `items.${owners[Number(load[1])]}` : path] ??= message
  }
  return named
}

/**
 * Expands the entries with this venue's library (another venue's or a retired item type is refused by name),
 * builds the engine input exactly as the client does, and runs the shared engine on it on the calculation thread.
 */
export async function computeHang(
  tx: TransactionContext,
  lineset: Lineset,
  entries: readonly HangEntry[],
  system: UnitSystem,
): Promise<{ input: CalculationInput; result: CalculationResult }> {
  const ids = entries.flatMap((entry) => ('itemTypeId' in entry ? [entry.itemTypeId] : []))
  const expanded = expandHangEntries(entries, await libraryWeights(tx, ids, system), system, MAX_ITEMS)
  const problems = [...positionsBeyondBatten(entries, lineset.battenLength), ...(expanded.ok ? [] : expanded.problems)]
  if (!expanded.ok || problems.length) throw refused(fieldsOf(problems))
  const input = linesetCalculationInput({
    lineset,
    venue: await getVenue(tx),
    brickTypes: await listBrickTypes(tx),
    items: expanded.items,
  })
  const outcome = await tx.calculations.run(input)
  if (!outcome.ok) {
    const { code, message, fields } = outcome.error.error
    throw fields ? refused(engineFieldsByEntry(entries, fields)) : new AppError(400, code, message)
  }
  return { input, result: outcome.result }
}

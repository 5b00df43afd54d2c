import type { HangEntry, ItemCategory } from '../../../shared/hang/hang-items.js'
import { hangSaveSchemaFor } from '../../../shared/schemas/hang.js'
import type { ServiceContext } from '../../context.js'
import { saveHang } from '../../modules/hangs/hang.service.js'
import { DEMO_HANGS, type DemoLibraryEntry, type DemoRevision } from './demo-hangs.js'

/** The demo library's types by name. */
export type DemoLibrary = ReadonlyMap<string, { id: string; category: ItemCategory }>

const fromLibrary = (entry: DemoRevision['items'][number], library: DemoLibrary): HangEntry => {
  if (!('itemType' in entry)) return entry
  const { itemType, ...placed } = entry as DemoLibraryEntry
  const known = library.get(itemType)
  if (!known) throw new Error(`The demo library has no "${itemType}"`)
  return { ...placed, category: known.category, itemTypeId: known.id }
}

/**
 * Saves the demo show's hangs as the fly operator would, revision after revision, through the same service
 * and schema as the API, so each has its items, stored result and ledger entry.
 */
export async function seedDemoHangs(
  asFlyOperator: ServiceContext,
  linesetsByNumber: ReadonlyMap<number, string>,
  library: DemoLibrary,
  productionId: string,
) {
  for (const { number, revisions } of DEMO_HANGS) {
    const linesetId = linesetsByNumber.get(number)!
    let basedOnRevision: number | null = null
    for (const { title, items } of revisions) {
      const body = hangSaveSchemaFor('imperial').parse({
        title,
        productionId,
        basedOnRevision,
        items: items.map((entry) => fromLibrary(entry, library)),
        unitSystem: 'imperial',
      })
      basedOnRevision = (await saveHang(asFlyOperator, linesetId, body)).revision
    }
  }
}

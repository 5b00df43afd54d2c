import { displayQuantity } from '../../../shared/units/display.js'
import type { UnitSystem } from '../../../shared/units/systems.js'
import type { StoredLineset } from './lineset.mapper.js'
import { summarizeAttachmentEvent } from '../attachments/attachment-event-summary.js'
import { summarizeStockEvent } from './stock-event-summary.js'
import { summarizeTicketEvent } from './ticket-event-summary.js'

// Plain words for each field, as a person on the crew would say them.
const FIELD_WORDS: Record<keyof StoredLineset, string> = {
  number: 'number',
  name: 'name',
  kind: 'kind',
  status: 'status',
  distanceFromPlasterLine: 'distance from the plaster line',
  battenLength: 'batten length',
  pipeSize: 'pipe size',
  pipeWeightPerLength: 'pipe weight per length',
  pipeMomentOfInertia: 'pipe moment of inertia',
  pipeSectionModulus: 'pipe section modulus',
  pickPoints: 'lift line positions',
  liftLineWeightPerLength: 'lift line weight per length',
  liftLineBreakingStrength: 'lift line breaking strength',
  liftLineLengths: 'lift line lengths',
  liftLineRope: 'lift line rope',
  liftLineAxialStiffness: 'lift line stiffness',
  arborEmptyWeight: 'arbor empty weight',
  arborCapacity: 'arbor capacity',
  arborStackLength: 'arbor stack length',
  ratedLoad: 'rated load',
  pipeWeight: 'pipe weight',
  travel: 'travel',
  sandbagWeight: 'sandbag weight',
  hoistRatedCapacity: 'hoist rated capacity',
  hoistSpeed: 'hoist speed',
  notes: 'notes',
}

/** "a", "a and b", "a, b and c". */
function listed(words: string[]): string {
  if (words.length <= 1) return words.join('')
  return `${words.slice(0, -1).join(', ')} and ${words.at(-1)}`
}

interface SavedHang {
  revision?: number
  title?: string
  items?: number
  totalLoad?: number | null
}

function savedHangWords(hang: SavedHang | undefined, system: UnitSystem): string {
  if (!hang) return 'Saved a hang'
  const items = hang.items === 1 ? '1 item' : `${hang.items ?? 0} items`
  const total =
    typeof hang.totalLoad === 'number' ? `, ${displayQuantity(hang.totalLoad, 'weight', system)} in all` : ''
  return `Saved hang revision ${hang.revision}, “${hang.title}”: ${items}${total}`
}

/** What a ledger entry says happened, in one plain sentence; `payload` with its figures in `system`. */
export function summarizeLinesetEvent(type: string, payload: Record<string, unknown>, system: UnitSystem): string {
  const lineset = payload.lineset as Partial<StoredLineset> | undefined
  const stock =
    summarizeStockEvent(type, payload) ?? summarizeTicketEvent(type, payload) ?? summarizeAttachmentEvent(type, payload)
  if (stock) return stock
  switch (type) {
    case 'lineset-added':
      return lineset ? `Added as lineset ${lineset.number}, ${lineset.name}` : 'Added'
    case 'lineset-changed': {
      if (!Array.isArray(payload.changed)) return 'Changed'
      const words = (payload.changed as string[]).map((field) => FIELD_WORDS[field as keyof StoredLineset] ?? field)
      return words.length ? `Changed the ${listed(words)}` : 'Saved without changes'
    }
    case 'hang-saved':
      return savedHangWords(payload.hang as SavedHang | undefined, system)
    case 'lineset-retired':
      return 'Retired: taken out of the lists, its history kept'
    default: {
      const words = type.replaceAll('-', ' ')
      return words.charAt(0).toUpperCase() + words.slice(1)
    }
  }
}

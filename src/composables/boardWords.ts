import type { BoardLastChange } from '../../shared/schemas/index.js'

// Each ledger entry in a few words, as the board shows a lineset's last change.
const CHANGE_WORDS: Readonly<Record<string, string>> = {
  'lineset-added': 'Added to the venue',
  'lineset-changed': 'Details changed',
  'lineset-retired': 'Retired',
  'hang-saved': 'Hang saved',
  'arbor-counted': 'Arbor counted at the rail',
  'lineset-locked-out': 'Locked out',
  'lineset-released': 'Lock-out released',
  'ticket-opened': 'Weight change asked for',
  'ticket-approved': 'Weight change approved',
  'ticket-declined': 'Weight change declined',
  'ticket-withdrawn': 'Weight change withdrawn',
  'ticket-loading': 'Loading started',
  'ticket-loaded': 'Weight change loaded',
}

/** A ledger entry's type in words ("Hang saved"); an unknown type reads as itself, spaced. */
export const changeWords = (type: string) => CHANGE_WORDS[type] ?? type.replaceAll('-', ' ')

/** Who a last change names: the approver of a loaded weight change, else who made the change. */
export function changeByWords(change: BoardLastChange) {
  const name = change.by?.name ?? 'a former member'
  return change.type === 'ticket-loaded' ? `approved by ${name}` : `by ${name}`
}

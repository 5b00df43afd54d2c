interface TicketPayload {
  ticket?: { hangRevision?: number; hangTitle?: string }
  changes?: { name?: string; count?: number }[]
  comment?: string
  loaded?: { name?: string; before?: number; after?: number }[]
  feltBalance?: string
  /** Counts recorded that were not the plan's, in words. */
  differsFromPlan?: string[]
  note?: string
}

const FELT_WORDS: Record<string, string> = {
  balanced: 'felt balanced at the rail',
  'batten-heavy': 'felt batten heavy at the rail',
  'arbor-heavy': 'felt arbor heavy at the rail',
}

function changeWords(changes: TicketPayload['changes']): string {
  const moving = (changes ?? []).filter((change) => change.count)
  if (!moving.length) return 'no bricks move'
  return moving.map((c) => `${Math.abs(c.count!)} × ${c.name} ${c.count! > 0 ? 'on' : 'off'}`).join(', ')
}

/** Words for a change ticket's ledger entries; undefined for any other type. */
export function summarizeTicketEvent(type: string, payload: Record<string, unknown>): string | undefined {
  const p = payload as TicketPayload
  const revision = `hang revision ${p.ticket?.hangRevision ?? '?'}, “${p.ticket?.hangTitle ?? ''}”`
  const comment = p.comment ? `: ${p.comment}` : ''
  switch (type) {
    case 'ticket-opened':
      return `Asked for the weight change to ${revision}: ${changeWords(p.changes)}`
    case 'ticket-approved':
      return `Change to ${revision} approved, bricks held in reserve${comment}`
    case 'ticket-declined':
      return `Change to ${revision} declined${comment}`
    case 'ticket-withdrawn':
      return `Change to ${revision} withdrawn by the person who asked`
    case 'ticket-loading':
      return `Loading started for ${revision}: do not operate`
    case 'ticket-loaded': {
      const moved = (p.loaded ?? []).map((b) => `${b.name} ${b.before} → ${b.after}`).join(', ')
      const felt = FELT_WORDS[p.feltBalance ?? ''] ?? 'no balance reported'
      const differs = p.differsFromPlan?.length ? `; not the plan: ${p.differsFromPlan.join(', ')}` : ''
      return `Loaded for ${revision}: ${moved || 'no brick moved'}; ${felt}${differs}${p.note ? ` (${p.note})` : ''}`
    }
    default:
      return undefined
  }
}

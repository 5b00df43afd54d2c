interface CountedBrick {
  name?: string
  before?: number
  after?: number
}

/** Words for the ledger entries of arbor counts and lock-outs; undefined for any other type. */
export function summarizeStockEvent(type: string, payload: Record<string, unknown>): string | undefined {
  switch (type) {
    case 'arbor-counted': {
      const bricks = Array.isArray(payload.bricks) ? (payload.bricks as CountedBrick[]) : []
      const changes = bricks.map((brick) => `${brick.name} ${brick.before} → ${brick.after}`).join(', ')
      const note = typeof payload.note === 'string' && payload.note ? ` (${payload.note})` : ''
      return `Counted the arbor at the rail: ${changes || 'no change'}${note}`
    }
    case 'lineset-locked-out':
      return `Locked out: ${payload.reason ?? 'no reason given'}`
    case 'lineset-released': {
      // Releases recorded before a release reason was asked for carry only the lock's reason.
      const checked =
        typeof payload.releaseReason === 'string' && payload.releaseReason ? `: ${payload.releaseReason}` : ''
      return `Lock-out released${checked}${payload.reason ? ` (it was: ${payload.reason})` : ''}`
    }
    default:
      return undefined
  }
}

// The guided loading steps ticked on this tab, per ticket and its version, so a reload (a phone that slept on the
// gallery) finds them ticked again. sessionStorage: the tab's own, gone when it closes, never sent anywhere.
const PREFIX = 'loftledger:loading-ticks:'
const keyOf = (ticketId: string, version: number) => `${PREFIX}${ticketId}:${version}`

// Storage can be missing or refuse (private browsing, a full quota): the ticks then live only as long as the page.
function storage(): Storage | null {
  try {
    return globalThis.sessionStorage ?? null
  } catch {
    return null
  }
}

/** The step keys ticked for this ticket at this version; none when nothing was kept or it cannot be read. */
export function readLoadingTicks(ticketId: string, version: number): string[] {
  try {
    const kept: unknown = JSON.parse(storage()?.getItem(keyOf(ticketId, version)) ?? '[]')
    return Array.isArray(kept) ? kept.filter((key): key is string => typeof key === 'string') : []
  } catch {
    return []
  }
}

/** Keeps the ticked step keys, and drops what was kept for the ticket's earlier versions. */
export function writeLoadingTicks(ticketId: string, version: number, stepKeys: readonly string[]) {
  const store = storage()
  if (!store) return
  try {
    for (const key of keysKept(store)) if (key.startsWith(`${PREFIX}${ticketId}:`)) store.removeItem(key)
    if (stepKeys.length) store.setItem(keyOf(ticketId, version), JSON.stringify(stepKeys))
  } catch {
    // A full or refused store only means a reload starts the steps again.
  }
}

/** Forgets every ticket's ticks (on signing out, with the rest of what was kept for the person). */
export function forgetLoadingTicks() {
  const store = storage()
  if (!store) return
  for (const key of keysKept(store)) store.removeItem(key)
}

function keysKept(store: Storage): string[] {
  return Array.from({ length: store.length }, (_, i) => store.key(i)).filter(
    (key): key is string => key !== null && key.startsWith(PREFIX),
  )
}

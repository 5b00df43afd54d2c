import { deliverDue, type DeliveryParts, type DeliveryReport } from './outbox-delivery.js'

/**
 * Delivers the outbox from one app process: right after a change commits (`deliverSoon`) and by a sweep
 * every `sweepIntervalMs`, which picks up what failed before, what another process left, and what was
 * queued while the mail server was down. Every process runs one; claims keep them from sending a message twice.
 */
export interface OutboxCourier {
  /** Starts delivering `ids` now, without waiting; called after the transaction that queued them commits. */
  deliverSoon(ids: readonly string[]): void
  /** One look at the outbox: sends one batch of what is due. */
  sweep(): Promise<DeliveryReport>
  /** Starts the sweep timer (once the database is migrated). */
  start(): void
  /** Resolves once every delivery this process has started has finished. */
  idle(): Promise<void>
  /** Stops the sweep and waits for deliveries under way; what is left waits for the next process. */
  close(): Promise<void>
}

const logProblem = (error: unknown) =>
  console.error('loftledger: outbox:', error instanceof Error ? (error.stack ?? error.message) : error)

export function createOutboxCourier(parts: DeliveryParts, log = logProblem): OutboxCourier {
  const underway = new Set<Promise<unknown>>()
  let timer: NodeJS.Timeout | null = null
  let sweeping = false
  let closed = false

  function track<T>(work: Promise<T>): Promise<T> {
    underway.add(work)
    const done = () => underway.delete(work)
    work.then(done, done)
    return work
  }

  const courier: OutboxCourier = {
    deliverSoon(ids) {
      if (closed || ids.length === 0) return
      track(deliverDue(parts, ids)).catch(log)
    },
    sweep: () => track(deliverDue(parts)),
    start() {
      if (timer || closed) return
      timer = setInterval(() => {
        // One sweep at a time in a process; a slow one is not stacked on.
        if (sweeping) return
        sweeping = true
        courier
          .sweep()
          .catch(log)
          .finally(() => (sweeping = false))
      }, parts.policy.sweepIntervalMs)
      timer.unref()
    },
    async idle() {
      while (underway.size > 0) await Promise.allSettled([...underway])
    },
    async close() {
      closed = true
      if (timer) clearInterval(timer)
      timer = null
      await courier.idle()
    },
  }
  return courier
}

import type { Transaction } from 'sequelize'

/** Something that changed, named so every open screen of the venue can read it again. */
export interface LiveEvent {
  type:
    | 'lineset-added'
    | 'lineset-changed'
    | 'lineset-retired'
    | 'hang-saved'
    | 'arbor-counted'
    | 'lineset-locked-out'
    | 'lineset-released'
    | 'ticket-opened'
    | 'ticket-approved'
    | 'ticket-declined'
    | 'ticket-withdrawn'
    | 'ticket-loading'
    | 'ticket-loaded'
    | 'attachment-added'
    | 'attachment-removed'
    | 'pre-run-check'
  venueId: string
  /** The lineset that changed; null for what concerns the whole venue (a pre-run check). */
  linesetId: string | null
  /**
   * The ledger entry's (or pre-run check's) id: one sequence numbers both, so a board that reconnects asks
   * for everything after the last id it heard.
   */
  eventId?: string
  /**
   * The oldest transaction still running while the change was made (`pg_snapshot_xmin`, as text), set by the
   * publisher. Changes commit in their own order, not their ids': whatever commits after this one was made by a
   * transaction numbered at or above its horizon, which is how a reconnecting board finds changes that committed
   * late with a smaller id than the last one it heard.
   */
  horizon?: string
}

/** Announces changes to every app process; an event is delivered only if `transaction` commits. */
export interface LivePublisher {
  publish(event: LiveEvent, transaction: Transaction): Promise<void>
}

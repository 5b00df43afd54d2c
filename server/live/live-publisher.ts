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
  venueId: string
  linesetId: string
}

/** Announces changes to every app process; an event is delivered only if `transaction` commits. */
export interface LivePublisher {
  publish(event: LiveEvent, transaction: Transaction): Promise<void>
}

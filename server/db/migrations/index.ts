import foundation from './0001-foundation.js'
import venueBoundTicketsRetiredBricksInvitations from './0002-venue-bound-tickets-retired-bricks-invitations.js'
import itemLibraryProductions from './0003-item-library-productions.js'
import hangRevisions from './0004-hang-revisions.js'
import arborContentsBrickStock from './0005-arbor-contents-brick-stock.js'
import mailOutbox from './0006-mail-outbox.js'
import ticketPlansDecisions from './0007-ticket-plans-decisions.js'
import preRunChecks from './0008-pre-run-checks.js'
import attachmentUploads from './0009-attachment-uploads.js'
import liftLineStretch from './0010-lift-line-stretch.js'
import answerCache from './0011-answer-cache.js'
import ticketLoadedBalance from './0012-ticket-loaded-balance.js'

export interface Migration {
  name: string
  /** SQL run in one transaction. */
  up: string
  down: string
}

/** Every migration, in order. A new one is a new file here, appended to this list; never edit a landed one. */
export const migrations: Migration[] = [
  foundation,
  venueBoundTicketsRetiredBricksInvitations,
  itemLibraryProductions,
  hangRevisions,
  arborContentsBrickStock,
  mailOutbox,
  ticketPlansDecisions,
  preRunChecks,
  attachmentUploads,
  liftLineStretch,
  answerCache,
  ticketLoadedBalance,
]

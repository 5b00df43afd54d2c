import { dayAndTime } from './moments'
import { OUTBOX_STATE_LABELS, type OutboxState } from '../../shared/schemas/index.js'

/** Each delivery state in words, with an icon and a colour beside them (never the colour alone). */
export const OUTBOX_STATE_LOOKS: Readonly<Record<OutboxState, { label: string; icon: string; color: string }>> = {
  waiting: { label: OUTBOX_STATE_LABELS.waiting, icon: 'mdi-email-sync-outline', color: 'warning' },
  sent: { label: OUTBOX_STATE_LABELS.sent, icon: 'mdi-email-check-outline', color: 'success' },
  failed: { label: OUTBOX_STATE_LABELS.failed, icon: 'mdi-email-alert-outline', color: 'error' },
}

/** A moment as the outbox shows it: day, month, year and time of day, in the reader's own zone. */
export const outboxMoment = (iso: string) => dayAndTime(iso)

import type { LinesetStatus } from '../../shared/schemas/index.js'
import { LINESET_KIND_WORDS, LINESET_STATUS_WORDS } from '../../shared/schemas/lineset-words.js'

/** Plain names for each kind of lineset and each status (shared with the printed papers). */
export const KIND_LABELS = LINESET_KIND_WORDS
export const STATUS_LABELS = LINESET_STATUS_WORDS

/** Theme colours for the status chip; the words carry the meaning, the colour only helps. */
export const STATUS_COLORS: Readonly<Record<LinesetStatus, string>> = {
  'in-service': 'success',
  'needs-inspection': 'warning',
  'out-of-service': 'error',
}

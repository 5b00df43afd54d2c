import { z } from 'zod'
import type { LinesetKind, LinesetStatus } from './lineset.js'
import type { Lockout } from './lockout.js'
import type { OperatingStatus } from './operating-status.js'
import { multiLineText } from './text.js'
import type { UnitSystem } from '../units/systems.js'

/** `GET /api/v1/board?productionId=&linesetId=`: the whole board, one production's linesets, or one lineset. */
export const boardQuerySchema = z.object({
  productionId: z.uuid('Production must be a production of this venue').optional(),
  linesetId: z.uuid('Lineset must be a lineset of this venue').optional(),
})
export type BoardQuery = z.infer<typeof boardQuerySchema>

/** The last thing that happened to a lineset, from its ledger. */
export interface BoardLastChange {
  /** The ledger entry's id (also the live event's id). */
  id: string
  /** The ledger entry's type, e.g. `lockout-set` or `ticket-loaded`. */
  type: string
  at: string
  /** Who approved it: for a completed weight change the one who approved the ticket, else who made the change. */
  by: { id: string; name: string } | null
}

/** One lineset as the board shows it; figures in the board's `unitSystem`. */
export interface BoardLineset {
  id: string
  number: number
  name: string
  kind: LinesetKind
  status: LinesetStatus
  operatingStatus: OperatingStatus
  hang: { id: string; title: string; revision: number; totalLoad: number; productionId: string | null } | null
  lastChange: BoardLastChange | null
  lockout: Lockout | null
}

/** A lineset that was not ready when a pre-run check was recorded, as it was then. */
export interface NotReadyLineset {
  id: string
  number: number
  name: string
  operatingStatus: OperatingStatus
}

/** A pre-run check as recorded. */
export interface PreRunCheck {
  id: string
  productionId: string | null
  productionName: string | null
  by: { id: string; name: string } | null
  at: string
  note: string
  readyCount: number
  linesetCount: number
  notReady: NotReadyLineset[]
}

/** `GET /api/v1/board`. */
export interface Board {
  unitSystem: UnitSystem
  linesets: BoardLineset[]
  lastCheck: PreRunCheck | null
}

/** `POST /api/v1/pre-run-checks`. */
export const preRunCheckInputSchema = z.object({
  productionId: z.uuid('Production must be a production of this venue').nullish(),
  note: multiLineText('Note', 2000).optional(),
})
export type PreRunCheckInput = z.infer<typeof preRunCheckInputSchema>

/** The most checks one `GET /api/v1/pre-run-checks` answers. */
export const PRE_RUN_CHECKS_PAGE_MAX = 50

/** `GET /api/v1/pre-run-checks?limit=`: newest first. */
export const preRunChecksQuerySchema = z.object({
  limit: z.coerce
    .number({ error: 'Limit must be a number' })
    .int('Limit must be a whole number')
    .min(1, 'Limit must be 1 or more')
    .max(PRE_RUN_CHECKS_PAGE_MAX, `Limit must be ${PRE_RUN_CHECKS_PAGE_MAX} or less`)
    .default(10),
})
export type PreRunChecksQuery = z.infer<typeof preRunChecksQuerySchema>

/** A ledger entry made after the last pre-run check. */
export interface ChangeSinceCheck {
  id: string
  type: string
  at: string
  linesetId: string
  linesetNumber: number
  linesetName: string
  actor: { id: string; name: string } | null
  /** What happened, in plain words. */
  summary: string
}

/** The most changes `GET /api/v1/pre-run-checks/latest` lists (newest first); `moreChanges` says when there are more. */
export const CHANGES_SINCE_CHECK_MAX = 100

/** `GET /api/v1/pre-run-checks/latest`: the last check and every ledger change since it. */
export interface LatestPreRunCheck {
  check: PreRunCheck | null
  changesSince: ChangeSinceCheck[]
  moreChanges: boolean
}

/** The event names of the board's stream (`GET /api/v1/board/stream`), each after what changed. */
export const BOARD_STREAM_EVENTS = ['lineset', 'hang', 'arbor', 'lockout', 'ticket', 'pre-run-check'] as const
export type BoardStreamEvent = (typeof BOARD_STREAM_EVENTS)[number]

/** What each board stream event carries in `data`. */
export interface BoardStreamData {
  /** The live event's id (a ledger entry's or a pre-run check's), the stream's `id:` too. */
  id: string | null
  /** The detailed change, e.g. `lineset-locked-out`. */
  type: string
  linesetId: string | null
}

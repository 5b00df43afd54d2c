import type { Request } from 'express'
import type { Transaction } from 'sequelize'
import type { SessionUser } from '../shared/schemas/session.js'
import type { Clock } from './clock.js'
import type { Database } from './db/models.js'
import type { FileStorage } from './files/file-storage.js'
import { currentUser } from './http/auth.js'
import type { LivePublisher } from './live/live-publisher.js'
import type { MailSender } from './mail/mail-sender.js'
import type { CalculationPool } from './modules/calculations/calculation-pool.js'
import type { OutboxCourier } from './modules/outbox/outbox-courier.js'

/** What the whole app shares, built once by `createApp` and handed to every module's routes. Holds no state. */
export interface AppContext {
  db: Database
  mail: MailSender
  /** Delivers the mail outbox; services queue mail with `queueMail` (server/modules/outbox/), never send it. */
  outbox: OutboxCourier
  live: LivePublisher
  files: FileStorage
  clock: Clock
  /** The engine's own thread: a save that computes a hang never holds the thread that answers everyone else. */
  calculations: CalculationPool
  /** Where people reach the app, for links in e-mail (no trailing slash). */
  publicUrl: string
}

/**
 * The one argument of every service: the app's parts, who is acting, and the transaction every query joins
 * when there is one. `Actor` is `null` for the few services anyone may call (signing in, accepting an invitation).
 */
export interface ServiceContext<Actor extends SessionUser | null = SessionUser> extends AppContext {
  actor: Actor
  transaction?: Transaction
}

/** A service context inside a transaction. */
export type TransactionContext<Actor extends SessionUser | null = SessionUser> = ServiceContext<Actor> & {
  transaction: Transaction
}

/** The context for a request by the signed-in member (only behind requireSession or requireRole). */
export const memberContext = (app: AppContext, req: Request): ServiceContext => ({ ...app, actor: currentUser(req) })

/** The context for a request anyone may make; `actor` is the signed-in member, if any. */
export const visitorContext = (app: AppContext, req?: Request): ServiceContext<SessionUser | null> => ({
  ...app,
  actor: req?.user ?? null,
})

/**
 * Runs `work` in the caller's transaction when there is one, else in a new one that commits when `work`
 * resolves and rolls back when it throws. Everything `work` reads and writes goes through `tx.transaction`.
 */
export function inTransaction<Actor extends SessionUser | null, T>(
  ctx: ServiceContext<Actor>,
  work: (tx: TransactionContext<Actor>) => Promise<T>,
): Promise<T> {
  if (ctx.transaction) return work(ctx as TransactionContext<Actor>)
  return ctx.db.sequelize.transaction((transaction) => work({ ...ctx, transaction }))
}

import { resolve } from 'node:path'
import { constants as zlibConstants } from 'node:zlib'
import compression from 'compression'
import type { Request, Response } from 'express'
import express from 'express'
import { buildAppContext, type AppOverrides } from './app-context.js'
import type { Config } from './config.js'
import type { AppContext } from './context.js'
import { connectDatabase } from './db/connection.js'
import { defineModels, type Database } from './db/models.js'
import { clientAssets, hasBuiltClient } from './http/client-assets.js'
import { csrfProtection } from './http/csrf.js'
import { apiNotFound, errorHandler } from './http/errors.js'
import { noStore, securityHeaders } from './http/headers.js'
import { createLiveHub, type LiveHub } from './live/live-hub.js'
import { mountedRoutes, type MountedRoute } from './http/mounted-routes.js'
import { sessionMiddleware } from './http/session.js'
import { answerFingerprint } from './modules/answers/answer-fingerprint.js'
import { arborRoutes } from './modules/arbors/arbor.routes.js'
import { attachmentRoutes, linesetAttachmentRoutes } from './modules/attachments/attachment.routes.js'
import { boardRoutes } from './modules/board/board.routes.js'
import { brickStockRoutes } from './modules/brick-stock/brick-stock.routes.js'
import { lockoutRoutes } from './modules/lockouts/lockout.routes.js'
import { brickTypeRoutes } from './modules/brick-types/brick-type.routes.js'
import type { CalculationPool } from './modules/calculations/calculation-pool.js'
import { calculationBodyAsText, calculationRoutes } from './modules/calculations/calculation.routes.js'
import { itemTypeRoutes } from './modules/item-types/item-type.routes.js'
import { hangRoutes } from './modules/hangs/hang.routes.js'
import { invitationRoutes } from './modules/invitations/invitation.routes.js'
import { linesetRoutes } from './modules/linesets/lineset.routes.js'
import { outboxRoutes } from './modules/outbox/outbox.routes.js'
import { paperworkRoutes } from './modules/paperwork/paperwork.routes.js'
import { peopleRoutes } from './modules/people/people.routes.js'
import { preRunCheckRoutes } from './modules/pre-run-checks/pre-run-check.routes.js'
import { productionRoutes } from './modules/productions/production.routes.js'
import { createPassport } from './modules/session/passport.js'
import { sessionRoutes } from './modules/session/session.routes.js'
import { ticketRoutes } from './modules/tickets/ticket.routes.js'
import { venueRoutes } from './modules/venues/venue.routes.js'

const BROTLI_FAST = { [zlibConstants.BROTLI_PARAM_QUALITY]: 1 }
export interface AppHandle {
  app: express.Express
  db: Database
  /** The application context every module's routes were given. */
  context: AppContext
  /** Every API route mounted, as `METHOD /api/v1/path` (the role table is checked against it). */
  routes: MountedRoute[]
  /** The thread the engine runs on (tests hold it to keep a calculation in flight). */
  calculations: CalculationPool
  /** This process's one LISTEN connection and the board streams it feeds. */
  liveHub: LiveHub
  close(): Promise<void>
}

const log = (error: unknown) =>
  console.error('loftledger:', error instanceof Error ? (error.stack ?? error.message) : error)

/**
 * Builds the whole app (API and, when configured, the built client) on one application context: database,
 * mail sender, live-event publisher, file storage and clock, each replaceable through `overrides`.
 * Holds no state of its own.
 */
export function createApp(config: Config, overrides: AppOverrides = {}): AppHandle {
  const connections = connectDatabase(config.databaseUrl)
  const db: Database = { sequelize: connections.sequelize, models: defineModels(connections.sequelize) }
  const context = buildAppContext(config, db, overrides)
  const sessions = sessionMiddleware(config, connections.sessionPool)
  const passport = createPassport(context)
  const csrf = csrfProtection(config)
  const calculations = context.calculations
  const liveHub = createLiveHub(config.databaseUrl)
  const app = express()
  void answerFingerprint() // read now, not on the first list or board asked for

  app.set('trust proxy', config.trustProxy)
  app.disable('x-powered-by')
  // API answers are never stored (no-store), so an ETag on them only costs a hash of every body. A function
  // that gives none, rather than `false`: Express hands the setting's truth to files it sends, and the built
  // client's pages keep their ETags (from the file's size and time, not its bytes).
  app.set('etag', () => undefined)
  app.use(securityHeaders(config))

  const api = express.Router()
  api.use('/calculations', calculationBodyAsText)
  api.use(express.json({ limit: '1mb' }))
  api.use(...sessions.middleware)
  api.use(passport.initialize())
  api.use(passport.session())
  api.use(csrf.requireToken)
  const mounts = [
    ['/session', sessionRoutes({ db, config, passport, csrf })],
    ['/venue', venueRoutes(context)],
    ['/linesets', linesetRoutes(context)],
    ['/linesets', hangRoutes(context)],
    ['/linesets', arborRoutes(context)],
    ['/linesets', lockoutRoutes(context)],
    ['/linesets', linesetAttachmentRoutes(context)],
    ['/attachments', attachmentRoutes(context)],
    ['/brick-stock', brickStockRoutes(context)],
    ['/brick-types', brickTypeRoutes(context)],
    ['/item-types', itemTypeRoutes(context)],
    ['/productions', productionRoutes(context)],
    ['/people', peopleRoutes(context)],
    ['/invitations', invitationRoutes(context, csrf)],
    ['/outbox', outboxRoutes(context)],
    ['/tickets', ticketRoutes(context)],
    ['/calculations', calculationRoutes(calculations)],
    ['/board', boardRoutes(context, liveHub, config.boardKeepAliveMs)],
    ['/pre-run-checks', preRunCheckRoutes(context)],
    ['', paperworkRoutes(context)],
  ] as const
  for (const [path, router] of mounts) api.use(path, router)
  api.use(apiNotFound)
  // Lists run to tens of kilobytes of JSON. Answers under 1 KB (the session's, which carries the CSRF token)
  // stay plain, so no secret is ever compressed beside text a page can make the API echo.
  // The board's event stream is never compressed: compression holds bytes back until a buffer fills, and an
  // event must reach the board the moment it is written.
  // Brotli at quality 1 (its one-pass encoder): measured under autocannon, qualities 2-4 (the package's default is
  // 4) cost about 2.5 ms of CPU more per 60 KB list answer for an answer only 7 % smaller.
  app.use('/api', compression({ threshold: 1024, filter: compressibleAnswer, brotli: { params: BROTLI_FAST } }))
  app.use('/api', noStore)
  app.use('/api/v1', api)
  app.use('/api', apiNotFound)

  if (config.clientDir && hasBuiltClient(config.clientDir)) app.use(clientAssets(resolve(config.clientDir)))
  app.use(errorHandler(log))

  return {
    app,
    db,
    context,
    routes: mountedRoutes('/api/v1', mounts),
    calculations,
    liveHub,
    close: async () => {
      await liveHub.close()
      await context.outbox.close()
      await calculations.close()
      await sessions.close()
      await context.mail.close()
      await connections.close()
    },
  }
}

function compressibleAnswer(req: Request, res: Response): boolean {
  const type = String(res.getHeader('Content-Type') ?? '')
  return !type.startsWith('text/event-stream') && compression.filter(req, res)
}

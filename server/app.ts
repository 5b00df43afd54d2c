import { existsSync } from 'node:fs'
import { join, resolve } from 'node:path'
import express from 'express'
import helmet from 'helmet'
import type { Config } from './config.js'
import { connectDatabase } from './db/connection.js'
import { defineModels, type Database } from './db/models.js'
import { requireCsrfToken } from './http/csrf.js'
import { apiNotFound, errorHandler } from './http/errors.js'
import { sessionMiddleware } from './http/session.js'
import { signInLimiter } from './http/sign-in-limiter.js'
import { brickTypeRoutes } from './modules/brick-types/brick-type.routes.js'
import { createCalculationPool, type CalculationPool } from './modules/calculations/calculation-pool.js'
import { calculationRoutes } from './modules/calculations/calculation.routes.js'
import { linesetRoutes } from './modules/linesets/lineset.routes.js'
import { peopleRoutes } from './modules/people/people.routes.js'
import { createPassport } from './modules/session/passport.js'
import { sessionRoutes } from './modules/session/session.routes.js'
import { venueRoutes } from './modules/venues/venue.routes.js'

export interface AppHandle {
  app: express.Express
  db: Database
  /** The thread the engine runs on (tests hold it to keep a calculation in flight). */
  calculations: CalculationPool
  close(): Promise<void>
}

const log = (error: unknown) =>
  console.error('loftledger:', error instanceof Error ? (error.stack ?? error.message) : error)

/** Builds the whole app (API and, when configured, the built client) on one database. Holds no state of its own. */
export function createApp(config: Config): AppHandle {
  const connections = connectDatabase(config.databaseUrl)
  const db: Database = { sequelize: connections.sequelize, models: defineModels(connections.sequelize) }
  const sessions = sessionMiddleware(config, connections.sessionPool)
  const passport = createPassport(db)
  const calculations = createCalculationPool()
  const app = express()

  app.set('trust proxy', config.trustProxy)
  app.disable('x-powered-by')
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          'default-src': ["'self'"],
          'style-src': ["'self'", "'unsafe-inline'"], // Vuetify sets theme colours in a style element
          'img-src': ["'self'", 'data:', 'blob:'],
          'font-src': ["'self'"],
          'upgrade-insecure-requests': config.secureCookies ? [] : null,
        },
      },
    }),
  )

  const api = express.Router()
  api.use(express.json({ limit: '1mb' }))
  api.use(sessions.middleware)
  api.use(passport.initialize())
  api.use(passport.session())
  api.use(requireCsrfToken)
  api.use('/session', sessionRoutes(passport, signInLimiter(db.sequelize, config.signInAttemptsPerMinute)))
  api.use('/venue', venueRoutes(db))
  api.use('/linesets', linesetRoutes(db))
  api.use('/brick-types', brickTypeRoutes(db))
  api.use('/people', peopleRoutes(db))
  api.use('/calculations', calculationRoutes(calculations))
  api.use(apiNotFound)
  app.use('/api/v1', api)
  app.use('/api', apiNotFound)

  if (config.clientDir && existsSync(join(config.clientDir, 'index.html'))) {
    const clientDir = resolve(config.clientDir)
    app.use(express.static(clientDir, { index: false, maxAge: '1h' }))
    app.get('/{*splat}', (_req, res) => res.sendFile(join(clientDir, 'index.html')))
  }
  app.use(errorHandler(log))

  return {
    app,
    db,
    calculations,
    close: async () => {
      await calculations.close()
      await sessions.close()
      await connections.close()
    },
  }
}

import { systemClock } from './clock.js'
import type { Config } from './config.js'
import type { AppContext } from './context.js'
import type { Database } from './db/models.js'
import { localFolderStorage } from './files/local-folder-storage.js'
import { s3Storage } from './files/s3-storage.js'
import { postgresLivePublisher } from './live/postgres-live.js'
import { createCalculationPool } from './modules/calculations/calculation-pool.js'
import { mailNotConfigured, smtpMailSender } from './mail/smtp-mail-sender.js'
import { createOutboxCourier } from './modules/outbox/outbox-courier.js'

/** The parts a caller of `createApp` may replace (tests: a fixed clock, a temporary folder, another mailer). */
export type AppOverrides = Partial<Omit<AppContext, 'db'>>

/** The application context from config, each part replaceable through `overrides`. */
export function buildAppContext(config: Config, db: Database, overrides: AppOverrides = {}): AppContext {
  const mail = overrides.mail ?? (config.smtpUrl ? smtpMailSender(config.smtpUrl, config.mailFrom) : mailNotConfigured)
  const clock = overrides.clock ?? systemClock
  return {
    db,
    mail,
    outbox: overrides.outbox ?? createOutboxCourier({ db, mail, clock, policy: config.outbox }),
    live: overrides.live ?? postgresLivePublisher(db.sequelize),
    files: overrides.files ?? (config.s3 ? s3Storage(config.s3) : localFolderStorage(config.fileStorageDir)),
    clock,
    calculations: overrides.calculations ?? createCalculationPool(),
    publicUrl: overrides.publicUrl ?? config.publicUrl,
  }
}

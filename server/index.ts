import type { Server } from 'node:http'
import type { AddressInfo } from 'node:net'
import { createApp, type AppHandle } from './app.js'
import type { AppOverrides } from './app-context.js'
import { loadConfig, type Config } from './config.js'
import { migrate } from './db/migrate.js'

export interface RunningServer {
  handle: AppHandle
  server: Server
  url: string
  stop(): Promise<void>
}

/** Friendly one-line reasons for the listen errors people actually hit. */
export class ListenError extends Error {}

function listen(handle: AppHandle, host: string, port: number): Promise<Server> {
  return new Promise((resolve, reject) => {
    const server = handle.app.listen(port, host)
    server.once('listening', () => resolve(server))
    server.once('error', (error: NodeJS.ErrnoException) => {
      if (error.code === 'EADDRINUSE')
        reject(
          new ListenError(
            `Port ${port} on ${host} is already in use; stop whatever uses it or set PORT to another port`,
          ),
        )
      else if (error.code === 'EACCES')
        reject(new ListenError(`Not allowed to listen on port ${port}; choose a port above 1024 with PORT`))
      else reject(error)
    })
  })
}

/** Migrates the database, then serves the app. Port 0 picks a free port (tests). */
export async function startServer(config: Config, overrides?: AppOverrides): Promise<RunningServer> {
  const handle = createApp(config, overrides)
  try {
    await migrate(handle.db.sequelize, config.databaseUrl)
    const server = await listen(handle, config.host, config.port)
    // Only now is the outbox table sure to be there: the sweep starts after migrating.
    handle.context.outbox.start()
    const { port } = server.address() as AddressInfo
    const stop = async () => {
      await new Promise<void>((resolve) => {
        server.close(() => resolve())
        server.closeAllConnections()
      })
      await handle.close()
    }
    return { handle, server, url: `http://${config.host}:${port}`, stop }
  } catch (error) {
    await handle.close()
    throw error
  }
}

// `node --import tsx server/index.ts`: serve against DATABASE_URL from the environment.
if (import.meta.url === `file://${process.argv[1]}`) {
  startServer(loadConfig())
    .then((running) => {
      console.log(`Loftledger is serving on ${running.url}`)
      const stop = () => running.stop().then(() => process.exit(0))
      process.once('SIGINT', stop)
      process.once('SIGTERM', stop)
    })
    .catch((error) => {
      console.error(`loftledger: ${error instanceof Error ? error.message : error}`)
      process.exit(1)
    })
}

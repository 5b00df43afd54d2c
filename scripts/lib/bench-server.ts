// Child processes for `npm run bench:api`: the app itself (the same entry as `npm run dev:api`) and the bare
// Express yardstick, each in a process of its own so neither shares a thread with the load generator.
import { spawn, type ChildProcess } from 'node:child_process'
import { createInterface } from 'node:readline'
import { projectRoot } from './paths.js'

export interface ChildServer {
  url: string
  pid: number
  stop(): Promise<void>
}

function firstLineMatching(child: ChildProcess, pattern: RegExp): Promise<string> {
  return new Promise((resolve, reject) => {
    const lines = createInterface({ input: child.stdout! })
    lines.on('line', (line) => {
      const match = pattern.exec(line)
      if (match) resolve(match[1]!)
    })
    child.once('exit', (code) => reject(new Error(`the server stopped before serving (exit code ${code})`)))
  })
}

const stopper = (child: ChildProcess) => () =>
  new Promise<void>((resolve) => {
    if (child.exitCode !== null) return resolve()
    child.once('exit', () => resolve())
    child.kill('SIGTERM')
  })

/** Starts `server/index.ts`; `nodeFlags` such as `--cpu-prof` profile it. */
export async function startAppServer(env: Record<string, string>, nodeFlags: string[] = []): Promise<ChildServer> {
  const child = spawn(process.execPath, ['--import', 'tsx', ...nodeFlags, 'server/index.ts'], {
    cwd: projectRoot,
    env: { ...process.env, ...env },
    stdio: ['ignore', 'pipe', 'inherit'],
  })
  const url = await firstLineMatching(child, /serving on (http\S+)/)
  return { url, pid: child.pid!, stop: stopper(child) }
}

export async function startBareServer(): Promise<ChildServer> {
  const child = spawn(process.execPath, ['--import', 'tsx', 'scripts/lib/bare-express.ts'], {
    cwd: projectRoot,
    stdio: ['ignore', 'pipe', 'inherit'],
  })
  const port = await firstLineMatching(child, /^(\d+)$/)
  return { url: `http://127.0.0.1:${port}`, pid: child.pid!, stop: stopper(child) }
}

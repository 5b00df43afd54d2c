import { Worker } from 'node:worker_threads'
import type { runCalculation } from '../../../shared/engine/calculate.js'
import { AppError } from '../../http/errors.js'
import type { CalculationJob, CalculationReply } from './calculation.worker.js'

type Outcome = ReturnType<typeof runCalculation>

/**
 * Calculations waiting or running at once. Each is bounded (the schema's ranges and the engine's work limits keep
 * the worst accepted one to a few tens of milliseconds), so this many is a couple of seconds of work; beyond it a
 * request is refused with 503 rather than queued without end.
 */
export const MAX_WAITING_CALCULATIONS = 32

/** The calculation thread as the routes see it. */
export interface CalculationPool {
  /** Runs the engine on a raw body on the calculation thread. */
  run(body: unknown): Promise<Outcome>
  /** Calculations sent to the thread and not yet answered. */
  waiting(): number
  /** Tests: the thread waits before its next job until `release`, so a calculation stays in flight. */
  hold(): void
  release(): void
  close(): Promise<void>
}

/**
 * One worker thread for the engine, started on the first calculation, so a calculation never holds the thread
 * that answers every other request. A thread that dies fails what it held (500) and the next calculation starts
 * a new one.
 *
 * @example
 * const pool = createCalculationPool()
 * const outcome = await pool.run(body) // { ok: true, result } or { ok: false, error }
 */
export function createCalculationPool(): CalculationPool {
  const gate = new Int32Array(new SharedArrayBuffer(4))
  Atomics.store(gate, 0, 1)
  const pending = new Map<number, { resolve(outcome: Outcome): void; reject(error: Error): void }>()
  let worker: Worker | null = null
  let nextId = 1

  const failAll = (error: Error) => {
    for (const job of pending.values()) job.reject(error)
    pending.clear()
  }

  function start(): Worker {
    const thread = new Worker(new URL('./calculation.worker.mjs', import.meta.url), {
      execArgv: [],
      workerData: { gate },
    })
    thread.on('message', (reply: CalculationReply) => {
      const job = pending.get(reply.id)
      pending.delete(reply.id)
      if (pending.size === 0) thread.unref()
      if ('fault' in reply) job?.reject(new Error(`calculation failed: ${reply.fault}`))
      else job?.resolve(reply.outcome)
    })
    const lost = (error: Error) => {
      if (worker === thread) worker = null
      failAll(error)
    }
    thread.on('error', lost)
    thread.on('exit', (code) => lost(new Error(`the calculation thread stopped (exit code ${code})`)))
    return thread
  }

  return {
    run(body) {
      if (pending.size >= MAX_WAITING_CALCULATIONS)
        return Promise.reject(
          new AppError(503, 'calculations_busy', 'Too many calculations are waiting; try again in a moment'),
        )
      worker ??= start()
      const id = nextId++
      const job: CalculationJob = { id, body }
      // A thread with work keeps the process alive until it answers; an idle one never does.
      worker.ref()
      return new Promise<Outcome>((resolve, reject) => {
        pending.set(id, { resolve, reject })
        worker!.postMessage(job)
      })
    },
    waiting: () => pending.size,
    hold: () => Atomics.store(gate, 0, 0),
    release() {
      Atomics.store(gate, 0, 1)
      Atomics.notify(gate, 0)
    },
    async close() {
      const thread = worker
      worker = null
      this.release()
      await thread?.terminate()
    },
  }
}

import { Worker } from 'node:worker_threads'
import type { runCalculation } from '../../../shared/engine/calculate.js'
import { AppError } from '../../http/errors.js'
import type { CalculationAnswer } from './calculation-answer.js'
import type { CalculationJob, CalculationReply } from './calculation.worker.js'

type Outcome = ReturnType<typeof runCalculation>
type Settle = { resolve(value: Outcome | CalculationAnswer): void; reject(error: Error): void }

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
  /** Runs the engine on a request's JSON text on the calculation thread; a result comes back as JSON text. */
  answer(text: string): Promise<CalculationAnswer>
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
  const pending = new Map<number, Settle>()
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
      else job?.resolve('answer' in reply ? reply.answer : reply.outcome)
    })
    const lost = (error: Error) => {
      if (worker === thread) worker = null
      failAll(error)
    }
    thread.on('error', lost)
    thread.on('exit', (code) => lost(new Error(`the calculation thread stopped (exit code ${code})`)))
    return thread
  }

  function send<T extends Outcome | CalculationAnswer>(job: CalculationJob): Promise<T> {
    if (pending.size >= MAX_WAITING_CALCULATIONS)
      return Promise.reject(
        new AppError(503, 'calculations_busy', 'Too many calculations are waiting; try again in a moment'),
      )
    worker ??= start()
    // A thread with work keeps the process alive until it answers; an idle one never does.
    worker.ref()
    return new Promise<T>((resolve, reject) => {
      pending.set(job.id, { resolve: resolve as Settle['resolve'], reject })
      worker!.postMessage(job)
    })
  }

  return {
    run: (body) => send<Outcome>({ id: nextId++, body }),
    answer: (text) => send<CalculationAnswer>({ id: nextId++, text }),
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

// The calculation thread: the shared engine, one request at a time, off the thread that answers HTTP.
import { parentPort, workerData } from 'node:worker_threads'
import { runCalculation } from '../../../shared/engine/calculate.js'

/** What the pool sends: a request id and the raw body, validated here by the engine's own schema. */
export interface CalculationJob {
  id: number
  body: unknown
}

/** What comes back: the engine's outcome, or why the engine failed (an engine fault, answered as a 500). */
export type CalculationReply =
  { id: number; outcome: ReturnType<typeof runCalculation> } | { id: number; fault: string }

// While the pool holds the gate closed (0) the thread waits before each job; open (1) it never waits.
const gate = (workerData as { gate?: Int32Array } | undefined)?.gate

parentPort!.on('message', ({ id, body }: CalculationJob) => {
  if (gate) Atomics.wait(gate, 0, 0)
  let reply: CalculationReply
  try {
    reply = { id, outcome: runCalculation(body) }
  } catch (error) {
    reply = { id, fault: error instanceof Error ? error.message : String(error) }
  }
  parentPort!.postMessage(reply)
})

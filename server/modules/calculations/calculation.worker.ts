// The calculation thread: the shared engine, one request at a time, off the thread that answers HTTP.
import { parentPort, workerData } from 'node:worker_threads'
import { runCalculation } from '../../../shared/engine/calculate.js'
import { answerFromText, type CalculationAnswer } from './calculation-answer.js'

/**
 * What the pool sends: a request id and either a body for the engine (`body`: validated here by the engine's own
 * schema, the outcome sent back as values) or a request's JSON text (`text`: parsed here, the result sent back as
 * JSON text), so the thread that answers HTTP neither parses a calculation's body nor rebuilds its result.
 */
export type CalculationJob = { id: number; body: unknown } | { id: number; text: string }

/** What comes back: the engine's outcome or answer, or why the engine failed (an engine fault, answered as a 500). */
export type CalculationReply =
  | { id: number; outcome: ReturnType<typeof runCalculation> }
  | { id: number; answer: CalculationAnswer }
  | { id: number; fault: string }

// While the pool holds the gate closed (0) the thread waits before each job; open (1) it never waits.
const gate = (workerData as { gate?: Int32Array } | undefined)?.gate

parentPort!.on('message', (job: CalculationJob) => {
  if (gate) Atomics.wait(gate, 0, 0)
  let reply: CalculationReply
  try {
    reply =
      'text' in job
        ? { id: job.id, answer: answerFromText(job.text) }
        : { id: job.id, outcome: runCalculation(job.body) }
  } catch (error) {
    reply = { id: job.id, fault: error instanceof Error ? error.message : String(error) }
  }
  parentPort!.postMessage(reply)
})

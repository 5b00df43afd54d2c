import { runCalculation } from '../../../shared/engine/calculate.js'

type Failure = Extract<ReturnType<typeof runCalculation>, { ok: false }>

/** A calculation as the route sends it: the result already as JSON text, or the engine's refusal. */
export type CalculationAnswer = { ok: true; json: string } | Failure

const malformed: Failure = {
  ok: false,
  error: { error: { code: 'malformed_json', message: 'The request body is not valid JSON' } },
}

/**
 * Parses a request's JSON text as the API's JSON reader does (an object or array at the top, an empty body read as
 * `{}`), runs the engine on it and writes the result as JSON text.
 *
 * @example
 * answerFromText('{"units":"imperial", ...}') // { ok: true, json: '{"kind":...}' }
 * answerFromText('{"units":') // { ok: false, error: { error: { code: 'malformed_json', ... } } }
 */
export function answerFromText(text: string): CalculationAnswer {
  let body: unknown = {}
  if (text.trim() !== '') {
    if (!/^\s*[{[]/.test(text)) return malformed
    try {
      body = JSON.parse(text)
    } catch {
      return malformed
    }
  }
  const outcome = runCalculation(body)
  return outcome.ok ? { ok: true, json: JSON.stringify(outcome.result) } : outcome
}

/**
 * Balances one lineset from a JSON file (or stdin) and prints the result JSON.
 * Usage: npm run -s calc -- FILE.json   (exit 0; invalid input prints { error } and exits 2)
 */
import { readFileSync } from 'node:fs'
import { runCalculation } from '../shared/engine/index.js'
import type { ErrorBody } from '../shared/errors/fields.js'

function fail(code: string, message: string): never {
  const body: ErrorBody = { error: { code, message, fields: {} } }
  process.stdout.write(`${JSON.stringify(body, null, 2)}\n`)
  process.exit(2)
}

function readInput(file: string | undefined): string {
  try {
    return readFileSync(file ?? 0, 'utf8')
  } catch {
    return fail('unreadable_input', file ? `Cannot read the file ${file}` : 'Cannot read the input from stdin')
  }
}

function main(): void {
  const text = readInput(process.argv[2])
  let raw: unknown
  try {
    raw = JSON.parse(text)
  } catch {
    fail('invalid_json', 'The input is not valid JSON')
  }
  const outcome = runCalculation(raw)
  if (!outcome.ok) {
    process.stdout.write(`${JSON.stringify(outcome.error, null, 2)}\n`)
    process.exit(2)
  }
  process.stdout.write(`${JSON.stringify(outcome.result, null, 2)}\n`)
}

try {
  main()
} catch {
  fail('calculation_failed', 'The calculation could not be completed for this input')
}

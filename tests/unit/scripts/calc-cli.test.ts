import { afterAll, describe, expect, it } from 'vitest'
import { spawnSync } from 'node:child_process'
import { mkdtempSync, rmSync, writeFileSync } from 'node:fs'
import { tmpdir } from 'node:os'
import { join } from 'node:path'
import { SAMPLE_INPUT } from '../engine/lineset-input.js'

const root = join(import.meta.dirname, '..', '..', '..')
const calc = (args: string[], input?: string) =>
  spawnSync(process.execPath, ['--import', 'tsx', 'scripts/calc.ts', ...args], {
    cwd: root,
    input,
    encoding: 'utf8',
    timeout: 30000,
  })
const folder = mkdtempSync(join(tmpdir(), 'loftledger-calc-'))
afterAll(() => rmSync(folder, { recursive: true, force: true }))
const file = (name: string, text: string) => {
  const path = join(folder, name)
  writeFileSync(path, text)
  return path
}

// Each case starts Node with tsx (twice in one case), which on a busy machine takes seconds: the process's own
// 30 s limit, not vitest's 5 s default, is what bounds a case.
describe('calc CLI', { timeout: 70_000 }, () => {
  it('when given a valid file, then it prints the result JSON and exits 0', () => {
    const run = calc([file('valid.json', JSON.stringify(SAMPLE_INPUT))])
    expect(run.status).toBe(0)
    expect(JSON.parse(run.stdout)).toMatchObject({ units: 'imperial', totalLoad: 1208.8 })
  })

  it('when given invalid input, then it prints the error shape naming the field and exits 2 without a stack trace', () => {
    const run = calc([file('invalid.json', JSON.stringify({ ...SAMPLE_INPUT, units: 'cubits' }))])
    expect(run.status).toBe(2)
    const body = JSON.parse(run.stdout)
    expect(body.error.code).toBe('validation_failed')
    expect(Object.keys(body.error.fields)).toContain('units')
    expect(run.stdout + run.stderr).not.toMatch(/\n\s+at /)
  })

  it('when the file is not JSON or cannot be read, then it exits 2 with the error shape', () => {
    const bad = calc([file('bad.json', '{ not json')])
    expect(bad.status).toBe(2)
    expect(JSON.parse(bad.stdout).error.code).toBe('invalid_json')
    const missing = calc([join(folder, 'missing.json')])
    expect(missing.status).toBe(2)
    expect(JSON.parse(missing.stdout).error).toHaveProperty('fields')
  })

  it('when no file is named, then it reads the input from stdin', () => {
    const run = calc([], JSON.stringify(SAMPLE_INPUT))
    expect(run.status).toBe(0)
    expect(JSON.parse(run.stdout).lineLoads).toHaveLength(5)
  })
})

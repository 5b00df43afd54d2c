import { describe, expect, it } from 'vitest'
import { loadConfig } from '../../server/config.js'

const base = { DATABASE_URL: 'postgres://x@127.0.0.1/x', SESSION_SECRET: 'a-session-secret-of-at-least-32-characters' }

describe('server configuration', () => {
  it('when TRUST_PROXY is absent, false, true or a count, then it becomes a number of trusted hops', () => {
    expect(loadConfig(base).trustProxy).toBe(0)
    expect(loadConfig({ ...base, TRUST_PROXY: 'false' }).trustProxy).toBe(0)
    expect(loadConfig({ ...base, TRUST_PROXY: 'true' }).trustProxy).toBe(1) // one proxy, never "trust every hop"
    expect(loadConfig({ ...base, TRUST_PROXY: '2' }).trustProxy).toBe(2)
  })

  it('when a setting is wrong, then the error names every variable at fault', () => {
    expect(() => loadConfig({ TRUST_PROXY: 'lots' })).toThrow(/DATABASE_URL[\s\S]*SESSION_SECRET[\s\S]*TRUST_PROXY/)
  })
})

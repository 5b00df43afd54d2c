import { afterEach, describe, expect, it, vi } from 'vitest'
import type { AxiosAdapter, InternalAxiosRequestConfig } from 'axios'
import { api, setCsrfToken, whenSignedOut } from '../../src/api/client'
import { ApiError } from '../../src/api/errors'

const seen: InternalAxiosRequestConfig[] = []

/** Answers every request with the given status and body, remembering what was sent. */
function answer(status: number, data: unknown): AxiosAdapter {
  return async (config) => {
    seen.push(config)
    const response = { status, data, statusText: '', headers: {}, config }
    if (status >= 400) throw Object.assign(new Error(`status ${status}`), { isAxiosError: true, response, config })
    return response
  }
}

afterEach(() => {
  seen.length = 0
  setCsrfToken('')
  whenSignedOut(() => {})
})

/** Answers each request in turn with the next of the given answers. */
function answers(...replies: [number, unknown][]): AxiosAdapter {
  return async (config) => {
    const [status, data] = replies[Math.min(seen.length, replies.length - 1)] ?? [500, {}]
    return answer(status, data)(config)
  }
}

describe('api client', () => {
  it('when the server refuses a stale CSRF token, then the current token is read and the write is sent once more', async () => {
    api.defaults.adapter = answers(
      [403, { error: { code: 'csrf_failed', message: 'Bad token' } }],
      [200, { user: null, csrfToken: 'token-new' }],
      [200, { saved: true }],
    )
    setCsrfToken('token-old')
    const reply = await api.post('/session', { email: 'crew@example.test' })
    expect(reply.data).toEqual({ saved: true })
    expect(seen.map((config) => config.method)).toEqual(['post', 'get', 'post'])
    expect(seen[2]?.headers.get('X-CSRF-Token')).toBe('token-new')
  })

  it('when the fresh token is refused as well, then the refusal reaches the screen instead of a loop', async () => {
    api.defaults.adapter = answers(
      [403, { error: { code: 'csrf_failed', message: 'Bad token' } }],
      [200, { user: null, csrfToken: 'token-new' }],
      [403, { error: { code: 'csrf_failed', message: 'Bad token' } }],
    )
    await expect(api.put('/venue', {})).rejects.toMatchObject({ code: 'csrf_failed' })
    expect(seen).toHaveLength(3)
  })

  it('when a write is sent, then it carries the latest CSRF token, and a read does not', async () => {
    api.defaults.adapter = answer(200, {})
    setCsrfToken('token-2')
    await api.put('/venue', {})
    await api.get('/linesets')
    expect(seen[0]?.headers.get('X-CSRF-Token')).toBe('token-2')
    expect(seen[1]?.headers.get('X-CSRF-Token')).toBeUndefined()
    expect(seen[0]?.withCredentials).toBe(true)
  })

  it('when the session has lapsed, then the sign-in-again handler runs and the error keeps its code', async () => {
    const signedOut = vi.fn()
    whenSignedOut(signedOut)
    api.defaults.adapter = answer(401, { error: { code: 'not_signed_in', message: 'Sign in first' } })
    const failure = await api.get('/linesets').catch((thrown: unknown) => thrown)
    expect(failure).toBeInstanceOf(ApiError)
    expect(failure).toMatchObject({ status: 401, code: 'not_signed_in', message: 'Sign in first' })
    expect(signedOut).toHaveBeenCalledOnce()
  })

  it('when the credentials are wrong, then the person is not sent away from the sign-in form', async () => {
    const signedOut = vi.fn()
    whenSignedOut(signedOut)
    api.defaults.adapter = answer(401, { error: { code: 'bad_credentials', message: 'No match' } })
    await expect(api.post('/session', {})).rejects.toMatchObject({ code: 'bad_credentials' })
    expect(signedOut).not.toHaveBeenCalled()
  })

  it('when a field is refused, then the field messages arrive with the error', async () => {
    api.defaults.adapter = answer(400, {
      error: { code: 'validation_failed', message: 'Check', fields: { 'pickPoints.2': 'Beyond the end' } },
    })
    await expect(api.post('/linesets', {})).rejects.toMatchObject({
      status: 400,
      fields: { 'pickPoints.2': 'Beyond the end' },
    })
  })
})

import axios, { isAxiosError, type InternalAxiosRequestConfig } from 'axios'
import type { SessionState } from '../../shared/schemas/index.js'
import { toApiError } from './errors'

/** The one HTTP client: same-origin cookies, the CSRF header on writes, and every failure as an ApiError. */
export const api = axios.create({
  baseURL: '/api/v1',
  withCredentials: true,
  headers: { Accept: 'application/json' },
})

let csrfToken = ''
let signedOutHandler: () => void = () => {}

/** Keeps the token from the latest session answer; the session id (and so the token) changes at sign-in. */
export function setCsrfToken(token: string) {
  csrfToken = token
}

export const hasCsrfToken = () => csrfToken !== ''

/** Registers what "sign in again" means; the app wires this once, at start. */
export function whenSignedOut(handler: () => void) {
  signedOutHandler = handler
}

const WRITES = new Set(['post', 'put', 'patch', 'delete'])

api.interceptors.request.use((config) => {
  if (WRITES.has((config.method ?? 'get').toLowerCase()) && csrfToken) config.headers.set('X-CSRF-Token', csrfToken)
  return config
})

type Retried = InternalAxiosRequestConfig & { csrfRetried?: boolean }

/**
 * A refused token means the session behind it ended (signed out in another tab, expired, server restarted):
 * read the session's current token and try the write once more; the server still decides who may write.
 */
async function retryWithFreshToken(config: Retried) {
  const { data } = await api.get<SessionState>('/session')
  setCsrfToken(data.csrfToken)
  return api.request({ ...config, csrfRetried: true } as Retried)
}

api.interceptors.response.use(undefined, (thrown: unknown) => {
  const error = toApiError(thrown)
  const config = isAxiosError(thrown) ? (thrown.config as Retried | undefined) : undefined
  if (error.status === 403 && error.code === 'csrf_failed' && config && !config.csrfRetried)
    return retryWithFreshToken(config)
  // Only a lapsed session sends the person back to sign in; wrong credentials stay on the sign-in form.
  if (error.status === 401 && error.code === 'not_signed_in') signedOutHandler()
  return Promise.reject(error)
})

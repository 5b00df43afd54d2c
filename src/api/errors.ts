import { isAxiosError } from 'axios'
import type { ErrorBody } from '../../shared/errors/fields.js'

/** Every failed request reaches the screens as one of these, whatever went wrong underneath. */
export class ApiError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields: Record<string, string> = {},
  ) {
    super(message)
    this.name = 'ApiError'
  }
}

const isErrorBody = (data: unknown): data is ErrorBody =>
  typeof data === 'object' && data !== null && typeof (data as ErrorBody).error?.message === 'string'

/** Turns anything a request may throw into an ApiError with words a person can act on. */
export function toApiError(thrown: unknown): ApiError {
  if (thrown instanceof ApiError) return thrown
  if (isAxiosError(thrown)) {
    const status = thrown.response?.status ?? 0
    const data: unknown = thrown.response?.data
    if (isErrorBody(data)) return new ApiError(status, data.error.code, data.error.message, data.error.fields)
    if (status === 0)
      return new ApiError(0, 'network_error', 'Cannot reach the server. Check the connection and try again.')
    return new ApiError(status, 'unexpected_answer', `The server answered with an unexpected error (${status}).`)
  }
  return new ApiError(0, 'client_error', thrown instanceof Error ? thrown.message : 'Something went wrong.')
}

/** The message to show for a failure, whatever its type. */
export const errorMessage = (thrown: unknown) => toApiError(thrown).message

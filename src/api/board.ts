import type { Board, BoardQuery, LatestPreRunCheck, PreRunCheck, PreRunCheckInput } from '../../shared/schemas/index.js'
import { api } from './client'

/** Where the board's server-sent events are read (EventSource speaks to it directly, not through axios). */
export const BOARD_STREAM_URL = '/api/v1/board/stream'

export const boardApi = {
  /** The whole board, one production's linesets, or one lineset (`linesetId`) after a live event. */
  read: (query: BoardQuery = {}) => api.get<Board>('/board', { params: query }).then((r) => r.data),
}

export const preRunChecksApi = {
  list: (limit?: number) => api.get<PreRunCheck[]>('/pre-run-checks', { params: { limit } }).then((r) => r.data),
  /** The last check and every change since it. */
  latest: () => api.get<LatestPreRunCheck>('/pre-run-checks/latest').then((r) => r.data),
  record: (body: PreRunCheckInput) => api.post<PreRunCheck>('/pre-run-checks', body).then((r) => r.data),
}

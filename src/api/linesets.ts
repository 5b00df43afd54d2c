import type {
  Lineset,
  LinesetDetail,
  LinesetEventsPage,
  LinesetInput,
  LinesetListItem,
  LinesetUpdate,
} from '../../shared/schemas/index.js'
import { api } from './client'

export const linesetsApi = {
  list: () => api.get<LinesetListItem[]>('/linesets').then((r) => r.data),
  read: (id: string) => api.get<LinesetDetail>(`/linesets/${encodeURIComponent(id)}`).then((r) => r.data),
  create: (body: LinesetInput) => api.post<Lineset>('/linesets', body).then((r) => r.data),
  update: (id: string, body: LinesetUpdate) =>
    api.put<Lineset>(`/linesets/${encodeURIComponent(id)}`, body).then((r) => r.data),
  remove: (id: string) => api.delete(`/linesets/${encodeURIComponent(id)}`).then(() => undefined),
  /** A page of the lineset's history, newest first; pass the previous page's `next` as `before`. */
  events: (id: string, page: { limit?: number; before?: string } = {}) =>
    api.get<LinesetEventsPage>(`/linesets/${encodeURIComponent(id)}/events`, { params: page }).then((r) => r.data),
}

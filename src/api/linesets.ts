import type { Lineset, LinesetInput, LinesetUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const linesetsApi = {
  list: () => api.get<Lineset[]>('/linesets').then((r) => r.data),
  read: (id: string) => api.get<Lineset>(`/linesets/${encodeURIComponent(id)}`).then((r) => r.data),
  create: (body: LinesetInput) => api.post<Lineset>('/linesets', body).then((r) => r.data),
  update: (id: string, body: LinesetUpdate) =>
    api.put<Lineset>(`/linesets/${encodeURIComponent(id)}`, body).then((r) => r.data),
  remove: (id: string) => api.delete(`/linesets/${encodeURIComponent(id)}`).then(() => undefined),
}

import type { BrickType, BrickTypeInput, BrickTypeUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const brickTypesApi = {
  list: () => api.get<BrickType[]>('/brick-types').then((r) => r.data),
  create: (body: BrickTypeInput) => api.post<BrickType>('/brick-types', body).then((r) => r.data),
  update: (id: string, body: BrickTypeUpdate) =>
    api.put<BrickType>(`/brick-types/${encodeURIComponent(id)}`, body).then((r) => r.data),
  remove: (id: string) => api.delete(`/brick-types/${encodeURIComponent(id)}`).then(() => undefined),
}

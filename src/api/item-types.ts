import type { ItemType, ItemTypeInput, ItemTypeUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const itemTypesApi = {
  list: () => api.get<ItemType[]>('/item-types').then((r) => r.data),
  create: (body: ItemTypeInput) => api.post<ItemType>('/item-types', body).then((r) => r.data),
  update: (id: string, body: ItemTypeUpdate) =>
    api.put<ItemType>(`/item-types/${encodeURIComponent(id)}`, body).then((r) => r.data),
  /** Retires the type: saved hangs that use it keep it, new hangs cannot choose it. */
  retire: (id: string) => api.delete(`/item-types/${encodeURIComponent(id)}`).then(() => undefined),
}

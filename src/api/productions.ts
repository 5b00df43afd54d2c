import type { Production, ProductionInput, ProductionUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const productionsApi = {
  list: () => api.get<Production[]>('/productions').then((r) => r.data),
  create: (body: ProductionInput) => api.post<Production>('/productions', body).then((r) => r.data),
  update: (id: string, body: ProductionUpdate) =>
    api.put<Production>(`/productions/${encodeURIComponent(id)}`, body).then((r) => r.data),
}

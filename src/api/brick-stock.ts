import type { BrickStockLine } from '../../shared/schemas/index.js'
import { api } from './client'

export const brickStockApi = {
  list: () => api.get<BrickStockLine[]>('/brick-stock').then((r) => r.data),
}

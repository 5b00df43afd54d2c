import type { HangRevision, HangSave, HangSummary } from '../../shared/schemas/index.js'
import { api } from './client'

const hangsOf = (linesetId: string) => `/linesets/${encodeURIComponent(linesetId)}/hangs`

export const hangsApi = {
  /** Every saved revision of a lineset's hang, newest first. */
  list: (linesetId: string) => api.get<HangSummary[]>(hangsOf(linesetId)).then((r) => r.data),
  read: (linesetId: string, hangId: string) =>
    api.get<HangRevision>(`${hangsOf(linesetId)}/${encodeURIComponent(hangId)}`).then((r) => r.data),
  /** Saves a new revision; a stale `basedOnRevision` answers 409 `stale_revision` with the latest number. */
  save: (linesetId: string, body: HangSave) => api.post<HangRevision>(hangsOf(linesetId), body).then((r) => r.data),
}

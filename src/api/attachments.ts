import type { Attachment } from '../../shared/schemas/index.js'
import { api } from './client'

const linesetPath = (linesetId: string) => `/linesets/${encodeURIComponent(linesetId)}/attachments`
const attachmentPath = (id: string) => `/attachments/${encodeURIComponent(id)}`

export const attachmentsApi = {
  list: (linesetId: string) => api.get<Attachment[]>(linesetPath(linesetId)).then((r) => r.data),
  /** Sends one file as a form; `onProgress` hears the share sent so far, 0 to 1. */
  upload: (linesetId: string, file: File, onProgress: (sent: number) => void, hangItemId?: string) => {
    const form = new FormData()
    if (hangItemId) form.append('hangItemId', hangItemId)
    form.append('file', file, file.name)
    return api
      .post<Attachment>(linesetPath(linesetId), form, {
        onUploadProgress: (event) => onProgress(event.total ? event.loaded / event.total : (event.progress ?? 0)),
      })
      .then((r) => r.data)
  },
  remove: (id: string) => api.delete(attachmentPath(id)).then(() => undefined),
  /** Where the browser downloads the file itself (same origin, the session cookie goes with it). */
  contentUrl: (id: string) => `${api.defaults.baseURL}${attachmentPath(id)}/content`,
  thumbnailUrl: (id: string) => `${api.defaults.baseURL}${attachmentPath(id)}/thumbnail`,
}

import type { Person, PersonUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

/** The venue's members. Adding someone is an invitation: see `invitations.ts`. */
export const peopleApi = {
  list: () => api.get<Person[]>('/people').then((r) => r.data),
  update: (id: string, body: PersonUpdate) =>
    api.put<Person>(`/people/${encodeURIComponent(id)}`, body).then((r) => r.data),
  remove: (id: string) => api.delete(`/people/${encodeURIComponent(id)}`).then(() => undefined),
}

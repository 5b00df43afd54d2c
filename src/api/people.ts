import type { Person, PersonInput, PersonUpdate } from '../../shared/schemas/index.js'
import { api } from './client'

export const peopleApi = {
  list: () => api.get<Person[]>('/people').then((r) => r.data),
  add: (body: PersonInput) => api.post<Person>('/people', body).then((r) => r.data),
  update: (id: string, body: PersonUpdate) =>
    api.put<Person>(`/people/${encodeURIComponent(id)}`, body).then((r) => r.data),
  remove: (id: string) => api.delete(`/people/${encodeURIComponent(id)}`).then(() => undefined),
}

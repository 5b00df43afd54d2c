import type {
  Invitation,
  InvitationAccept,
  InvitationPreview,
  PersonInput,
  SessionState,
} from '../../shared/schemas/index.js'
import { api } from './client'

export const invitationsApi = {
  /** Invites a person (`POST /people`); the answer never says whether the address has an account. */
  send: (body: PersonInput) => api.post<Invitation>('/people', body).then((r) => r.data),
  listPending: () => api.get<Invitation[]>('/invitations').then((r) => r.data),
  withdraw: (id: string) => api.delete(`/invitations/${encodeURIComponent(id)}`).then(() => undefined),
  lookup: (token: string) => api.post<InvitationPreview>('/invitations/lookup', { token }).then((r) => r.data),
  /** Accepting signs the person in to the venue they joined. */
  accept: (body: InvitationAccept) => api.post<SessionState>('/invitations/accept', body).then((r) => r.data),
}

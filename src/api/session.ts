import type { SessionState, SignIn } from '../../shared/schemas/index.js'
import { api } from './client'

export const sessionApi = {
  read: () => api.get<SessionState>('/session').then((r) => r.data),
  signIn: (body: SignIn) => api.post<SessionState>('/session', body).then((r) => r.data),
  signOut: () => api.delete('/session').then(() => undefined),
}

import type {
  ArborContents,
  ArborCount,
  Lockout,
  LockoutInput,
  LockoutReleaseInput,
} from '../../shared/schemas/index.js'
import { api } from './client'

const arborOf = (id: string) => `/linesets/${encodeURIComponent(id)}/arbor`
const lockoutOf = (id: string) => `/linesets/${encodeURIComponent(id)}/lockout`

/** What a counterweight arbor holds, and a lineset's lock-out. */
export const arborsApi = {
  read: (linesetId: string) => api.get<ArborContents>(arborOf(linesetId)).then((r) => r.data),
  count: (linesetId: string, body: ArborCount) => api.put<ArborContents>(arborOf(linesetId), body).then((r) => r.data),
  lockOut: (linesetId: string, body: LockoutInput) => api.post<Lockout>(lockoutOf(linesetId), body).then((r) => r.data),
  /** Releases a lock-out with what was checked or fixed (the body rides on the DELETE). */
  release: (linesetId: string, body: LockoutReleaseInput) =>
    api.delete(lockoutOf(linesetId), { data: body }).then(() => undefined),
}

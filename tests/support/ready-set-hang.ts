import { DEMO_PASSWORD } from '../../server/db/seeders/demo-people.js'
import { signedIn } from './test-app.js'

/** A demo lineset as the list gives it, with the fields these set-ups read. */
export interface ReadySet {
  id: string
  number: number
  kind: string
  operatingStatus: string
  battenLength: number
}

/**
 * Signs a demo member in over HTTP and saves a new hang revision on the first ready single-purchase set, so a
 * browser test has a lineset whose batten carries what it needs; `items` is given the set to place them along it.
 */
export async function saveHangOnReadySet(
  appUrl: string,
  email: string,
  title: string,
  items: (set: ReadySet) => Array<Record<string, unknown>>,
) {
  const api = await signedIn(appUrl, email, DEMO_PASSWORD)
  const sets = (await api.get('/api/v1/linesets').expect(200)).body as ReadySet[]
  const set = sets.find((s) => s.kind === 'counterweight-single' && s.operatingStatus === 'ready')!
  const hangs = (await api.get(`/api/v1/linesets/${set.id}/hangs`).expect(200)).body as { revision: number }[]
  const hang = await api
    .post(`/api/v1/linesets/${set.id}/hangs`, {
      title,
      basedOnRevision: hangs[0]?.revision ?? null,
      items: items(set),
      unitSystem: 'imperial',
    })
    .expect(201)
  return { api, set, hangId: hang.body.id as string }
}

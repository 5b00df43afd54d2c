import { describe, expect, it } from 'vitest'
import { sampleLineset } from '../support/fixtures.js'
import { inviteAndAccept } from '../support/invitations.js'
import { saveRevision } from '../support/tickets.js'
import { venueSuite } from '../support/venue-suite.js'

const suite = venueSuite('administrator')

const statuses = (answers: Array<{ status: number }>) => answers.map((res) => res.status).sort()
const times = <T>(count: number, request: () => Promise<T>) => Promise.all(Array.from({ length: count }, request))

describe('every state change takes effect once under races', () => {
  it('when a lineset is retired by 20 requests at once, then one answers 204, the rest 404, and the ledger records one retirement', async () => {
    const lineset = (await suite.client.post('/api/v1/linesets', sampleLineset(20)).expect(201)).body
    const answers = await times(20, () => suite.client.delete(`/api/v1/linesets/${lineset.id}`))
    expect(statuses(answers)).toEqual([204, ...Array<number>(19).fill(404)])
    const retirements = await suite.app.handle.db.models.LinesetEvent.count({
      where: { linesetId: lineset.id, eventType: 'lineset-retired' },
    })
    expect(retirements).toBe(1)
  })

  it('when a brick type is deleted by 20 requests at once, then one answers 204 and the rest 404', async () => {
    const brick = (
      await suite.client
        .post('/api/v1/brick-types', {
          name: 'Raced',
          material: 'Steel',
          unitWeight: 20,
          thickness: 2,
          quantityOwned: 1,
          unitSystem: 'imperial',
        })
        .expect(201)
    ).body
    const answers = await times(20, () => suite.client.delete(`/api/v1/brick-types/${brick.id}`))
    expect(statuses(answers)).toEqual([204, ...Array<number>(19).fill(404)])
  })

  it('when a person is removed by 10 requests at once, then one answers 204 and the rest 404', async () => {
    await inviteAndAccept(suite.app, suite.client, {
      email: 'leaving@alpha.test',
      name: 'Leaving',
      role: 'stage-manager',
    })
    const person = (await suite.client.get('/api/v1/people').expect(200)).body.find(
      (p: { email: string }) => p.email === 'leaving@alpha.test',
    )
    const answers = await times(10, () => suite.client.delete(`/api/v1/people/${person.id}`))
    expect(statuses(answers)).toEqual([204, ...Array<number>(9).fill(404)])
  })

  it('when the venue settings are saved by 10 requests from one version, then one answers 200 and the rest 409', async () => {
    const settings = (await suite.client.get('/api/v1/venue').expect(200)).body
    const answers = await times(10, () => suite.client.put('/api/v1/venue', { ...settings, name: 'Raced venue' }))
    expect(statuses(answers)).toEqual([200, ...Array<number>(9).fill(409)])
    expect((await suite.client.get('/api/v1/venue').expect(200)).body.version).toBe(settings.version + 1)
  })

  it('when a brick type is saved by 10 requests from one version, then one answers 200 and the rest 409', async () => {
    const current = (await suite.client.get('/api/v1/brick-types').expect(200)).body[0]
    const answers = await times(10, () =>
      suite.client.put(`/api/v1/brick-types/${current.id}`, { ...current, quantityOwned: 7 }),
    )
    expect(statuses(answers)).toEqual([200, ...Array<number>(9).fill(409)])
  })

  it('when an invitation is withdrawn by 10 requests at once, then one answers 204 and the rest 404', async () => {
    const sent = (
      await suite.client.post('/api/v1/people', { email: 'maybe@alpha.test', name: 'M', role: 'stage-manager' })
    ).body
    const answers = await times(10, () => suite.client.delete(`/api/v1/invitations/${sent.id}`))
    expect(statuses(answers)).toEqual([204, ...Array<number>(9).fill(404)])
  })

  it('when a change ticket is withdrawn by 10 requests at once, then one answers 200, the rest 409 naming the state, and the ledger records one withdrawal', async () => {
    const linesetId = suite.venue.linesetId
    const hang = await saveRevision(suite.client, linesetId, null, 200)
    const ticket = (await suite.client.post('/api/v1/tickets', { hangId: hang.id }).expect(201)).body
    const answers = await times(10, () => suite.client.post(`/api/v1/tickets/${ticket.id}/withdraw`, { version: 0 }))
    expect(statuses(answers)).toEqual([200, ...Array<number>(9).fill(409)])
    const withdrawals = await suite.app.handle.db.models.LinesetEvent.count({
      where: { linesetId, eventType: 'ticket-withdrawn' },
    })
    expect(withdrawals).toBe(1)
  })
})

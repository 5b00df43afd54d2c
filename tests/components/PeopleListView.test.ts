import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Invitation, Person } from '../../shared/schemas/index.js'
import { invitationsApi } from '../../src/api/invitations'
import { peopleApi } from '../../src/api/people'
import PeopleListView from '../../src/views/PeopleListView.vue'
import { useSessionStore } from '../../src/stores/session'
import { mountWithApp } from './mount'
import { personWith } from './fixtures'

vi.mock('../../src/api/people', () => ({ peopleApi: { list: vi.fn(), update: vi.fn(), remove: vi.fn() } }))
vi.mock('../../src/api/invitations', () => ({
  invitationsApi: { send: vi.fn(), listPending: vi.fn(), withdraw: vi.fn(), lookup: vi.fn(), accept: vi.fn() },
}))

const me: Person = { ...personWith('administrator'), userId: personWith('administrator').id, version: 0 }
const invitation = (email: string, overrides: Partial<Invitation> = {}): Invitation => ({
  id: `inv-${email}`,
  email,
  name: 'Sam Rigger',
  role: 'fly-operator',
  state: 'pending',
  createdAt: '2099-01-01T00:00:00.000Z',
  expiresAt: '2099-01-08T00:00:00.000Z',
  ...overrides,
})

let wrapper: VueWrapper | undefined
beforeEach(() => {
  vi.mocked(peopleApi.list).mockResolvedValue([me])
  vi.mocked(invitationsApi.listPending).mockResolvedValue([invitation('waiting@example.test')])
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openPeople() {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith('administrator')
  wrapper = mountWithApp(PeopleListView, { global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

const rows = (w: VueWrapper) =>
  w.findAll('[data-testid="invitations-table"] tbody tr').map((row) => row.findAll('td').map((cell) => cell.text()))

describe('PeopleListView', () => {
  it('when invitations wait for an answer, then they are listed apart from the members, with when their link stops working', async () => {
    const w = await openPeople()
    expect(rows(w)).toEqual([['Sam Rigger', 'waiting@example.test', 'Fly operator', '8 Jan 2099', 'Withdraw']])
  })

  it('when an administrator invites a person, then the dialog asks for no password and the invitation joins the list', async () => {
    vi.mocked(invitationsApi.send).mockResolvedValue(invitation('new@example.test', { name: 'New Person' }))
    const w = await openPeople()
    await w.get('[data-testid="people-add"]').trigger('click')
    await flushPromises()
    expect(document.querySelector('[data-testid="person-password"]')).toBeNull()
    expect(document.querySelector('[data-testid="person-invitation-note"]')?.textContent).toMatch(/invitation/)
    const type = (testid: string, value: string) => {
      const field = document.querySelector<HTMLInputElement>(`[data-testid="${testid}"] input`)!
      field.value = value
      field.dispatchEvent(new Event('input'))
    }
    type('person-email', 'New@Example.test')
    type('person-name', 'New Person')
    document.querySelector<HTMLButtonElement>('[data-testid="person-save"]')!.click()
    await flushPromises()
    expect(invitationsApi.send).toHaveBeenCalledWith({
      email: 'new@example.test',
      name: 'New Person',
      role: 'fly-operator',
    })
    expect(rows(w).map((row) => row[1])).toEqual(['new@example.test', 'waiting@example.test'])
  })

  it('when an invitation is withdrawn, then it leaves the list', async () => {
    vi.mocked(invitationsApi.withdraw).mockResolvedValue(undefined)
    const w = await openPeople()
    await w.get('[data-testid="invitation-withdraw"]').trigger('click')
    await flushPromises()
    expect(invitationsApi.withdraw).toHaveBeenCalledWith('inv-waiting@example.test')
    expect(w.find('[data-testid="invitations"]').exists()).toBe(false)
  })
})

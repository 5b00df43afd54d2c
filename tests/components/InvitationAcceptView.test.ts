import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { PASSWORD_RULE, type InvitationPreview } from '../../shared/schemas/index.js'
import { ApiError } from '../../src/api/errors'
import { invitationsApi } from '../../src/api/invitations'
import InvitationAcceptView from '../../src/views/InvitationAcceptView.vue'
import { useSessionStore } from '../../src/stores/session'
import { mountWithApp } from './mount'
import { personWith } from './fixtures'
import { testRouter } from './router'

vi.mock('../../src/api/invitations', () => ({
  invitationsApi: { send: vi.fn(), listPending: vi.fn(), withdraw: vi.fn(), lookup: vi.fn(), accept: vi.fn() },
}))

const TOKEN = 'a-token-long-enough-for-the-schema'
const preview = (overrides: Partial<InvitationPreview> = {}): InvitationPreview => ({
  email: 'new@example.test',
  name: 'Sam Rigger',
  role: 'fly-operator',
  venueName: 'Harbour Street Playhouse',
  hasAccount: false,
  expiresAt: '2099-01-08T00:00:00.000Z',
  ...overrides,
})

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openInvitation() {
  const pinia = createPinia()
  setActivePinia(pinia)
  const router = testRouter()
  await router.push(`/invitation/${TOKEN}`)
  wrapper = mountWithApp(InvitationAcceptView, { props: { token: TOKEN }, global: { plugins: [pinia, router] } })
  await flushPromises()
  return { w: wrapper, router }
}

const type = (w: VueWrapper, testid: string, value: string) => w.get(`[data-testid="${testid}"] input`).setValue(value)

describe('InvitationAcceptView', () => {
  it('when a new address opens its link, then it chooses a name and password, and accepting signs it in to the venue', async () => {
    vi.mocked(invitationsApi.lookup).mockResolvedValue(preview())
    const member = { ...personWith('fly-operator'), email: 'new@example.test', name: 'Sam R.' }
    vi.mocked(invitationsApi.accept).mockResolvedValue({ user: member, csrfToken: 'fresh' })
    const { w, router } = await openInvitation()
    expect(w.get('[data-testid="invitation-summary"]').text()).toBe(
      'Harbour Street Playhouse invites new@example.test as fly operator.',
    )
    expect((w.get('[data-testid="invitation-name"] input').element as HTMLInputElement).value).toBe('Sam Rigger')
    await type(w, 'invitation-name', 'Sam R.')
    await type(w, 'invitation-password', 'a-long-enough-password')
    await w.get('form').trigger('submit')
    await flushPromises()
    expect(invitationsApi.accept).toHaveBeenCalledWith({
      token: TOKEN,
      name: 'Sam R.',
      password: 'a-long-enough-password',
    })
    expect(useSessionStore().user).toEqual(member)
    expect(router.currentRoute.value.name).toBe('linesets-list')
  })

  it('when a new address chooses a password that breaks the rule, then the page says the rule and sends nothing', async () => {
    vi.mocked(invitationsApi.lookup).mockResolvedValue(preview())
    const { w } = await openInvitation()
    const rule = w.get('[data-testid="invitation-password-rule"]')
    expect(rule.text()).toBe(PASSWORD_RULE)
    expect(w.get('[data-testid="invitation-password"] input').attributes('aria-describedby')).toBe(
      rule.attributes('id'),
    )
    await type(w, 'invitation-password', 'short')
    await w.get('form').trigger('submit')
    await flushPromises()
    expect(w.get('[data-testid="invitation-password"]').text()).toContain('At least 12 characters')
    // The whole rule stays in view beside the message, not in place of it.
    expect(w.get('[data-testid="invitation-password-rule"]').text()).toBe(PASSWORD_RULE)
    await type(w, 'invitation-password', 'New@Example.test')
    await w.get('form').trigger('submit')
    await flushPromises()
    expect(w.get('[data-testid="invitation-password"]').text()).toContain("Must not be the account's e-mail address")
    expect(invitationsApi.accept).not.toHaveBeenCalled()
  })

  it('when the address has an account, then only its password is asked for, and signed in as it nothing is', async () => {
    vi.mocked(invitationsApi.lookup).mockResolvedValue(preview({ hasAccount: true }))
    const { w } = await openInvitation()
    expect(w.find('[data-testid="invitation-name"]').exists()).toBe(false)
    expect(w.get('[data-testid="invitation-password"]').text()).toMatch(/Password of your account/)
    expect(w.get('[data-testid="invitation-password-rule"]').text()).toMatch(/already has an account/)

    useSessionStore().user = { ...personWith('stage-manager'), email: 'new@example.test' }
    await flushPromises()
    expect(w.find('[data-testid="invitation-password"]').exists()).toBe(false)
  })

  it('when the link has been used or has expired, then the page says so and offers nothing to submit', async () => {
    vi.mocked(invitationsApi.lookup).mockRejectedValue(
      new ApiError(410, 'invitation_unusable', 'This invitation link has been used, withdrawn or has expired'),
    )
    const { w } = await openInvitation()
    expect(w.get('[data-testid="invitation-unusable"]').text()).toMatch(/used, withdrawn or has expired/)
    expect(w.find('[data-testid="invitation-submit"]').exists()).toBe(false)
  })
})

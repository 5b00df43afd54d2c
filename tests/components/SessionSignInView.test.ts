import { readFileSync } from 'node:fs'
import { join } from 'node:path'
import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { ApiError } from '../../src/api/errors'
import { sessionApi } from '../../src/api/session'
import { hasCsrfToken } from '../../src/api/client'
import SessionSignInView from '../../src/views/SessionSignInView.vue'
import { testRouter } from './router'
import { useSessionStore } from '../../src/stores/session'
import { mountWithApp } from './mount'
import { personWith } from './fixtures'

vi.mock('../../src/api/session', () => ({ sessionApi: { read: vi.fn(), signIn: vi.fn(), signOut: vi.fn() } }))

let wrapper: VueWrapper | undefined
beforeEach(() => vi.mocked(sessionApi.read).mockResolvedValue({ user: null, csrfToken: 'token-before-sign-in' }))
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openSignIn(redirect?: string) {
  const pinia = createPinia()
  setActivePinia(pinia)
  const router = testRouter()
  await router.push({ name: 'session-sign-in', query: redirect ? { redirect } : {} })
  wrapper = mountWithApp(SessionSignInView, { global: { plugins: [pinia, router] } })
  // The page fetches its form schema after it appears; a person takes longer to type than that takes.
  await import('../../shared/schemas/session.js')
  return { w: wrapper, router }
}

async function signIn(w: VueWrapper, email: string, password: string) {
  await w.get('[data-testid="sign-in-email"] input').setValue(email)
  await w.get('[data-testid="sign-in-password"] input').setValue(password)
  await w.get('[data-testid="sign-in-form"]').trigger('submit')
  await flushPromises()
}

/** Puts index.html's own plain sign-in form on the page, as typed in before the app mounted. */
function typeOnPlainForm(email: string, password: string, { pressed = false } = {}) {
  const page = new DOMParser().parseFromString(readFileSync(join(process.cwd(), 'index.html'), 'utf8'), 'text/html')
  const early = document.importNode(page.getElementById('early-sign-in')!, true)
  early.hidden = false
  document.body.appendChild(early)
  early.querySelector<HTMLInputElement>('input[name=email]')!.value = email
  const passwordField = early.querySelector<HTMLInputElement>('input[name=password]')!
  passwordField.value = password
  passwordField.focus()
  if (pressed) early.querySelector('form')!.setAttribute('data-submitted', 'true')
}

describe('SessionSignInView taking over the plain form', () => {
  it('when someone typed on the plain form, then the app form holds what they typed, the caret stays in its field and the plain form is gone', async () => {
    typeOnPlainForm('crew@example.test', 'half-typ')
    const { w } = await openSignIn()
    await flushPromises()
    const password = w.get('[data-testid="sign-in-password"] input').element as HTMLInputElement
    expect((w.get('[data-testid="sign-in-email"] input').element as HTMLInputElement).value).toBe('crew@example.test')
    expect(password.value).toBe('half-typ')
    expect(document.activeElement).toBe(password)
    expect(document.getElementById('early-sign-in')).toBeNull()
    expect(document.querySelectorAll('[data-testid="sign-in-form"]')).toHaveLength(1)
    expect(sessionApi.signIn).not.toHaveBeenCalled()
  })

  it('when Sign in was pressed on the plain form, then the app signs in with it at once and goes where asked', async () => {
    vi.mocked(sessionApi.signIn).mockResolvedValue({ user: personWith('fly-operator'), csrfToken: 'fresh-token' })
    typeOnPlainForm('crew@example.test', 'correct horse battery', { pressed: true })
    const { router } = await openSignIn('/bricks')
    await flushPromises()
    expect(sessionApi.signIn).toHaveBeenCalledWith({ email: 'crew@example.test', password: 'correct horse battery' })
    await vi.waitFor(() => expect(router.currentRoute.value.fullPath).toBe('/bricks'))
  })

  it('when Sign in was pressed with the fields empty, then the app form names what is missing', async () => {
    typeOnPlainForm('', '', { pressed: true })
    const { w } = await openSignIn()
    await flushPromises()
    expect(w.get('[data-testid="sign-in-email"]').find('.v-messages').text()).not.toBe('')
    expect(sessionApi.signIn).not.toHaveBeenCalled()
  })
})

describe('SessionSignInView', () => {
  it('when the page appears and nothing has focus, then the e-mail field takes it once and the form says it is ready', async () => {
    const { w } = await openSignIn()
    await flushPromises()
    expect(document.activeElement).toBe(w.get('[data-testid="sign-in-email"] input').element)
    expect(w.get('[data-testid="sign-in-form"]').attributes('data-ready')).toBe('true')
  })

  it('when someone is already typing elsewhere as the page appears, then focus stays where they are', async () => {
    const elsewhere = document.createElement('input')
    document.body.appendChild(elsewhere)
    elsewhere.focus()
    const { w } = await openSignIn()
    await flushPromises()
    expect(document.activeElement).toBe(elsewhere)
    expect(w.get('[data-testid="sign-in-form"]').attributes('data-ready')).toBe('true')
    elsewhere.remove()
  })

  it('when the e-mail address is not one, then the form says so without asking the server', async () => {
    const { w } = await openSignIn()
    expect(w.text()).toContain('Loftledger')
    await signIn(w, 'not-an-address', 'whatever')
    expect(w.get('[data-testid="sign-in-email"]').find('.v-messages').text()).toBe('Enter a valid e-mail address')
    expect(sessionApi.signIn).not.toHaveBeenCalled()
  })

  it('when the credentials are wrong, then a clear message shows and the password is cleared', async () => {
    vi.mocked(sessionApi.signIn).mockRejectedValue(new ApiError(401, 'bad_credentials', 'Wrong e-mail or password'))
    const { w } = await openSignIn()
    await signIn(w, 'crew@example.test', 'not the password')
    expect(w.get('[data-testid="sign-in-problem"]').text()).toBe(
      'That e-mail address and password do not match an account here.',
    )
    expect((w.get('[data-testid="sign-in-password"] input').element as HTMLInputElement).value).toBe('')
  })

  it("when there were too many attempts, then the server's words say how long to wait", async () => {
    const wait = 'Too many failed sign-ins for this e-mail address; try again in 8 seconds'
    vi.mocked(sessionApi.signIn).mockRejectedValue(new ApiError(429, 'too_many_attempts', wait))
    const { w } = await openSignIn()
    await signIn(w, 'crew@example.test', 'guess')
    expect(w.get('[data-testid="sign-in-problem"]').text()).toBe(wait)
  })

  it('when sign-in succeeds, then the new token is kept and the person returns to the page they asked for', async () => {
    vi.mocked(sessionApi.signIn).mockResolvedValue({ user: personWith('fly-operator'), csrfToken: 'fresh-token' })
    const { w, router } = await openSignIn('/bricks')
    await signIn(w, ' Crew@Example.test ', 'correct horse battery')
    expect(sessionApi.signIn).toHaveBeenCalledWith({ email: 'crew@example.test', password: 'correct horse battery' })
    expect(useSessionStore().user?.role).toBe('fly-operator')
    expect(router.currentRoute.value.fullPath).toBe('/bricks')
  })

  it('when the person signed out before, then a fresh token is read first, so the next sign-in is not refused', async () => {
    vi.mocked(sessionApi.signIn).mockResolvedValue({ user: personWith('stage-manager'), csrfToken: 'fresh-token' })
    vi.mocked(sessionApi.signOut).mockResolvedValue(undefined)
    const { w } = await openSignIn()
    await signIn(w, 'crew@example.test', 'correct horse battery')
    await useSessionStore().signOut()
    expect(hasCsrfToken()).toBe(false)
    vi.mocked(sessionApi.read).mockClear()
    await useSessionStore().signIn({ email: 'crew@example.test', password: 'correct horse battery' })
    expect(sessionApi.read).toHaveBeenCalledOnce()
    expect(vi.mocked(sessionApi.read).mock.invocationCallOrder[0]).toBeLessThan(
      vi.mocked(sessionApi.signIn).mock.invocationCallOrder.at(-1) ?? 0,
    )
    expect(useSessionStore().user?.role).toBe('stage-manager')
  })

  it('when the redirect points at another site, then the person lands on the linesets instead', async () => {
    vi.mocked(sessionApi.signIn).mockResolvedValue({ user: personWith('fly-operator'), csrfToken: 'fresh-token' })
    const { w, router } = await openSignIn('//elsewhere.example/steal')
    await signIn(w, 'crew@example.test', 'correct horse battery')
    expect(router.currentRoute.value.name).toBe('linesets-list')
  })
})

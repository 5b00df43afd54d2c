import { afterEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { OutboxMessageSummary } from '../../shared/schemas/index.js'
import { outboxApi } from '../../src/api/outbox'
import { useSessionStore } from '../../src/stores/session'
import OutboxListView from '../../src/views/OutboxListView.vue'
import { personWith } from './fixtures'
import { mountWithApp } from './mount'

vi.mock('../../src/api/outbox', () => ({ outboxApi: { list: vi.fn(), get: vi.fn() } }))

const message = (id: string, overrides: Partial<OutboxMessageSummary> = {}): OutboxMessageSummary => ({
  id,
  to: ['td@example.test'],
  subject: 'A change to decide',
  createdAt: '2031-03-14T12:00:00.000Z',
  state: 'sent',
  attempts: 1,
  lastError: null,
  sentAt: '2031-03-14T12:00:01.000Z',
  ...overrides,
})

const waiting = message('m-waiting', {
  to: ['new.hand@example.test', 'td@example.test'],
  subject: 'Join Harbour Street Playhouse on Loftledger',
  state: 'waiting',
  attempts: 2,
  lastError: 'The mail server did not take the message: connect ECONNREFUSED 127.0.0.1:2525',
  sentAt: null,
})
const failed = message('m-failed', { state: 'failed', attempts: 10, lastError: 'Mailbox unavailable', sentAt: null })

let wrapper: VueWrapper | undefined
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function openOutbox(messages: OutboxMessageSummary[]) {
  vi.mocked(outboxApi.list).mockResolvedValue(messages)
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith('administrator')
  wrapper = mountWithApp(OutboxListView, { global: { plugins: [pinia] } })
  await flushPromises()
  return wrapper
}

describe('OutboxListView', () => {
  it('when messages are listed, then each shows its delivery state in words with an icon, its recipients, subject and attempts', async () => {
    const w = await openOutbox([waiting, message('m-sent'), failed])
    const states = w.findAll('[data-testid="outbox-state"]')
    expect(states.map((chip) => chip.text())).toEqual(['Waiting to be sent', 'Sent', 'Not delivered, gave up'])
    expect(
      states.map((chip) =>
        chip
          .find('.v-icon')
          .classes()
          .find((c) => c.startsWith('mdi-')),
      ),
    ).toEqual(['mdi-email-sync-outline', 'mdi-email-check-outline', 'mdi-email-alert-outline'])
    const first = w.get('[data-testid="outbox-message-m-waiting"]')
    expect(first.get('[data-testid="outbox-recipients"]').text()).toBe('To new.hand@example.test, td@example.test')
    expect(first.get('[data-testid="outbox-subject"]').text()).toBe('Join Harbour Street Playhouse on Loftledger')
    expect(first.get('[data-testid="outbox-times"]').text()).toContain('2 attempts')
    expect(first.get('[data-testid="outbox-last-error"]').text()).toBe(
      'Last attempt: The mail server did not take the message: connect ECONNREFUSED 127.0.0.1:2525',
    )
    expect(outboxApi.list).toHaveBeenCalledWith({ limit: 50 })
  })

  it('when a waiting message is opened, then its text and when it is tried again are shown', async () => {
    vi.mocked(outboxApi.get).mockResolvedValue({
      ...waiting,
      text: 'Hello,\n\nTo accept, open this link:\nhttp://127.0.0.1:3000/invitation/abc',
      nextAttemptAt: '2031-03-14T12:01:00.000Z',
    })
    const w = await openOutbox([waiting])
    await w.get('[data-testid="outbox-message-m-waiting"] button').trigger('click')
    await flushPromises()
    expect(outboxApi.get).toHaveBeenCalledWith('m-waiting')
    expect(w.get('[data-testid="outbox-body"]').text()).toBe(
      'Hello,\n\nTo accept, open this link:\nhttp://127.0.0.1:3000/invitation/abc',
    )
    expect(w.get('[data-testid="outbox-next-attempt"]').text()).toMatch(/^Tried again from 14 Mar 2031/)
  })

  it('when no mail has been written, then the page says so', async () => {
    const w = await openOutbox([])
    expect(w.get('[data-testid="outbox-empty"]').text()).toBe('No e-mail has been written yet.')
    expect(w.find('[data-testid="outbox-more"]').exists()).toBe(false)
  })

  it('when a full page came back, then older messages can be asked for after the last one', async () => {
    const page = Array.from({ length: 50 }, (_, n) => message(`m-${n}`))
    const w = await openOutbox(page)
    vi.mocked(outboxApi.list).mockResolvedValue([message('m-older', { subject: 'The oldest' })])
    await w.get('[data-testid="outbox-more"]').trigger('click')
    await flushPromises()
    expect(outboxApi.list).toHaveBeenLastCalledWith({ limit: 50, before: 'm-49' })
    expect(w.findAll('[data-testid="outbox-subject"]').at(-1)!.text()).toBe('The oldest')
    expect(w.find('[data-testid="outbox-more"]').exists()).toBe(false)
  })
})

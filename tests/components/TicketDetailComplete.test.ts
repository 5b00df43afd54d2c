import { afterEach, describe, expect, it } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import type { TicketView } from '../../shared/schemas/index.js'
import TicketDetailComplete from '../../src/components/TicketDetailComplete.vue'
import TicketDetailPlan from '../../src/components/TicketDetailPlan.vue'
import { fieldProblemLines } from '../../src/composables/fieldWords'
import { mountWithApp } from './mount'
import { FULL, HALF, ticket } from './ticketFixtures'

// The fixture plans 14 Full steel (20 lb) and 1 Half steel (10 lb) for 3.5 lb batten heavy, single purchase,
// with a 10 lb tolerance (invented figures).
let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

const loading = ticket({ state: 'loading', version: 2 })
const mountForm = (props: Partial<{ fields: Record<string, string> }> = {}) =>
  (wrapper = mountWithApp(TicketDetailComplete, { props: { ticket: loading, busy: false, ...props } }))
const find = (w: VueWrapper, id: string) => w.find(`[data-testid="${id}"]`)
const typeCount = async (w: VueWrapper, type: string, value: string) => {
  await w.find(`[data-testid="ticket-loaded-${type}"] input`).setValue(value)
  await flushPromises()
}
const finish = async (w: VueWrapper) => {
  await w.find('[data-testid="ticket-felt-balanced"] input').setValue(true)
  await find(w, 'ticket-finish').trigger('click')
  await flushPromises()
}

describe('TicketDetailComplete: counts that differ from the plan', () => {
  it('when the counts are the plan, then no warning shows, the balance they give is said, and no flag is sent', async () => {
    const w = mountForm()
    expect(find(w, 'ticket-differs').exists()).toBe(false)
    expect(find(w, 'ticket-recorded-balance').text()).toContain('3.5 lb batten heavy')
    expect(find(w, 'ticket-recorded-balance').text()).toContain("within the venue's tolerance of 10 lb")
    await finish(w)
    const sent = w.emitted('complete')
    expect(sent).toHaveLength(1)
    expect(sent![0]![0]).not.toHaveProperty('differsFromPlan')
  })

  it('when a half count is typed as 12, then the type, the plan and the balance are said and nothing is sent until confirmed', async () => {
    const w = mountForm()
    await typeCount(w, HALF, '12')
    const warning = find(w, 'ticket-differs')
    expect(warning.exists()).toBe(true)
    expect(w.findAll('[data-testid="ticket-differs-brick"]').map((li) => li.text())).toEqual([
      '12 × Half steel recorded, the plan was 1',
    ])
    // 11 half bricks more than planned: 3.5 - 11 x 10 = 106.5 lb arbor heavy, beyond the 10 lb tolerance.
    const balance = find(w, 'ticket-differs-balance').text()
    expect(balance).toContain('106.5 lb arbor heavy')
    expect(balance).toContain("beyond the venue's tolerance of 10 lb")
    expect(balance).toContain('The plan expected 3.5 lb batten heavy')
    expect(w.text()).toContain('Not the plan: 12 recorded, the plan was 1')
    await finish(w)
    expect(w.emitted('complete')).toBeUndefined()
    expect(find(w, 'ticket-differs-confirm').text()).toContain('tick this to record counts that differ from the plan')
    await w.find('[data-testid="ticket-differs-confirm"] input').setValue(true)
    await find(w, 'ticket-finish').trigger('click')
    await flushPromises()
    expect(w.emitted('complete')).toEqual([
      [
        {
          loaded: [
            { brickTypeId: FULL, count: 14 },
            { brickTypeId: HALF, count: 12 },
          ],
          feltBalance: 'balanced',
          differsFromPlan: true,
        },
      ],
    ])
  })

  it('when the counts change after confirming, then the confirmation is asked again; put back to the plan, the warning goes', async () => {
    const w = mountForm()
    await typeCount(w, FULL, '15')
    await w.find('[data-testid="ticket-differs-confirm"] input').setValue(true)
    await typeCount(w, HALF, '2')
    expect((w.find('[data-testid="ticket-differs-confirm"] input').element as HTMLInputElement).checked).toBe(false)
    expect(w.findAll('[data-testid="ticket-differs-brick"]')).toHaveLength(2)
    await typeCount(w, FULL, '14')
    await typeCount(w, HALF, '1')
    expect(find(w, 'ticket-differs').exists()).toBe(false)
  })

  it('when the server refuses the counts as differing, then its word shows at the confirmation', async () => {
    const w = mountForm({
      fields: { differsFromPlan: 'Confirm the counts that differ from the plan, or correct them' },
    })
    await typeCount(w, FULL, '16')
    expect(find(w, 'ticket-differs-confirm').text()).toContain('Confirm the counts that differ from the plan')
  })
})

describe('TicketDetailPlan once loaded', () => {
  const show = (shown: TicketView) => (wrapper = mountWithApp(TicketDetailPlan, { props: { ticket: shown } }))

  it('when the recorded counts differ, then the balance they give stands first and the plan expected one beside it', () => {
    const w = show(ticket({ state: 'loaded', loadedOutOfBalance: -106.5 }))
    expect(find(w, 'ticket-loaded-balance').text()).toContain('106.5 lb arbor heavy')
    expect(find(w, 'ticket-loaded-balance').text()).toContain("beyond the venue's tolerance of 10 lb")
    expect(find(w, 'ticket-expected-balance').text()).toBe(
      'The plan expected 3.5 lb batten heavy; the counts recorded differ from the plan.',
    )
  })

  it('when the ticket is not loaded yet, then only the expected balance shows', () => {
    const w = show(ticket({ state: 'loading' }))
    expect(find(w, 'ticket-loaded-balance').exists()).toBe(false)
    expect(find(w, 'ticket-expected-balance').text()).toContain('Expected once loaded: 3.5 lb batten heavy')
  })
})

const mountRefused = (error: string, fields: Record<string, string>) =>
  (wrapper = mountWithApp(TicketDetailComplete, {
    props: { ticket: ticket({ state: 'loading', version: 2 }), busy: false, error, fields },
  }))

describe('TicketDetailComplete: refusals in words', () => {
  it('when the server refuses a brick count, then the message names the brick type, never the field path', () => {
    const words = 'Bricks loaded must be a whole number between 0 and 2,000'
    const w = mountRefused(`${words}.`, { 'loaded.0.count': words })
    const alert = w.get('[data-testid="ticket-complete-error"]').text()
    expect(alert).toBe('Full steel: bricks loaded must be a whole number between 0 and 2,000')
    expect(alert).not.toMatch(/loaded\.0|Check this field/)
    expect(w.get(`[data-testid="ticket-loaded-${FULL}"]`).text()).toContain(words)
  })

  it('when the felt balance and a row are refused, then each line is named as the form names it', () => {
    const w = mountRefused('2 entries need a change', {
      'loaded.1.brickTypeId': 'Choose a brick type',
      feltBalance: 'Choose how the set felt',
    })
    expect(w.get('[data-testid="ticket-complete-error"]').text()).toBe(
      'Half steel: choose a brick typeBalance felt at the rail: choose how the set felt',
    )
  })

  it('when the refusal has no fields, then the server’s words show as they are', () => {
    const w = mountRefused(
      'This ticket has already been loaded. Only a ticket being loaded can be recorded as loaded.',
      {},
    )
    expect(w.get('[data-testid="ticket-complete-error"]').text()).toBe(
      'This ticket has already been loaded. Only a ticket being loaded can be recorded as loaded.',
    )
  })
})

describe('fieldProblemLines', () => {
  it('when a message already names the row, then it is not named twice; unknown paths keep their words', () => {
    const nameOf = ([field]: readonly string[]) => (field === 'bricks' ? 'Full steel brick' : undefined)
    expect(
      fieldProblemLines(
        { 'bricks.0.count': 'Not enough "Full steel brick" in storage', version: 'Version must be a whole number' },
        nameOf,
      ),
    ).toEqual(['Not enough "Full steel brick" in storage', 'Version must be a whole number'])
  })
})

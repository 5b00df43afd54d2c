import { afterEach, describe, expect, it } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import TicketDetailComplete from '../../src/components/TicketDetailComplete.vue'
import { fieldProblemLines } from '../../src/composables/fieldWords'
import { mountWithApp } from './mount'
import { FULL, ticket } from './ticketFixtures'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

const mountForm = (error: string, fields: Record<string, string>) =>
  (wrapper = mountWithApp(TicketDetailComplete, {
    props: { ticket: ticket({ state: 'loading', version: 2 }), busy: false, error, fields },
  }))

describe('TicketDetailComplete: refusals in words', () => {
  it('when the server refuses a brick count, then the message names the brick type, never the field path', () => {
    const words = 'Bricks loaded must be a whole number between 0 and 2,000'
    const w = mountForm(`${words}.`, { 'loaded.0.count': words })
    const alert = w.get('[data-testid="ticket-complete-error"]').text()
    expect(alert).toBe('Full steel: bricks loaded must be a whole number between 0 and 2,000')
    expect(alert).not.toMatch(/loaded\.0|Check this field/)
    expect(w.get(`[data-testid="ticket-loaded-${FULL}"]`).text()).toContain(words)
  })

  it('when the felt balance and a row are refused, then each line is named as the form names it', () => {
    const w = mountForm('2 entries need a change', {
      'loaded.1.brickTypeId': 'Choose a brick type',
      feltBalance: 'Choose how the set felt',
    })
    expect(w.get('[data-testid="ticket-complete-error"]').text()).toBe(
      'Half steel: choose a brick typeBalance felt at the rail: choose how the set felt',
    )
  })

  it('when the refusal has no fields, then the server’s words show as they are', () => {
    const w = mountForm(
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

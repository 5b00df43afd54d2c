import { afterEach, describe, expect, it } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { nextTick } from 'vue'
import { PASSWORD_RULE } from '../../shared/schemas/person.js'
import PeopleListAddDialog from '../../src/components/PeopleListAddDialog.vue'
import { mountWithApp } from './mount'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

async function openDialog() {
  wrapper = mountWithApp(PeopleListAddDialog, { props: { modelValue: false, busy: false, error: null } })
  await wrapper.setProps({ modelValue: true }) // opening resets the form, as the people page does
  await flushPromises()
  return wrapper
}

function type(testid: string, value: string) {
  const input = document.querySelector<HTMLInputElement>(`[data-testid="${testid}"] input`)!
  input.value = value
  input.dispatchEvent(new Event('input'))
}

const messageOf = (testid: string) =>
  document.querySelector(`[data-testid="${testid}"]`)?.closest('.v-input')?.querySelector('.v-messages')?.textContent

describe('PeopleListAddDialog', () => {
  it('when the dialog opens, then the password rule is said beside the password field', async () => {
    await openDialog()
    expect(messageOf('person-password')).toContain(PASSWORD_RULE)
  })

  it("when the password breaks the rule or spells the person's e-mail, then the form names it and sends nothing", async () => {
    const w = await openDialog()
    type('person-email', 'rail.hand@venue.test')
    type('person-name', 'Rail Hand')
    type('person-password', 'short')
    document.querySelector<HTMLButtonElement>('[data-testid="person-save"]')!.click()
    await nextTick()
    expect(messageOf('person-password')).toBe('At least 12 characters')
    type('person-password', 'Rail.Hand@Venue.test')
    await nextTick()
    expect(messageOf('person-password')).toBe("Must not be the account's e-mail address")
    expect(w.emitted('add')).toBeUndefined()
    type('person-password', 'a-rope-lock-that-holds')
    document.querySelector<HTMLButtonElement>('[data-testid="person-save"]')!.click()
    await nextTick()
    expect(w.emitted('add')?.[0]?.[0]).toMatchObject({
      email: 'rail.hand@venue.test',
      password: 'a-rope-lock-that-holds',
    })
  })
})

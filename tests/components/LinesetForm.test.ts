import { afterEach, describe, expect, it } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { linesetInputSchema, type LinesetInput } from '../../shared/schemas/index.js'
import LinesetForm from '../../src/components/LinesetForm.vue'
import { mountWithApp } from './mount'

/** A complete single-purchase set in imperial figures (made up for the test). */
const counterweightSet: LinesetInput = {
  number: 12,
  name: 'Main drape',
  kind: 'counterweight-single',
  status: 'in-service',
  distanceFromPlasterLine: 6.5,
  battenLength: 40,
  pipeSize: 'custom',
  pipeWeightPerLength: 2.72,
  pipeMomentOfInertia: 0.31,
  pipeSectionModulus: 0.326,
  pickPoints: [5, 15, 25, 35],
  liftLineWeightPerLength: null,
  liftLineBreakingStrength: null,
  arborEmptyWeight: 90,
  arborCapacity: 1200,
  arborStackLength: null,
  ratedLoad: 1000,
  pipeWeight: 110,
  travel: null,
  sandbagWeight: null,
  hoistRatedCapacity: null,
  hoistSpeed: null,
  notes: '',
}

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

function mountForm(props: Record<string, unknown> = {}) {
  wrapper = mountWithApp(LinesetForm, { props: { unitSystem: 'imperial', ...props } })
  return wrapper
}

const input = (w: VueWrapper, testid: string) => w.get(`[data-testid="${testid}"] input`)
const messagesOf = (w: VueWrapper, testid: string) => w.get(`[data-testid="${testid}"]`).find('.v-messages').text()

async function submit(w: VueWrapper) {
  await w.get('form').trigger('submit')
  await flushPromises()
}

describe('LinesetForm', () => {
  it('when a pick point lies beyond the end of the batten, then its own field shows the schema message', async () => {
    const w = mountForm({ initial: counterweightSet })
    const third = input(w, 'lineset-pick-point-2')
    await third.setValue('44')
    await third.trigger('blur')
    await flushPromises()
    expect(messagesOf(w, 'lineset-pick-point-2')).toBe('Lies beyond the end of the batten')
    expect(messagesOf(w, 'lineset-pick-point-1')).toBe('')
  })
})

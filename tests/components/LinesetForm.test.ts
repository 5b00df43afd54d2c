import { afterEach, describe, expect, it } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { linesetInputSchemaFor, type LinesetInput } from '../../shared/schemas/index.js'
import LinesetForm from '../../src/components/LinesetForm.vue'
import { lineset } from './fixtures'
import { mountWithApp } from './mount'

/** A complete single-purchase set in imperial figures: the shared made-up fixture with hand-entered pipe figures. */
const {
  id: _id,
  version: _version,
  updatedAt: _updatedAt,
  ...counterweightSet
} = lineset({
  pipeSize: 'custom',
  pipeMomentOfInertia: 0.31,
  pipeSectionModulus: 0.326,
})

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
    expect(messagesOf(w, 'lineset-pick-point-2')).toBe("Pick point at 44 is beyond the batten's length of 40")
    expect(messagesOf(w, 'lineset-pick-point-1')).toBe('')
  })

  it('when a counterweight set is submitted without arbor figures, then both arbor fields say they are needed and nothing is sent', async () => {
    const w = mountForm({ initial: { ...counterweightSet, arborEmptyWeight: null, arborCapacity: null } })
    await submit(w)
    expect(messagesOf(w, 'lineset-field-arborEmptyWeight')).toBe('A counterweight set needs its arbor empty weight')
    expect(messagesOf(w, 'lineset-field-arborCapacity')).toBe('A counterweight set needs its arbor capacity')
    expect(w.find('[data-testid="lineset-form-problems"]').exists()).toBe(true)
    expect(w.emitted('submit')).toBeUndefined()
  })

  it('when the set is hemp, then the arbor section is hidden, the sandbag section shows, and arbor figures are sent empty', async () => {
    const w = mountForm({ initial: { ...counterweightSet, kind: 'hemp-multi', sandbagWeight: 20 } })
    expect(w.find('[data-testid="lineset-section-arbor"]').exists()).toBe(false)
    expect(w.find('[data-testid="lineset-section-sandbag"]').exists()).toBe(true)
    expect(w.find('[data-testid="lineset-section-hoist"]').exists()).toBe(false)
    await submit(w)
    const [body] = w.emitted<[LinesetInput]>('submit')?.[0] ?? []
    expect(body).toMatchObject({
      kind: 'hemp-multi',
      sandbagWeight: 20,
      arborEmptyWeight: null,
      arborCapacity: null,
      pipeWeight: null,
    })
  })

  it('when every field is valid, then submitting emits a body the shared schema accepts unchanged', async () => {
    const w = mountForm({ initial: counterweightSet })
    await input(w, 'lineset-field-name').setValue('  Border 3  ')
    await input(w, 'lineset-field-travel').setValue('52.5')
    await submit(w)
    const [body] = w.emitted<[LinesetInput]>('submit')?.[0] ?? []
    expect(body).toEqual({ ...counterweightSet, name: 'Border 3', travel: 52.5 })
    expect(linesetInputSchemaFor('imperial').parse(body)).toEqual(body)
  })

  it('when a required figure is cleared and the field is left, then it asks for a number', async () => {
    const w = mountForm({ initial: counterweightSet })
    const length = input(w, 'lineset-field-battenLength')
    await length.setValue('')
    await length.trigger('blur')
    expect(messagesOf(w, 'lineset-field-battenLength')).toBe('Batten length is required')
  })

  it('when the server names a field, then its message shows at that position until the field is changed', async () => {
    const w = mountForm({ initial: counterweightSet, serverFields: { 'pickPoints.1': 'Too close to the next line' } })
    await flushPromises()
    expect(messagesOf(w, 'lineset-pick-point-1')).toBe('Too close to the next line')
    await input(w, 'lineset-pick-point-1').setValue('14')
    expect(messagesOf(w, 'lineset-pick-point-1')).toBe('')
  })

  it('when lines are added and spread evenly, then they sit between the first and last line in equal steps', async () => {
    const w = mountForm({ initial: { ...counterweightSet, pickPoints: [2, 38] } })
    await w.get('[data-testid="lineset-add-pick-point"]').trigger('click')
    await w.get('[data-testid="lineset-add-pick-point"]').trigger('click')
    expect(w.findAll('[data-testid^="lineset-pick-point-"]')).toHaveLength(4)
    await w.get('[data-testid="lineset-remove-pick-point-3"]').trigger('click')
    await input(w, 'lineset-pick-point-2').setValue('38')
    await input(w, 'lineset-pick-point-1').setValue('')
    await w.get('[data-testid="lineset-spread-pick-points"]').trigger('click')
    const shown = [0, 1, 2].map((index) => (input(w, `lineset-pick-point-${index}`).element as HTMLInputElement).value)
    expect(shown).toEqual(['2', '20', '38'])
  })

  it('when the form is read-only, then no save, cancel or lift line controls are offered and fields cannot be typed in', () => {
    const w = mountForm({ initial: counterweightSet, readonly: true })
    for (const testid of [
      'lineset-save',
      'lineset-cancel',
      'lineset-add-pick-point',
      'lineset-spread-pick-points',
      'lineset-remove-pick-point-0',
    ])
      expect(w.find(`[data-testid="${testid}"]`).exists(), testid).toBe(false)
    expect(input(w, 'lineset-field-name').attributes('readonly')).toBeDefined()
    expect(input(w, 'lineset-pick-point-0').attributes('readonly')).toBeDefined()
    expect((input(w, 'lineset-field-name').element as HTMLInputElement).value).toBe('Main drape')
  })

  it('when figures are shown in metric, then every suffix carries the metric unit', () => {
    const w = mountForm({ initial: counterweightSet, unitSystem: 'metric' })
    const suffix = (testid: string) => w.get(`[data-testid="${testid}"] .v-text-field__suffix`).text()
    expect(suffix('lineset-field-battenLength')).toBe('m')
    expect(suffix('lineset-field-arborCapacity')).toBe('kg')
    expect(suffix('lineset-field-pipeWeightPerLength')).toBe('kg/m')
    expect(suffix('lineset-field-arborStackLength')).toBe('mm')
    expect(suffix('lineset-field-pipeMomentOfInertia')).toBe('mm⁴')
  })

  it('when metric figures carry six decimals, then fields show crew-sized figures and an untouched field saves as read', async () => {
    // 1200 lb and 48 ft as the API answers them in metric (NIST SP 811 factors, rounded to six places by the API).
    const metricSet: LinesetInput = {
      ...counterweightSet,
      battenLength: 14.6304,
      pickPoints: [1.2192, 4.2672, 7.3152, 10.3632],
      pipeWeightPerLength: 4.047806,
      pipeMomentOfInertia: 129031.74193,
      pipeSectionModulus: 5342.182864,
      arborCapacity: 635.029318,
      ratedLoad: 544.310844,
      unitSystem: 'metric',
    }
    const w = mountForm({ initial: metricSet, unitSystem: 'metric' })
    const shown = (testid: string) => (input(w, testid).element as HTMLInputElement).value
    expect(shown('lineset-field-ratedLoad')).toBe('544.31')
    expect(shown('lineset-field-pipeMomentOfInertia')).toBe('129032')
    expect(shown('lineset-pick-point-0')).toBe('1.219')
    await input(w, 'lineset-field-arborCapacity').setValue('640')
    await submit(w)
    const [body] = w.emitted<[LinesetInput]>('submit')?.[0] ?? []
    expect(body).toEqual({ ...metricSet, arborCapacity: 640 })
  })
})

describe('LinesetForm: how the lift lines stretch', () => {
  it('when lengths and a rope are entered, then the body carries them and a line added keeps one length per line', async () => {
    const w = mountForm({ initial: { ...counterweightSet, pickPoints: [5, 15, 25, 35] } })
    for (const [index, length] of ['50', '60', '70', '80'].entries())
      await input(w, `lineset-line-length-${index}`).setValue(length)
    await input(w, 'lineset-field-liftLineAxialStiffness').setValue('300000')
    await submit(w)
    const [body] = w.emitted<[LinesetInput]>('submit')?.[0] ?? []
    expect(body).toMatchObject({ liftLineLengths: [50, 60, 70, 80], liftLineAxialStiffness: 300000 })
    await w.get('[data-testid="lineset-add-pick-point"]').trigger('click')
    expect(w.findAll('[data-testid^="lineset-line-length-"]')).toHaveLength(5)
  })

  it('when only some lengths are entered, then the blank one asks for a number', async () => {
    const w = mountForm({ initial: counterweightSet })
    await input(w, 'lineset-line-length-0').setValue('50')
    await submit(w)
    expect(w.emitted('submit')).toBeUndefined()
    expect(messagesOf(w, 'lineset-line-length-1')).toBe('Lift line length is required')
  })
})

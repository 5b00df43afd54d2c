import { afterEach, describe, expect, it } from 'vitest'
import type { VueWrapper } from '@vue/test-utils'
import { runCalculation } from '../../shared/engine/calculate.js'
import LinesetBalanceResults from '../../src/components/LinesetBalanceResults.vue'
import { mountWithApp } from './mount'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

const set = {
  units: 'imperial',
  kind: 'counterweight-single',
  arbor: { emptyWeight: 90, capacity: 2000, stackLength: 60 },
  bricks: [{ name: 'full', weight: 20, thickness: 2, available: 80 }],
  liftLine: { breakingStrength: 7000, designFactor: 8 },
  tolerance: 10,
}
const resultOf = (raw: object) => {
  const outcome = runCalculation({ ...set, ...raw })
  if (!outcome.ok) throw new Error(JSON.stringify(outcome.error))
  return outcome.result
}
const show = (raw: object) =>
  mountWithApp(LinesetBalanceResults, { props: { result: resultOf(raw), problems: [], rowProblems: false } })

describe('LinesetBalanceResults with a slack line (issue 13)', () => {
  it('when a line goes slack, then the words name it first and the loads once slack stand beside the rigid ones', () => {
    // Issue 13's 49 ft batten: line 1 at 2 ft goes slack and line 2 then carries 449.5 lb.
    wrapper = show({
      batten: { length: 49, weightPerLength: 2.72, pickPoints: [2, 11, 20, 29, 38, 47] },
      items: [{ weight: 450, at: 12 }],
    })
    expect(wrapper.get('[data-testid="balance-slack-summary"]').text()).toBe(
      'Lift line 1 (at 2 ft) goes slack: a rope cannot push, so the batten\'s weight moves onto the other lines. Read the column "Once slack" for what each line then carries.',
    )
    expect(wrapper.get('[data-testid="balance-line-0-load"]').text()).toBe('-3.08 lb')
    expect(wrapper.get('[data-testid="balance-line-0-slack-load"]').text()).toBe('0 lb · slack')
    expect(wrapper.get('[data-testid="balance-line-1-slack-load"]').text()).toBe('449.5 lb')
    expect(wrapper.text()).toContain('The other lines then carry 449.5 lb at 11 ft')
    expect(wrapper.find('[data-testid="balance-batten-tips"]').exists()).toBe(false)
  })

  it('when the batten would tip, then that is said plainly at the top and no counterweight plan is shown', () => {
    wrapper = show({ batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10] }, items: [] })
    const tips = wrapper.get('[data-testid="balance-batten-tips"]')
    expect(tips.text()).toContain('This batten would tip')
    expect(tips.text()).toContain('the centre of its load, at 20 ft, lies beyond the end line at 10 ft, so it tips')
    expect(wrapper.find('[data-testid="balance-counterweight"]').exists()).toBe(false)
    expect(wrapper.find('[data-testid="balance-slack-summary"]').exists()).toBe(false)
  })

  it('when no line is slack, then the table shows one load column as before', () => {
    wrapper = show({ batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40] }, items: [] })
    expect(wrapper.find('[data-testid="balance-slack-summary"]').exists()).toBe(false)
    expect(wrapper.find('[data-testid="balance-line-0-slack-load"]').exists()).toBe(false)
    expect(wrapper.find('[data-testid="balance-counterweight"]').exists()).toBe(true)
  })
})

describe('LinesetBalanceResults with lift lines that stretch (issue 13 §3)', () => {
  const even = {
    batten: { length: 40, weightPerLength: 2.72, pickPoints: [0, 10, 20, 30, 40], pipeSize: 'nps-1-1/2-sch40' },
    items: [{ weightPerLength: 25, from: 0, to: 40 }],
  }

  it('when stretching moves a load by more than 10 %, then the caution words come first and the basis is named', () => {
    wrapper = show({
      ...even,
      liftLine: { ...set.liftLine, lengths: [40, 50, 60, 70, 80], rope: '7x19-galvanized-1/8' },
    })
    const caution = wrapper.get('[data-testid="balance-stretch-caution"]').text()
    expect(caution).toMatch(
      /^Caution: lift lines stretch, and the shorter ones take more\. A line's load moves by up to [\d.]+ %/,
    )
    expect(wrapper.html().indexOf('balance-stretch-caution')).toBeLessThan(
      wrapper.html().indexOf('balance-line-0-load'),
    )
    expect(wrapper.get('[data-testid="balance-line-1-stretch-load"]').text()).toMatch(/^[\d,.]+ lb$/)
    expect(wrapper.get('[data-testid="balance-stretch-basis"]').text()).toContain('(from memory, unverified)')
  })

  it('when the lines are stiff enough, then the stretching loads stand beside the rigid ones without a caution', () => {
    wrapper = show({ ...even, liftLine: { ...set.liftLine, lengths: [20, 20, 20, 20, 20], axialStiffness: 2e8 } })
    expect(wrapper.find('[data-testid="balance-stretch-caution"]').exists()).toBe(false)
    expect(wrapper.get('[data-testid="balance-line-0-stretch-load"]').text()).toBe(
      wrapper.get('[data-testid="balance-line-0-load"]').text(),
    )
    expect(wrapper.get('[data-testid="balance-stretch-basis"]').text()).toContain('rope stiffness (EA) as entered')
  })

  it('when the lineset gives no line lengths, then there is no stretching column', () => {
    wrapper = show(even)
    expect(wrapper.find('[data-testid="balance-line-0-stretch-load"]').exists()).toBe(false)
  })
})

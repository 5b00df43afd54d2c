import { afterEach, describe, expect, it } from 'vitest'
import { ref } from 'vue'
import type { VueWrapper } from '@vue/test-utils'
import LinesetsListTable from '../../src/components/LinesetsListTable.vue'
import { useLinesetFilters } from '../../src/composables/useLinesetFilters'
import { mountWithApp } from './mount'
import { lineset } from './fixtures'

let wrapper: VueWrapper | undefined
afterEach(() => wrapper?.unmount())

const drape = lineset()
const hemp = lineset({
  id: '2c6a8d10-0000-4000-8000-000000000003',
  number: 3,
  name: 'Border lights',
  kind: 'hemp-multi',
  status: 'needs-inspection',
  arborCapacity: null,
  pickPoints: [4, 20, 36],
})

describe('LinesetsListTable', () => {
  it('when the venue is metric, then each figure carries the metric unit and unknown figures show a dash', () => {
    wrapper = mountWithApp(LinesetsListTable, { props: { items: [hemp], unitSystem: 'metric', emptyText: 'None' } })
    const row = wrapper.get('[data-testid="linesets-row-3"]')
    const cells = row.findAll('td').map((cell) => cell.text())
    expect(cells).toEqual([
      '3',
      'Border lights',
      'Hemp, several lines',
      'Due for inspection',
      '—',
      '3',
      '40 m',
      '6.5 m',
      '1,000 kg',
      '—',
    ])
    expect(wrapper.get('thead').text()).toContain('Rated load (kg)')
  })

  it('when the table first shows, then rows are in lineset number order', () => {
    wrapper = mountWithApp(LinesetsListTable, {
      props: { items: [drape, hemp], unitSystem: 'imperial', emptyText: 'None' },
    })
    const numbers = wrapper.findAll('tbody tr').map((row) => row.attributes('data-testid'))
    expect(numbers).toEqual(['linesets-row-3', 'linesets-row-12'])
  })

  it('when a row is clicked, then the table asks to open that lineset', async () => {
    wrapper = mountWithApp(LinesetsListTable, {
      props: { items: [drape, hemp], unitSystem: 'imperial', emptyText: 'None' },
    })
    await wrapper.get('[data-testid="linesets-row-12"]').trigger('click')
    expect(wrapper.emitted('open')).toEqual([[drape]])
  })

  it('when nothing matches, then the empty words are shown', () => {
    wrapper = mountWithApp(LinesetsListTable, {
      props: { items: [], unitSystem: 'imperial', emptyText: 'No lineset matches these filters.' },
    })
    expect(wrapper.get('[data-testid="linesets-empty"]').text()).toBe('No lineset matches these filters.')
  })
})

describe('useLinesetFilters', () => {
  it('when text, kind and status filters are set, then only linesets meeting all of them remain', () => {
    const filters = useLinesetFilters(ref([drape, hemp]))
    filters.text.value = 'border'
    expect(filters.shown.value.map((item) => item.number)).toEqual([3])
    filters.text.value = ''
    filters.kinds.value = ['counterweight-single']
    expect(filters.shown.value.map((item) => item.number)).toEqual([12])
    filters.statuses.value = ['needs-inspection']
    expect(filters.shown.value).toEqual([])
    filters.reset()
    expect(filters.shown.value).toHaveLength(2)
  })

  it('when a lineset comes with its operating status, then the row says it in words with an icon, not colour alone', () => {
    const locked = { ...drape, operatingStatus: 'locked-out' as const, lockout: null }
    const loading = { ...hemp, operatingStatus: 'loading' as const, lockout: null }
    wrapper = mountWithApp(LinesetsListTable, {
      props: { items: [locked, loading], unitSystem: 'imperial', emptyText: 'None' },
    })
    const chip = wrapper.get('[data-testid="linesets-row-12"] [data-testid="operating-locked-out"]')
    expect(chip.text()).toBe('Locked out')
    expect(chip.find('.mdi-lock-outline').exists()).toBe(true)
    expect(wrapper.get('[data-testid="linesets-row-3"] [data-testid="operating-loading"]').text()).toBe(
      'Loading, do not operate',
    )
  })
})

import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { hangsApi } from '../../src/api/hangs'
import { linesetsApi } from '../../src/api/linesets'
import { useSessionStore } from '../../src/stores/session'
import { useVenueStore } from '../../src/stores/venue'
import LinesetHistoryView from '../../src/views/LinesetHistoryView.vue'
import { lineset, linesetDetail, personWith, venue } from './fixtures'
import { addedEvent, hangId, hangRevision, revisionResult, savedEvent, summary } from './historyFixtures'
import { mountWithApp } from './mount'
import { testRouter } from './router'

vi.mock('../../src/api/linesets', () => ({
  linesetsApi: { list: vi.fn(), read: vi.fn(), create: vi.fn(), update: vi.fn(), remove: vi.fn(), events: vi.fn() },
}))
vi.mock('../../src/api/hangs', () => ({ hangsApi: { list: vi.fn(), read: vi.fn(), save: vi.fn() } }))
vi.mock('../../src/api/item-types', () => ({ itemTypesApi: { list: vi.fn(async () => []) } }))

let wrapper: VueWrapper | undefined
beforeEach(() => {
  // Only the clock is fixed (the page says "3 hours ago"); promises and timers run as usual.
  vi.useFakeTimers({ toFake: ['Date'] })
  vi.setSystemTime(new Date('2025-03-03T21:00:00.000Z'))
  vi.mocked(linesetsApi.read).mockResolvedValue(linesetDetail())
  vi.mocked(linesetsApi.events).mockImplementation(async (_id, page = {}) =>
    page.before === '4'
      ? { events: [savedEvent(3, 1), addedEvent], next: null }
      : { events: [savedEvent(5, 3), savedEvent(4, 2)], next: '4' },
  )
  vi.mocked(hangsApi.list).mockResolvedValue([summary(3), summary(2), summary(1)])
  vi.mocked(hangsApi.read).mockImplementation(async (_lineset, id) => hangRevision(Number(id.at(-1))))
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
  vi.useRealTimers()
})

async function openHistory(query = '') {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith('stage-manager')
  useVenueStore().venue = venue
  const router = testRouter()
  await router.push(`/linesets/${lineset().id}/history${query}`)
  wrapper = mountWithApp(LinesetHistoryView, { props: { id: lineset().id }, global: { plugins: [pinia, router] } })
  await flushPromises()
  return { w: wrapper, router }
}

const texts = (w: VueWrapper, testid: string) => w.findAll(`[data-testid="${testid}"]`).map((found) => found.text())
const changeIn = (w: VueWrapper, row: string) =>
  w.get(`[data-testid="comparison-row-${row}"] [data-testid="comparison-change-cell"]`).text()

describe('LinesetHistoryView', () => {
  it('when the history opens, then the newest entries come first, each saying who and when in words', async () => {
    const { w } = await openHistory()
    expect(w.get('[data-testid="page-title"]').text()).toBe('History · Lineset 12 · Main drape')
    expect(texts(w, 'history-event-summary')).toEqual([
      'Saved hang revision 3, “With a practical”',
      'Saved hang revision 2, “After focus”',
    ])
    const when = w.findAll('[data-testid="history-event-when"]')[0]!
    expect(when.text()).toMatch(/^By Robin Crew, 3 hours ago · \d{1,2} Mar 2025, \d{2}:\d{2}$/)
    expect(when.get('time').attributes('datetime')).toBe('2025-03-03T18:00:00.000Z')
  })

  it('when Show older is pressed, then the next page follows from the cursor until there is no more', async () => {
    const { w } = await openHistory()
    await w.get('[data-testid="history-older"]').trigger('click')
    await flushPromises()
    expect(vi.mocked(linesetsApi.events).mock.calls.at(-1)).toEqual([lineset().id, { limit: 20, before: '4' }])
    expect(texts(w, 'history-event-summary')).toHaveLength(4)
    expect(texts(w, 'history-event-when').at(-1)).toMatch(/^By the system, 2 weeks ago · /)
    expect(w.find('[data-testid="history-older"]').exists()).toBe(false)
  })

  it('when no revisions are named, then the latest is compared with the one before: items and loads with their signs', async () => {
    const { w } = await openHistory()
    expect(
      vi
        .mocked(hangsApi.read)
        .mock.calls.map(([, id]) => id)
        .sort(),
    ).toEqual([hangId(2), hangId(3)])
    expect(w.get('[data-testid="comparison-left"]').text()).toContain('Revision 2')
    expect(w.get('[data-testid="comparison-right"]').text()).toContain('Revision 3')
    expect(w.get('[data-testid="comparison-items-tally"]').text()).toBe('1 added · 1 removed · 1 changed · 0 alike')
    expect(w.get('[data-testid="comparison-added"]').text()).toContain('Practical lamp')
    expect(w.get('[data-testid="comparison-removed"]').text()).toContain('Painted drop')
    expect(texts(w, 'comparison-change')).toEqual(['weight: 12 lb → 14 lb'])
    expect(changeIn(w, 'total')).toBe('+28 lb')
    expect([1, 2, 3, 4].map((line) => changeIn(w, `line-${line}`))).toEqual(['+14 lb', '±0 lb', '+14 lb', '±0 lb'])
    expect(changeIn(w, 'required')).toBe('+40 lb')
    expect(changeIn(w, 'brick-Full brick')).toBe('+2')
  })

  it('when the address names two revisions, then those two are compared and the timeline marks them', async () => {
    const { w } = await openHistory('?left=1&right=3')
    expect(
      vi
        .mocked(hangsApi.read)
        .mock.calls.map(([, id]) => id)
        .sort(),
    ).toEqual([hangId(1), hangId(3)])
    expect(w.get('[data-testid="comparison-left"]').text()).toContain('Revision 1')
    expect(changeIn(w, 'total')).toBe('+52 lb')
    expect(w.get('[data-testid="history-pick-right-3"]').attributes('aria-pressed')).toBe('true')
    expect(w.get('[data-testid="history-pick-left-2"]').attributes('aria-pressed')).toBe('false')
  })

  it('when a revision is picked in the timeline, then the address carries the choice and the comparison follows', async () => {
    const { w, router } = await openHistory()
    await w.get('[data-testid="history-older"]').trigger('click')
    await flushPromises()
    await w.get('[data-testid="history-pick-left-1"]').trigger('click')
    await vi.waitFor(() => expect(router.currentRoute.value.query).toEqual({ left: '1', right: '3' }))
    await vi.waitFor(() => expect(w.get('[data-testid="comparison-left"]').text()).toContain('Revision 1'))
    expect(texts(w, 'comparison-removed').join()).toContain('Painted drop')
  })

  it('when the address names a revision the lineset does not have, then the page says so and shows the latest two', async () => {
    const { w } = await openHistory('?left=9')
    expect(w.get('[data-testid="comparison-missing"]').text()).toContain('no revision 9')
    expect(w.get('[data-testid="comparison-left"]').text()).toContain('Revision 2')
  })

  it('when an older revision was computed in metric, then its figures are converted and the page says so', async () => {
    // 100 kg = 220.462262 lb (NIST SP 811: 1 lb = 0.45359237 kg exactly).
    const metric = { ...revisionResult(100, [25, 25, 25, 25], 4), units: 'metric' as const }
    vi.mocked(hangsApi.read).mockImplementation(async (_lineset, id) =>
      id === hangId(2) ? hangRevision(2, { result: metric }) : hangRevision(3),
    )
    const { w } = await openHistory()
    expect(w.get('[data-testid="comparison-converted"]').text()).toBe(
      'Revision 2 was computed in kg and m; its figures are converted to lb and ft here.',
    )
    expect(w.get('[data-testid="comparison-row-total"]').text()).toContain('220.46 lb')
    expect(changeIn(w, 'total')).toBe('−20.06 lb')
  })

  it('when both revisions stored their engine input, then each drawing shows its items as markers and bands and the moment under the batten', async () => {
    const { w } = await openHistory()
    const drawn = (side: string, what: string) => w.findAll(`[data-testid="${side}"] [data-testid="${what}"]`).length
    // Revision 2: the boom arms (two at one place, one load) and the painted drop; revision 3: boom arms and lamp.
    expect([
      drawn('comparison-left-diagram', 'diagram-item-point'),
      drawn('comparison-left-diagram', 'diagram-item-stretch'),
    ]).toEqual([1, 1])
    expect([
      drawn('comparison-right-diagram', 'diagram-item-point'),
      drawn('comparison-right-diagram', 'diagram-item-stretch'),
    ]).toEqual([2, 0])
    for (const side of ['comparison-left-diagram', 'comparison-right-diagram']) {
      const diagram = w.get(`[data-testid="${side}"]`)
      expect(diagram.get('[data-testid="diagram-moment"]').attributes('d')).toMatch(/^M .* Z$/)
      expect(diagram.get('[data-testid="diagram-moment-caption"]').text()).toContain('largest -300 lb·ft at 15 ft')
      expect(diagram.find('[data-testid="diagram-shape"]').exists()).toBe(true)
      expect(diagram.find('[data-testid="diagram-note"]').exists()).toBe(false)
    }
    expect(w.get('[data-testid="comparison-right-diagram"] [data-testid="diagram-item-point"]').text()).toContain(
      'Boom arm: 28 lb at 1 ft',
    )
  })

  it("when the lineset's pick points have moved since, then each side is drawn on the batten it was saved on and says so", async () => {
    vi.mocked(linesetsApi.read).mockResolvedValue(linesetDetail({ pickPoints: [0, 20, 40] }))
    const { w } = await openHistory()
    const left = w.get('[data-testid="comparison-left-diagram"]')
    expect(left.findAll('[data-diagram-arrow]')).toHaveLength(4)
    expect(left.get('[data-testid="diagram-note"]').text()).toBe(
      "Drawn as revision 2 was saved, with the lineset as it was then: a 40 ft batten on lines at 5 ft, 15 ft, 25 ft and 35 ft. The lineset's pick points have changed since.",
    )
    expect(left.find('[data-testid="diagram-moment"]').exists()).toBe(true)
  })

  it('when a revision kept no engine input, then its drawing shows the lines and loads alone and says why', async () => {
    vi.mocked(hangsApi.read).mockImplementation(async (_lineset, id) =>
      id === hangId(2) ? hangRevision(2, { input: null }) : hangRevision(3),
    )
    const { w } = await openHistory()
    const left = w.get('[data-testid="comparison-left-diagram"]')
    expect(left.findAll('[data-diagram-arrow]')).toHaveLength(4)
    expect(left.find('[data-testid^="diagram-item-"]').exists()).toBe(false)
    expect(left.find('[data-testid="diagram-moment"]').exists()).toBe(false)
    expect(left.get('[data-testid="diagram-note"]').text()).toContain('Revision 2 kept no engine input')
    expect(w.findAll('[data-testid="comparison-right-diagram"] [data-testid="diagram-item-point"]')).toHaveLength(2)
  })

  it('when a lineset has a single revision, then there is nothing to compare, the page says so and offers no picks', async () => {
    vi.mocked(hangsApi.list).mockResolvedValue([summary(1)])
    const { w } = await openHistory()
    expect(w.get('[data-testid="history-one-revision"]').text()).toContain('nothing to compare')
    expect(w.find('[data-testid="history-comparison"]').exists()).toBe(false)
    expect(w.find('[data-testid^="history-pick-"]').exists()).toBe(false)
  })
})

import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import type { Board, BoardLineset, PreRunCheck } from '../../shared/schemas/index.js'
import { boardApi, preRunChecksApi } from '../../src/api/board'
import { productionsApi } from '../../src/api/productions'
import { useSessionStore } from '../../src/stores/session'
import BoardView from '../../src/views/BoardView.vue'
import { personWith } from './fixtures'
import { mountWithApp } from './mount'
import { testRouter } from './router'

vi.mock('../../src/api/board', () => ({
  BOARD_STREAM_URL: '/api/v1/board/stream',
  boardApi: { read: vi.fn() },
  preRunChecksApi: { list: vi.fn(), latest: vi.fn(), record: vi.fn() },
}))
vi.mock('../../src/api/productions', () => ({ productionsApi: { list: vi.fn() } }))

// The browser's EventSource, played by the test: it opens, drops and delivers events when told to.
class FakeEventSource {
  static last: FakeEventSource | null = null
  readyState = 0
  onopen: (() => void) | null = null
  onerror: (() => void) | null = null
  listeners = new Map<string, ((event: MessageEvent) => void)[]>()
  constructor(readonly url: string) {
    FakeEventSource.last = this
  }
  addEventListener(name: string, listener: (event: MessageEvent) => void) {
    this.listeners.set(name, [...(this.listeners.get(name) ?? []), listener])
  }
  close() {
    this.readyState = 2
  }
  open() {
    this.readyState = 1
    this.onopen?.()
  }
  drop() {
    this.readyState = 0
    this.onerror?.()
  }
  emit(name: string, data: object) {
    for (const listener of this.listeners.get(name) ?? [])
      listener(new MessageEvent(name, { data: JSON.stringify(data) }))
  }
}

const NOW = new Date()
const minutesAgo = (minutes: number) => new Date(NOW.getTime() - minutes * 60_000).toISOString()

const set = (overrides: Partial<BoardLineset> = {}): BoardLineset => ({
  id: 'l1',
  number: 3,
  name: 'Main drape',
  kind: 'counterweight-single',
  status: 'in-service',
  operatingStatus: 'ready',
  hang: { id: 'h1', title: 'Act one drape', revision: 2, totalLoad: 412.5, productionId: null },
  lastChange: { id: '40', type: 'hang-saved', at: minutesAgo(5), by: { id: 'u1', name: 'Rowan Pike' } },
  lockout: null,
  ...overrides,
})

const check: PreRunCheck = {
  id: '41',
  productionId: null,
  productionName: null,
  by: { id: 'u2', name: 'Tess Marlow' },
  at: minutesAgo(10),
  note: 'Half hour call',
  readyCount: 1,
  linesetCount: 2,
  notReady: [{ id: 'l2', number: 7, name: 'First electric', operatingStatus: 'locked-out' }],
}

const board = (linesets: BoardLineset[], lastCheck: PreRunCheck | null = check): Board => ({
  unitSystem: 'imperial',
  linesets,
  lastCheck,
})

const locked = set({
  id: 'l2',
  number: 7,
  name: 'First electric',
  operatingStatus: 'locked-out',
  lockout: { reason: 'Frayed lift line', at: minutesAgo(2), by: { id: 'u3', name: 'Ada Quill' } },
  lastChange: { id: '42', type: 'ticket-loaded', at: minutesAgo(2), by: { id: 'u3', name: 'Ada Quill' } },
})

let wrapper: VueWrapper | undefined
beforeEach(() => {
  vi.stubGlobal('EventSource', FakeEventSource)
  vi.mocked(productionsApi.list).mockResolvedValue([])
  vi.mocked(preRunChecksApi.latest).mockResolvedValue({ check, changesSince: [], moreChanges: false })
})
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
  vi.unstubAllGlobals()
})

async function mountAs(role: Parameters<typeof personWith>[0]) {
  const pinia = createPinia()
  setActivePinia(pinia)
  useSessionStore().user = personWith(role)
  wrapper = mountWithApp(BoardView, { global: { plugins: [pinia, testRouter()] } })
  await flushPromises()
  return wrapper
}

const card = (w: VueWrapper, number: number) => w.find(`[data-testid="board-lineset-${number}"]`)

describe('BoardView', () => {
  it('when the board is read, then each lineset shows its status in words, its hang, its last change with who approved it, and its lock-out', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set(), locked]))
    const w = await mountAs('stage-manager')
    const first = card(w, 3).text()
    expect(first).toContain('Ready')
    expect(first).toContain('“Act one drape”, revision 2 · 412.5 lb')
    expect(first).toContain('Hang saved, 5 minutes ago, by Rowan Pike')
    const second = card(w, 7).text()
    expect(second).toContain('Locked out')
    expect(second).toContain('Frayed lift line')
    expect(second).toContain('Weight change loaded, 2 minutes ago, approved by Ada Quill')
    expect(card(w, 7).find('.mdi-lock-outline').exists()).toBe(true)
    expect(w.text()).toContain('1 of 2 linesets ready')
  })

  it('when the last check is shown, then it says who, when, how many were ready and which were not', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set(), locked]))
    const w = await mountAs('stage-manager')
    const summary = w.get('[data-testid="board-check"]').text()
    expect(summary).toContain('1 of 2 ready, checked by Tess Marlow, 10 minutes ago')
    expect(summary).toContain('Not ready: 7 First electric (Locked out)')
    expect(w.find('[data-testid="board-changes-since"]').exists()).toBe(false)
  })

  it('when a status is picked, then only linesets in that status are shown', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set(), locked]))
    const w = await mountAs('stage-manager')
    await w.get('[data-testid="board-filter-locked-out"]').trigger('click')
    await flushPromises()
    expect(card(w, 3).exists()).toBe(false)
    expect(card(w, 7).exists()).toBe(true)
  })

  it('when the stream opens and drops, then the page says Live and then Not live — reconnecting', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set()]))
    const w = await mountAs('fly-operator')
    expect(w.find('[data-testid="board-not-live"]').exists()).toBe(true)
    FakeEventSource.last!.open()
    await flushPromises()
    expect(w.get('[data-testid="board-live"]').text()).toBe('Live')
    FakeEventSource.last!.drop()
    await flushPromises()
    expect(w.get('[data-testid="board-not-live"]').text()).toBe('Not live — reconnecting')
  })

  it('when a lock-out event arrives, then only that lineset is read again and shown as it is now', async () => {
    vi.mocked(boardApi.read).mockResolvedValueOnce(board([set(), set({ id: 'l2', number: 7, name: 'First electric' })]))
    const w = await mountAs('stage-manager')
    vi.mocked(boardApi.read).mockResolvedValueOnce(board([locked]))
    FakeEventSource.last!.emit('lockout', { id: '42', type: 'lineset-locked-out', linesetId: 'l2' })
    await flushPromises()
    expect(boardApi.read).toHaveBeenLastCalledWith({ linesetId: 'l2' })
    expect(card(w, 7).text()).toContain('Locked out')
    expect(card(w, 3).text()).toContain('Ready')
  })

  it('when the stream says resync, then the whole board is read again', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set()]))
    await mountAs('stage-manager')
    FakeEventSource.last!.emit('resync', { id: '99' })
    await flushPromises()
    expect(boardApi.read).toHaveBeenCalledTimes(2)
    expect(boardApi.read).toHaveBeenLastCalledWith({})
  })

  it('when the stage manager records a check with a note, then it is sent and shown as the last check', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set()], null))
    const recorded = { ...check, id: '50', note: 'Places', readyCount: 1, linesetCount: 1, notReady: [] }
    vi.mocked(preRunChecksApi.record).mockResolvedValue(recorded)
    const w = await mountAs('stage-manager')
    expect(w.text()).toContain('No pre-run check recorded yet.')
    await w.get('[data-testid="board-check-record"]').trigger('click')
    await flushPromises()
    const note = document.querySelector('[data-testid="board-check-note-field"] textarea') as HTMLTextAreaElement
    note.value = 'Places'
    note.dispatchEvent(new Event('input'))
    ;(document.querySelector('[data-testid="board-check-save"]') as HTMLButtonElement).click()
    await flushPromises()
    expect(preRunChecksApi.record).toHaveBeenCalledWith({ note: 'Places', productionId: undefined })
    expect(w.get('[data-testid="board-check-summary"]').text()).toContain('1 of 1 ready')
  })

  it('when a fly operator opens the board, then there is no way to record a check', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set()]))
    const w = await mountAs('fly-operator')
    expect(w.find('[data-testid="board-check-record"]').exists()).toBe(false)
  })

  it('when the technical director opens the board, then the changes since the last check are listed', async () => {
    vi.mocked(boardApi.read).mockResolvedValue(board([set(), locked]))
    vi.mocked(preRunChecksApi.latest).mockResolvedValue({
      check,
      changesSince: [
        {
          id: '42',
          type: 'lineset-locked-out',
          at: minutesAgo(2),
          linesetId: 'l2',
          linesetNumber: 7,
          linesetName: 'First electric',
          actor: { id: 'u3', name: 'Ada Quill' },
          summary: 'Locked out: Frayed lift line',
        },
      ],
      moreChanges: false,
    })
    const w = await mountAs('technical-director')
    const changes = w.get('[data-testid="board-changes-since"]').text()
    expect(changes).toContain('Changes since this check (1)')
    expect(changes).toContain('Lineset 7, First electric: Locked out: Frayed lift line')
    expect(changes).toContain('Ada Quill, 2 minutes ago')
  })
})

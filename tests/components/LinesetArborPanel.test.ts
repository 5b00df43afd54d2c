import { afterEach, beforeEach, describe, expect, it, vi } from 'vitest'
import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { arborsApi } from '../../src/api/arbors'
import { ApiError } from '../../src/api/errors'
import LinesetArborPanel from '../../src/components/LinesetArborPanel.vue'
import { mountWithApp } from './mount'

vi.mock('../../src/api/arbors', () => ({
  arborsApi: { read: vi.fn(), count: vi.fn(), lockOut: vi.fn(), release: vi.fn() },
}))

const ID = '2c6a8d10-0000-4000-8000-000000000012'
const FULL = 'b0000000-0000-4000-8000-000000000001'
const HALF = 'b0000000-0000-4000-8000-000000000002'
const contents = {
  linesetId: ID,
  bricks: [
    { brickTypeId: FULL, name: 'Full steel brick', count: 26 },
    { brickTypeId: HALF, name: 'Half steel brick', count: 1 },
  ],
  version: 4,
}

let wrapper: VueWrapper | undefined
beforeEach(() => vi.mocked(arborsApi.read).mockResolvedValue(contents))
afterEach(() => {
  wrapper?.unmount()
  vi.clearAllMocks()
})

async function mountPanel(editable: boolean) {
  wrapper = mountWithApp(LinesetArborPanel, { props: { linesetId: ID, editable } })
  await flushPromises()
  return wrapper
}

async function recordCount(w: VueWrapper, full: string) {
  await w.get('[data-testid="arbor-edit"]').trigger('click')
  await w.get('[data-testid="arbor-count-0"] input').setValue(full)
  await w.get('[data-testid="arbor-note"] textarea').setValue('after the focus call')
  await w.get('[data-testid="arbor-form"]').trigger('submit')
  await flushPromises()
}

describe('LinesetArborPanel', () => {
  it('when a stage manager reads the arbor, then each brick type and the total show with no way to change them', async () => {
    const w = await mountPanel(false)
    const rows = w.findAll('[data-testid="arbor-bricks"] tr').map((row) => row.text())
    expect(rows).toEqual(['Full steel brick26', 'Half steel brick1', 'All bricks27'])
    expect(w.find('[data-testid="arbor-edit"]').exists()).toBe(false)
  })

  it('when a technical director records a count, then every type is sent with the arbor version read and the note', async () => {
    vi.mocked(arborsApi.count).mockResolvedValue({
      ...contents,
      bricks: [{ ...contents.bricks[0]!, count: 28 }, contents.bricks[1]!],
      version: 5,
    })
    const w = await mountPanel(true)
    await recordCount(w, '28')
    expect(arborsApi.count).toHaveBeenCalledWith(ID, {
      version: 4,
      bricks: [
        { brickTypeId: FULL, count: 28 },
        { brickTypeId: HALF, count: 1 },
      ],
      note: 'after the focus call',
    })
    expect(w.get('[data-testid="arbor-total"]').text()).toBe('29')
    expect(w.emitted('counted')).toHaveLength(1)
  })

  it('when storage is short, then the server’s words naming the type and how many are missing show under the field', async () => {
    const message = 'Not enough "Full steel brick" in storage: 40 bricks needed, 12 there, 28 missing'
    vi.mocked(arborsApi.count).mockRejectedValue(
      new ApiError(409, 'not_enough_bricks', message, { 'bricks.0.count': message }),
    )
    const w = await mountPanel(true)
    await recordCount(w, '66')
    expect(w.get('[data-testid="arbor-error"]').text()).toBe(message)
    expect(w.get('[data-testid="arbor-count-0"]').text()).toContain('28 missing')
  })

  it('when someone counted first, then the panel says so and the next count goes with the latest version', async () => {
    vi.mocked(arborsApi.count).mockRejectedValue(new ApiError(409, 'stale_version', 'Changed'))
    const w = await mountPanel(true)
    vi.mocked(arborsApi.read).mockResolvedValue({ ...contents, version: 5 })
    await recordCount(w, '30')
    expect(w.get('[data-testid="arbor-error"]').text()).toMatch(/Someone recorded a count/)
    vi.mocked(arborsApi.count).mockResolvedValue({ ...contents, version: 6 })
    await w.get('[data-testid="arbor-form"]').trigger('submit')
    await flushPromises()
    expect(vi.mocked(arborsApi.count).mock.calls.at(-1)![1]).toMatchObject({ version: 5 })
  })
})

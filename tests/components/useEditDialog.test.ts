import { describe, expect, it, vi } from 'vitest'
import { ApiError } from '../../src/api/errors'
import { useConfirmedAction } from '../../src/composables/useConfirmedAction'
import { useEditDialog } from '../../src/composables/useEditDialog'

interface Row {
  id: string
  version: number
  name: string
}
const row: Row = { id: 'r1', version: 3, name: 'Full steel' }
const refusal = (code: string) => new ApiError(409, code, `Refused: ${code}`)

function dialogWith(update: () => Promise<unknown>) {
  const options = {
    create: vi.fn(async (body: { name: string }) => ({ ...body, id: 'new', version: 0 })),
    update: vi.fn(update),
    movedCodes: ['stale_version'],
    onMoved: vi.fn(async () => {}),
    onSaved: vi.fn(async () => {}),
  }
  return { options, dialog: useEditDialog<Row, { name: string }>(options) }
}

describe('useEditDialog', () => {
  it('when a new row is saved, then it is created, the dialog closes and the page hears of it', async () => {
    const { options, dialog } = dialogWith(async () => row)
    dialog.openFor(null)
    await dialog.save({ name: 'Half' })
    expect(options.create).toHaveBeenCalledWith({ name: 'Half' })
    expect(options.update).not.toHaveBeenCalled()
    expect(dialog.open.value).toBe(false)
    expect(options.onSaved).toHaveBeenCalledOnce()
  })

  it('when a row is changed, then the update carries the version it was read at', async () => {
    const { options, dialog } = dialogWith(async () => row)
    dialog.openFor(row)
    await dialog.save({ name: 'Full' })
    expect(options.update).toHaveBeenCalledWith('r1', { name: 'Full', version: 3 })
  })

  it('when the row moved meanwhile, then the dialog closes and the page is told why', async () => {
    const { options, dialog } = dialogWith(() => Promise.reject(refusal('stale_version')))
    dialog.openFor(row)
    await dialog.save({ name: 'Full' })
    expect(dialog.open.value).toBe(false)
    expect(options.onMoved).toHaveBeenCalledWith('stale_version')
    expect(options.onSaved).not.toHaveBeenCalled()
  })

  it('when the server refuses a field, then the dialog stays open with the error, and opening again clears it', async () => {
    const { options, dialog } = dialogWith(() => Promise.reject(refusal('duplicate')))
    dialog.openFor(row)
    await dialog.save({ name: 'Full' })
    expect(dialog.open.value).toBe(true)
    expect(dialog.saving.error.value?.code).toBe('duplicate')
    expect(options.onMoved).not.toHaveBeenCalled()
    dialog.openFor(null)
    expect(dialog.saving.error.value).toBeNull()
    expect(dialog.editing.value).toBeNull()
  })
})

describe('useConfirmedAction', () => {
  it('when the action succeeds, then the question closes and the page hears of it', async () => {
    const onDone = vi.fn(async () => {})
    const act = vi.fn(async () => {})
    const action = useConfirmedAction(act, { onDone })
    action.ask(row)
    expect(action.open.value).toBe(true)
    await action.confirm()
    expect(act).toHaveBeenCalledWith(row)
    expect(action.open.value).toBe(false)
    expect(onDone).toHaveBeenCalledOnce()
  })

  it('when the row is gone, then the question closes and the page is told why; another refusal keeps it open', async () => {
    const onMoved = vi.fn(async () => {})
    const gone = useConfirmedAction(() => Promise.reject(refusal('not_found')), { movedCodes: ['not_found'], onMoved })
    gone.ask(row)
    await gone.confirm()
    expect(gone.open.value).toBe(false)
    expect(onMoved).toHaveBeenCalledWith('not_found')

    const refused = useConfirmedAction(() => Promise.reject(refusal('in_use')), { movedCodes: ['not_found'], onMoved })
    refused.ask(row)
    await refused.confirm()
    expect(refused.open.value).toBe(true)
    expect(refused.task.error.value?.message).toBe('Refused: in_use')
  })

  it('when nothing was asked about, then confirming does nothing', async () => {
    const act = vi.fn(async () => {})
    await useConfirmedAction(act).confirm()
    expect(act).not.toHaveBeenCalled()
  })
})

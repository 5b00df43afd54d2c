import { watch, type Ref } from 'vue'
import type { ApiError } from '../api/errors'

/** The part of a schema form a dialog drives (see `useSchemaForm`). */
interface DialogForm<Body> {
  reset: () => void
  submit: () => Body | null
  serverFields: Ref<Record<string, string>>
}

/**
 * Ties a schema form to the dialog that shows it: every opening starts from a fresh draft, the server's field
 * messages land on their fields, and `save` hands on only a body the schema accepts.
 *
 * @example
 * const save = useDialogForm(open, () => props.error, form, (body) => emit('save', body))
 */
export function useDialogForm<Body>(
  open: Ref<boolean>,
  error: () => ApiError | null,
  form: DialogForm<Body>,
  send: (body: Body) => void,
) {
  watch(open, (isOpen) => isOpen && form.reset())
  watch(error, (answer) => (form.serverFields.value = answer?.fields ?? {}))

  return function save() {
    const body = form.submit()
    if (body) send(body)
  }
}

import { computed, reactive, ref, toValue, type MaybeRefOrGetter } from 'vue'
import type { z } from 'zod'
import { fieldsFromIssues } from '../../shared/errors/fields.js'

/**
 * A small form checked by a shared schema: `parse` turns the typed text into the body the schema expects,
 * messages show for fields that were left or after a submit, and the server's field messages win until edited.
 * The schema may be a getter, for schemas that depend on the venue's units.
 */
export function useSchemaForm<Schema extends z.ZodType, Draft extends Record<string, unknown>>(
  schema: MaybeRefOrGetter<Schema>,
  initial: () => Draft,
  parse: (draft: Draft) => unknown,
) {
  const draft = reactive(initial()) as Draft
  const touched = reactive(new Set<string>())
  const submitted = ref(false)
  const serverFields = ref<Record<string, string>>({})

  const verdict = computed(() => toValue(schema).safeParse(parse(draft as Draft)))
  const clientFields = computed(() => (verdict.value.success ? {} : fieldsFromIssues(verdict.value.error.issues)))

  const messageFor = (key: string) =>
    serverFields.value[key] || (submitted.value || touched.has(key) ? clientFields.value[key] : undefined)

  function bind(key: keyof Draft & string) {
    return {
      modelValue: draft[key],
      'onUpdate:modelValue': (value: unknown) => {
        ;(draft as Record<string, unknown>)[key] = value ?? ''
        if (key in serverFields.value) serverFields.value = { ...serverFields.value, [key]: '' }
      },
      onBlur: () => touched.add(key),
      errorMessages: messageFor(key) || undefined,
    }
  }

  /** Answers the parsed body, or null (and shows every message) when the schema refuses the draft. */
  function submit(): z.output<Schema> | null {
    submitted.value = true
    return verdict.value.success ? verdict.value.data : null
  }

  function reset(next: Draft = initial()) {
    Object.assign(draft, next)
    touched.clear()
    submitted.value = false
    serverFields.value = {}
  }

  return { draft, bind, messageFor, submit, reset, serverFields, submitted }
}

/** Blank text is "not entered" (so the schema asks for it); anything else is read as a number. */
export const numberFrom = (text: unknown) => (String(text ?? '').trim() === '' ? undefined : Number(text))
export const textFrom = (value: number | null | undefined) =>
  value === null || value === undefined ? '' : String(value)

import { computed, inject, provide, reactive, ref, type InjectionKey } from 'vue'
import { linesetInputSchemaFor, type LinesetInput } from '../../shared/schemas/index.js'
import { fieldsFromIssues } from '../../shared/errors/fields.js'
import { unitLabel, type UnitSystem } from '../../shared/units/index.js'
import type { DecimalInput } from '../../shared/units/index.js'
import { exactFigures } from './exactFigures'
import { bodyFrom, draftFrom, emptyDraft, FIGURE_QUANTITIES, type DraftTextKey, type FigureKey } from './linesetDraft'

interface Options {
  initial?: LinesetInput | null
  unitSystem: () => UnitSystem
  readonly: () => boolean
}

/**
 * The lineset form's state: the draft, the shared schema's verdict on it, and which messages to show.
 * A field's message shows once it has been left (or the form was submitted) and then follows every keystroke.
 */
export function useLinesetForm(options: Options) {
  const figures = exactFigures()
  const draft = reactive(options.initial ? draftFrom(options.initial, figures, options.unitSystem()) : emptyDraft())
  const touched = reactive(new Set<string>())
  const submitted = ref(false)
  const serverFields = ref<Record<string, string>>({})

  // What the form opened with; any difference is work that leaving the page would lose.
  const pristine = JSON.stringify(draft)
  const dirty = computed(() => !options.readonly() && JSON.stringify(draft) !== pristine)

  const verdict = computed(() => {
    const units = options.unitSystem()
    return linesetInputSchemaFor(units).safeParse(bodyFrom(draft, figures, units))
  })
  const clientFields = computed(() => (verdict.value.success ? {} : fieldsFromIssues(verdict.value.error.issues)))

  function messageFor(key: string): string | undefined {
    const server = serverFields.value[key]
    if (server) return server
    return submitted.value || touched.has(key) ? clientFields.value[key] : undefined
  }

  /** Changing a field retires the server's word on it; the shared schema takes over again. */
  function edited(key: string) {
    if (!(key in serverFields.value)) return
    const { [key]: _retired, ...rest } = serverFields.value
    serverFields.value = rest
  }

  const unit = (key: FigureKey) => unitLabel(FIGURE_QUANTITIES[key], options.unitSystem())

  /** Fills a figure from elsewhere (the pipe table), rounded for the eye and exact underneath. */
  function fill(key: FigureKey, value: DecimalInput) {
    draft[key] = figures.show(value, FIGURE_QUANTITIES[key], options.unitSystem())
    edited(key)
  }

  /** Bindings for a text or figure field: value, update, blur, message and read-only state. */
  function bind(key: DraftTextKey) {
    return {
      modelValue: draft[key],
      'onUpdate:modelValue': (value: string | null) => {
        draft[key] = value ?? ''
        edited(key)
      },
      onBlur: () => touched.add(key),
      errorMessages: messageFor(key),
      readonly: options.readonly(),
    }
  }

  function bindPickPoint(index: number) {
    const key = `pickPoints.${index}`
    return {
      modelValue: draft.pickPoints[index] ?? '',
      'onUpdate:modelValue': (value: string | null) => {
        draft.pickPoints[index] = value ?? ''
        edited(key)
        edited('pickPoints')
      },
      onBlur: () => {
        touched.add(key)
        touched.add('pickPoints')
      },
      errorMessages: messageFor(key),
      readonly: options.readonly(),
    }
  }

  function bindLineLength(index: number) {
    const key = `liftLineLengths.${index}`
    return {
      modelValue: draft.liftLineLengths[index] ?? '',
      'onUpdate:modelValue': (value: string | null) => {
        draft.liftLineLengths[index] = value ?? ''
        edited(key)
        edited('liftLineLengths')
      },
      onBlur: () => {
        touched.add(key)
        touched.add('liftLineLengths')
      },
      errorMessages: messageFor(key),
      readonly: options.readonly(),
    }
  }

  /** Marks everything for display and answers the valid body, or null when the schema refuses it. */
  function submit(): LinesetInput | null {
    submitted.value = true
    return verdict.value.success ? verdict.value.data : null
  }

  return {
    draft,
    dirty,
    touched,
    submitted,
    serverFields,
    clientFields,
    messageFor,
    edited,
    unit,
    fill,
    bind,
    bindPickPoint,
    bindLineLength,
    submit,
    readonly: options.readonly,
  }
}

export type LinesetForm = ReturnType<typeof useLinesetForm>

const formKey: InjectionKey<LinesetForm> = Symbol('lineset-form')

export const provideLinesetForm = (form: LinesetForm) => provide(formKey, form)

/** The form of the enclosing LinesetForm; its section components read and write through it. */
export function useLinesetFormContext(): LinesetForm {
  const form = inject(formKey)
  if (!form) throw new Error('A lineset form section must sit inside LinesetForm')
  return form
}

import { flushPromises, type VueWrapper } from '@vue/test-utils'
import { createPinia, setActivePinia } from 'pinia'
import { defineComponent, h } from 'vue'
import { RouterView } from 'vue-router'
import { VSelect } from 'vuetify/components'
import type { BrickType, HangRevision, ItemType, Lineset, Production, Role } from '../../shared/schemas/index.js'
import HangEditor from '../../src/components/HangEditor.vue'
import { useSessionStore } from '../../src/stores/session'
import { useVenueStore } from '../../src/stores/venue'
import { mountWithApp } from './mount'
import { lineset, personWith, venue } from './fixtures'
import { testRouter } from './router'

/** Made-up library, shows and a saved revision for the hang editor's tests; figures plausible, not from any house. */
export const BRICKS: BrickType[] = [
  {
    id: 'b1',
    name: 'Full steel',
    material: 'Steel',
    unitWeight: 19.5,
    thickness: 2,
    quantityOwned: 400,
    version: 1,
    unitSystem: 'imperial',
  },
  {
    id: 'b2',
    name: 'Lead trim',
    material: 'Lead',
    unitWeight: 5,
    thickness: 0.5,
    quantityOwned: 40,
    version: 1,
    unitSystem: 'imperial',
  },
]
const itemType = (id: string, name: string, unitWeight: number, allowancePerUnit: number): ItemType => ({
  id,
  name,
  category: 'lighting',
  unitWeight,
  allowancePerUnit,
  notes: '',
  unitSystem: 'imperial',
  version: 1,
})
export const WASH = itemType('7a0e0000-0000-4000-8000-000000000001', 'LED wash', 12, 2)
export const SPOT = itemType('7a0e0000-0000-4000-8000-000000000002', 'Ellipsoidal spotlight', 17, 1.5)
const production = (id: string, name: string, state: Production['state']): Production => ({
  id,
  name,
  state,
  firstPerformance: '2026-03-01',
  lastPerformance: '2026-04-30',
  version: 1,
})
export const RUNNING = production('5b0d0000-0000-4000-8000-000000000001', 'The Lighthouse Keeper', 'running')
export const PLANNED = production('5b0d0000-0000-4000-8000-000000000002', 'Winter Tales', 'planning')
export const CLOSED = production('5b0d0000-0000-4000-8000-000000000003', 'Last Season', 'closed')

// A 40 ft batten of 2.72 lb/ft pipe on two lines set symmetrically: the pipe alone weighs 108.8 lb.
export const TWO_LINES = lineset({ pickPoints: [10, 30] })

export const REVISION_3: HangRevision = {
  id: '4a000000-0000-4000-8000-000000000003',
  linesetId: TWO_LINES.id,
  revision: 3,
  title: 'First electric, after focus',
  productionId: RUNNING.id,
  createdAt: '2026-03-04T18:30:00.000Z',
  createdBy: { id: 'p1', name: 'Sam Rail' },
  totalLoad: 0,
  unitSystem: 'imperial',
  items: [
    { label: 'Colour wash', category: 'lighting', itemTypeId: WASH.id, quantity: 3, from: 10, to: 30 },
    { label: 'Data line', category: 'hardware', weightPerLength: 0.04, from: 0, to: 40 },
  ],
  input: null,
  result: {} as HangRevision['result'],
}

/** Mounts the editor in a memory router that also knows the history page, as the signed-in `role`. */
export async function openEditor(set: Lineset, role: Role = 'fly-operator') {
  const pinia = createPinia()
  setActivePinia(pinia)
  useVenueStore().venue = venue
  useSessionStore().user = personWith(role)
  const router = testRouter()
  if (!router.hasRoute('lineset-history'))
    router.addRoute({
      path: '/linesets/:id/history',
      name: 'lineset-history',
      component: defineComponent(() => () => h('div')),
    })
  // Rendered by the router, as on the lineset page, so the editor's leave guard has its route.
  router.addRoute({
    path: '/editor-under-test',
    component: defineComponent(() => () => h(HangEditor, { lineset: set })),
  })
  await router.push('/editor-under-test')
  const wrapper = mountWithApp(RouterView, { global: { plugins: [pinia, router] } })
  await flushPromises()
  return wrapper
}

export const field = (w: VueWrapper, row: number, part: string) => w.get(`[data-testid="hang-row-${row}-${part}"]`)

export async function type(w: VueWrapper, row: number, part: string, value: string) {
  await field(w, row, part).get('input').setValue(value)
  await flushPromises()
}

/** Chooses `value` in the select marked `testid`, as picking it from the list does. */
export async function choose(w: VueWrapper, testid: string, value: unknown) {
  const select = w.findAllComponents(VSelect).find((s) => s.attributes('data-testid') === testid)
  if (!select) throw new Error(`no select ${testid}`)
  select.vm.$emit('update:modelValue', value)
  await flushPromises()
}

export const lineLoads = (w: VueWrapper) =>
  w.findAll('[data-testid$="-load"][data-testid^="balance-line-"]').map((cell) => cell.text())

import { computed, ref } from 'vue'
import { HANG_EDITORS, INVENTORY_EDITORS, type TicketView } from '../../shared/schemas/index.js'
import { useSessionStore } from '../stores/session'
import { useTicketsStore } from '../stores/tickets'
import { useAsyncTask } from './useAsyncTask'

/**
 * One ticket on its page: read it, make a move, and say which moves this person may make now. A move that the
 * server refuses as stale or in another state reads the ticket again, so the page shows where it stands.
 */
export function useTicket(id: () => string) {
  const session = useSessionStore()
  const store = useTicketsStore()
  const ticket = ref<TicketView | null>(null)
  const reading = useAsyncTask()
  const moving = useAsyncTask()

  const load = () => reading.run(async () => (ticket.value = await store.read(id())))

  async function move(task: (current: TicketView) => Promise<TicketView>) {
    if (!ticket.value) return
    const current = ticket.value
    const moved = await moving.run(() => task(current))
    if (moved) ticket.value = store.remember(moved)
    else if (moving.error.value?.status === 409 && moving.error.value.code !== 'not_enough_bricks')
      ticket.value = await store.read(id()).catch(() => ticket.value)
  }

  const role = computed(() => session.user?.role)
  const isOpener = computed(() => !!ticket.value?.openedBy && ticket.value.openedBy.id === session.user?.id)
  const canDecide = computed(
    () =>
      ticket.value?.state === 'requested' && !!role.value && INVENTORY_EDITORS.includes(role.value) && !isOpener.value,
  )
  const canWithdraw = computed(
    () => isOpener.value && (ticket.value?.state === 'requested' || ticket.value?.state === 'approved'),
  )
  const canLoad = computed(() => !!role.value && HANG_EDITORS.includes(role.value))

  return { ticket, reading, moving, load, move, isOpener, canDecide, canWithdraw, canLoad }
}

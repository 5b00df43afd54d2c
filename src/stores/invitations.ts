import { defineStore } from 'pinia'
import { ref } from 'vue'
import type { Invitation, PersonInput } from '../../shared/schemas/index.js'
import { invitationsApi } from '../api/invitations'

/** The venue's invitations still waiting for an answer (administrators only). */
export const useInvitationsStore = defineStore('invitations', () => {
  const items = ref<Invitation[]>([])
  const loaded = ref(false)

  async function loadAll() {
    items.value = await invitationsApi.listPending()
    loaded.value = true
  }

  /** A new invitation replaces any earlier one to the same address. */
  async function send(body: PersonInput) {
    const invitation = await invitationsApi.send(body)
    items.value = [invitation, ...items.value.filter((item) => item.email !== invitation.email)]
    return invitation
  }

  async function withdraw(id: string) {
    await invitationsApi.withdraw(id)
    items.value = items.value.filter((item) => item.id !== id)
  }

  return { items, loaded, loadAll, send, withdraw }
})

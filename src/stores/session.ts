import { defineStore } from 'pinia'
import { computed, ref } from 'vue'
import { canEditInventory, canManagePeople } from '../../shared/schemas/role.js'
import type { SessionUser, SignIn } from '../../shared/schemas/session.js'
import { hasCsrfToken, setCsrfToken } from '../api/client'
import { sessionApi } from '../api/session'

/** Who is signed in, and what that person's role lets the screens offer. */
export const useSessionStore = defineStore('session', () => {
  const user = ref<SessionUser | null>(null)
  const loaded = ref(false)

  const signedIn = computed(() => user.value !== null)
  const role = computed(() => user.value?.role)
  const canEdit = computed(() => canEditInventory(role.value))
  const canManage = computed(() => canManagePeople(role.value))

  /** Takes a session answer (from signing in, or from accepting an invitation, which signs in too). */
  function accept(state: { user: SessionUser | null; csrfToken: string }) {
    user.value = state.user
    setCsrfToken(state.csrfToken)
    loaded.value = true
  }

  /** Reads the session once per page load; the router guard waits for it. */
  async function load(force = false) {
    if (loaded.value && !force) return
    accept(await sessionApi.read())
  }

  /** Sign-in is a write too: after a sign-out the old token died with its session, so a fresh one is read first. */
  async function signIn(credentials: SignIn) {
    if (!hasCsrfToken()) await load(true)
    accept(await sessionApi.signIn(credentials))
  }

  async function signOut() {
    try {
      await sessionApi.signOut()
    } finally {
      clear()
    }
  }

  /** Forgets the person locally; the session is read again (with a fresh token) before the next sign-in. */
  function clear() {
    user.value = null
    setCsrfToken('')
    loaded.value = false
  }

  return { user, loaded, signedIn, role, canEdit, canManage, load, signIn, signedInAs: accept, signOut, clear }
})

import { ref } from 'vue'
import { useRouter } from 'vue-router'
import { useSessionStore } from '../stores/session'
import { forgetSignedInData } from '../stores/forget'

/** Signs out on the server, forgets this person's data here, and returns to the sign-in page. */
export function useSignOut() {
  const router = useRouter()
  const session = useSessionStore()
  const busy = ref(false)

  async function signOut() {
    busy.value = true
    try {
      await session.signOut()
    } catch {
      // Even if the server could not be told, this browser forgets the person.
    } finally {
      forgetSignedInData()
      busy.value = false
      await router.push({ name: 'session-sign-in' })
    }
  }

  return { busy, signOut }
}

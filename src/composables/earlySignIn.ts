/** What someone did on the plain sign-in form (index.html) before the app's sign-in page mounted. */
export interface EarlySignIn {
  email: string
  password: string
  /** Sign in was pressed: the app signs in at once with what was typed. */
  submitted: boolean
  /** The field the caret was in, so typing goes on in the same field. */
  focused: 'email' | 'password' | null
}

const EARLY_FORM_ID = 'early-sign-in'

/**
 * Takes over the plain sign-in form: returns what was typed and removes the form, in one step, so nothing typed
 * between the two can be lost. Null when there is none (another page was opened first, or it was already taken).
 */
export function takeOverEarlySignIn(): EarlySignIn | null {
  const early = document.getElementById(EARLY_FORM_ID)
  if (!early) return null
  const form = early.querySelector('form')
  const email = early.querySelector<HTMLInputElement>('input[name=email]')
  const password = early.querySelector<HTMLInputElement>('input[name=password]')
  const active = document.activeElement
  const taken: EarlySignIn = {
    email: email?.value ?? '',
    password: password?.value ?? '',
    submitted: form?.getAttribute('data-submitted') === 'true',
    focused: active === email ? 'email' : active === password ? 'password' : null,
  }
  early.remove()
  return taken
}

/** Removes the plain sign-in form once the app shows any other page (a signed-in person opening /sign-in). */
export function dropEarlySignIn(): void {
  document.getElementById(EARLY_FORM_ID)?.remove()
}

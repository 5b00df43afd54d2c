/** Dialogs render outside the mounted component (in the overlay container), so their fields are found in the document. */
export function typeInto(testid: string, value: string) {
  const field = document.querySelector<HTMLInputElement | HTMLTextAreaElement>(
    `[data-testid="${testid}"] input, [data-testid="${testid}"] textarea`,
  )
  if (!field) throw new Error(`No field ${testid} is showing`)
  field.value = value
  field.dispatchEvent(new Event('input'))
}

export function press(testid: string) {
  const button = document.querySelector<HTMLButtonElement>(`[data-testid="${testid}"]`)
  if (!button) throw new Error(`No button ${testid} is showing`)
  button.click()
}

/** The messages Vuetify shows under a field (its hint, or its error once there is one). */
export const messagesUnder = (testid: string) =>
  document.querySelector(`[data-testid="${testid}"] .v-messages`)?.textContent?.trim() ?? ''

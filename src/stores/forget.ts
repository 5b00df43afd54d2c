import type { Pinia } from 'pinia'
import { useBrickTypesStore } from './brickTypes'
import { useInvitationsStore } from './invitations'
import { useLinesetsStore } from './linesets'
import { usePeopleStore } from './people'
import { useSessionStore } from './session'
import { useVenueStore } from './venue'

/** Drops everything read for the person who was signed in, so the next person sees none of it. */
export function forgetSignedInData(pinia?: Pinia) {
  useSessionStore(pinia).clear()
  useVenueStore(pinia).clear()
  useLinesetsStore(pinia).clear()
  useBrickTypesStore(pinia).clear()
  usePeopleStore(pinia).clear()
  useInvitationsStore(pinia).clear()
}

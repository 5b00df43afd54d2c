import { PUBLISHED_DEMO_PASSWORD } from '../../../shared/schemas/password.js'
import type { Role } from '../../../shared/schemas/role.js'

/**
 * The demo sign-ins printed by `npm start` and written in README. Invented people. Their password is public,
 * so the password rules refuse it for every real account.
 */
export const DEMO_PASSWORD = PUBLISHED_DEMO_PASSWORD

export const DEMO_PEOPLE: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'admin@demo.test', name: 'Imogen Varga', role: 'administrator' },
  { email: 'td@demo.test', name: 'Theo Lindqvist', role: 'technical-director' },
  { email: 'fly@demo.test', name: 'Dara Okonkwo', role: 'fly-operator' },
  { email: 'sm@demo.test', name: 'Priya Castellano', role: 'stage-manager' },
]

import type { Role } from '../../../shared/schemas/role.js'

/** The demo sign-ins printed by `npm start` and written in README. Invented people. */
export const DEMO_PASSWORD = 'loft-demo-2026'

export const DEMO_PEOPLE: ReadonlyArray<{ email: string; name: string; role: Role }> = [
  { email: 'admin@demo.test', name: 'Imogen Varga', role: 'administrator' },
  { email: 'td@demo.test', name: 'Theo Lindqvist', role: 'technical-director' },
  { email: 'fly@demo.test', name: 'Dara Okonkwo', role: 'fly-operator' },
  { email: 'sm@demo.test', name: 'Priya Castellano', role: 'stage-manager' },
]

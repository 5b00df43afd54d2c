import { z } from 'zod'
import type { Role } from './role.js'

export const signInSchema = z.object({
  email: z
    .string({ error: 'Enter your e-mail address' })
    .trim()
    .toLowerCase()
    .pipe(z.email('Enter a valid e-mail address')),
  password: z.string({ error: 'Enter your password' }).min(1, 'Enter your password').max(200),
})
export type SignIn = z.infer<typeof signInSchema>

export interface SessionUser {
  id: string
  email: string
  name: string
  role: Role
  venueId: string
}

export interface SessionState {
  user: SessionUser | null
  csrfToken: string
}

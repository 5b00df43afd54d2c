import { z } from 'zod'
import type { Role } from './role.js'
import { emailAddress } from './text.js'

export const signInSchema = z.object({
  email: emailAddress('Enter your e-mail address'),
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

import { z } from 'zod'
import { ROLES, type Role } from './role.js'
import { versionField } from './quantity.js'
import { emailAddress, singleLineText } from './text.js'

const email = emailAddress()
const role = z.enum(ROLES, { error: 'Choose a role' })

/** Adding someone to the venue: a new account, or an existing account given a role here. */
export const personInputSchema = z.object({
  email,
  name: singleLineText('Name', 120, { required: true }),
  role,
  password: z.string({ error: 'Enter a password' }).min(10, 'At least 10 characters').max(200).optional(),
})
export type PersonInput = z.infer<typeof personInputSchema>

/** Changing someone's role in this venue. */
export const personUpdateSchema = z.object({ role, version: versionField() })
export type PersonUpdate = z.infer<typeof personUpdateSchema>

/** A member of the venue as the API lists them. */
export interface Person {
  id: string
  userId: string
  email: string
  name: string
  role: Role
  version: number
}

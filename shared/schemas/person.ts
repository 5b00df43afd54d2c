import { z } from 'zod'
import { ROLES, type Role } from './role.js'
import { requiredText, versionField } from './quantity.js'

const email = z
  .string({ error: 'Enter an e-mail address' })
  .trim()
  .toLowerCase()
  .pipe(z.email('Enter a valid e-mail address'))
const role = z.enum(ROLES, { error: 'Choose a role' })

/**
 * Adding someone to the venue is inviting them (`POST /people`): whether the address already has an account
 * is never said; the person accepts from the e-mail and only then holds the role.
 */
export const personInputSchema = z.object({ email, name: requiredText(120), role })
export type PersonInput = z.infer<typeof personInputSchema>

/** A new account's password. */
export const passwordSchema = z
  .string({ error: 'Enter a password' })
  .min(12, 'At least 12 characters')
  .max(200, 'At most 200 characters')

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

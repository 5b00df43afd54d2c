import { z } from 'zod'
import { ROLES, type Role } from './role.js'
import { versionField } from './quantity.js'
import { emailAddress, singleLineText } from './text.js'

export { passwordSchema, PASSWORD_RULE } from './password.js'

const email = emailAddress()
const role = z.enum(ROLES, { error: 'Choose a role' })

/**
 * Adding someone to the venue is inviting them (`POST /people`): whether the address already has an account
 * is never said; the person accepts from the e-mail and only then holds the role.
 */
export const personInputSchema = z.object({ email, name: singleLineText('Name', 120, { required: true }), role })
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

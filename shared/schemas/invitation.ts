import { z } from 'zod'
import { singleLineText } from './text.js'
import type { Role } from './role.js'

/** What an invitation link carries: a long random token, only ever compared by its hash. */
const token = z
  .string({ error: 'The invitation link is incomplete' })
  .regex(/^[A-Za-z0-9_-]{20,200}$/, 'The invitation link is incomplete')

/** `POST /api/v1/invitations/lookup`: what an invitation is for, shown before accepting. */
export const invitationLookupSchema = z.object({ token })

/**
 * `POST /api/v1/invitations/accept`. An address with an account accepts signed in as it, or with its
 * password; a new address chooses its name and password here.
 */
export const invitationAcceptSchema = z.object({
  token,
  name: singleLineText('Name', 120, { required: true }).optional(),
  password: z.string({ error: 'Enter a password' }).min(1, 'Enter a password').max(200).optional(),
})
export type InvitationAccept = z.infer<typeof invitationAcceptSchema>

export const INVITATION_STATES = ['pending', 'accepted', 'withdrawn'] as const
export type InvitationState = (typeof INVITATION_STATES)[number]

/**
 * An invitation as administrators see it: what they typed and where it stands. It never shows anything
 * about an account the address may already have.
 */
export interface Invitation {
  id: string
  email: string
  name: string
  role: Role
  state: InvitationState
  expiresAt: string
  createdAt: string
}

/** What the person holding the link is shown before accepting. */
export interface InvitationPreview {
  email: string
  name: string
  role: Role
  venueName: string
  /** The address has an account: accepting asks for its password (or being signed in as it). */
  hasAccount: boolean
  expiresAt: string
}

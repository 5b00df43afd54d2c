import { createHash, randomBytes } from 'node:crypto'

/** How long an invitation link works. */
export const INVITATION_LIFETIME_DAYS = 7

/** A fresh token for a link (256 random bits) and the hash that is all the database keeps of it. */
export function newInvitationToken() {
  const token = randomBytes(32).toString('base64url')
  return { token, tokenHash: hashInvitationToken(token) }
}

/** SHA-256 is enough here: the token is random and long, so there is nothing to guess or look up. */
export const hashInvitationToken = (token: string) => createHash('sha256').update(token).digest('hex')

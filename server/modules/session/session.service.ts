import bcrypt from 'bcryptjs'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { ServiceContext } from '../../context.js'

/** What the session cookie's record keeps: who, and which venue they are working in. */
export interface SessionKey {
  userId: string
  venueId: string
}

// Compared against when the e-mail is unknown, so a wrong address takes as long as a wrong password.
const DUMMY_HASH = bcrypt.hashSync('not-a-real-password', 12)

/** The member behind a session key, read fresh so a changed role or a removal takes effect at once. */
export async function memberFor(ctx: ServiceContext<SessionUser | null>, key: SessionKey): Promise<SessionUser | null> {
  const membership = await ctx.db.models.Membership.findOne({
    where: { userId: key.userId, venueId: key.venueId },
    include: [{ model: ctx.db.models.User, as: 'user' }],
    transaction: ctx.transaction,
  })
  if (!membership?.user) return null
  const { user } = membership
  return { id: user.id, email: user.email, name: user.name, role: membership.role, venueId: membership.venueId }
}

/**
 * Checks an e-mail and password; a person with roles in several venues starts in the one they joined first.
 * @returns the member, or null for any mismatch (never saying which part was wrong).
 */
export async function authenticate(
  ctx: ServiceContext<SessionUser | null>,
  email: string,
  password: string,
): Promise<SessionUser | null> {
  const { db, transaction } = ctx
  const user = await db.models.User.findOne({ where: { email: email.toLowerCase() }, transaction })
  const matches = await bcrypt.compare(password, user?.passwordHash ?? DUMMY_HASH)
  if (!user || !matches) return null
  const membership = await db.models.Membership.findOne({
    where: { userId: user.id },
    order: [['createdAt', 'ASC']],
    transaction,
  })
  if (!membership) return null
  return memberFor(ctx, { userId: user.id, venueId: membership.venueId })
}

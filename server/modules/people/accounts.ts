import bcrypt from 'bcryptjs'
import type { Role } from '../../../shared/schemas/role.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import type { TransactionContext } from '../../context.js'

export const PASSWORD_HASH_ROUNDS = 12

export const hashPassword = (password: string) => bcrypt.hash(password, PASSWORD_HASH_ROUNDS)

/** A new account (no role anywhere yet). */
export async function createAccount(
  tx: TransactionContext<SessionUser | null>,
  account: { email: string; name: string; passwordHash: string },
) {
  return tx.db.models.User.create(account, { transaction: tx.transaction })
}

/** Gives an account a role in a venue; an account that already holds one there keeps it. */
export async function joinVenue(
  tx: TransactionContext<SessionUser | null>,
  member: { userId: string; venueId: string; role: Role },
) {
  const [membership] = await tx.db.models.Membership.findOrCreate({
    where: { userId: member.userId, venueId: member.venueId },
    defaults: member,
    transaction: tx.transaction,
  })
  return membership
}

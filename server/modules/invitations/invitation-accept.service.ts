import bcrypt from 'bcryptjs'
import type { InvitationAccept, InvitationPreview } from '../../../shared/schemas/invitation.js'
import { passwordMatchesEmail, passwordSchema } from '../../../shared/schemas/password.js'
import type { SessionUser } from '../../../shared/schemas/session.js'
import { inTransaction, type ServiceContext, type TransactionContext } from '../../context.js'
import { AppError } from '../../http/errors.js'
import type { UserModel } from '../people/user.model.js'
import { createAccount, hashPassword, joinVenue } from '../people/accounts.js'
import { memberFor } from '../session/session.service.js'
import { hashInvitationToken } from './invitation-token.js'
import { pendingAndValid } from './invitation.service.js'

type Visitor = ServiceContext<SessionUser | null>

const unusable = () =>
  new AppError(
    410,
    'invitation_unusable',
    "This invitation link has been used, withdrawn or has expired; ask the venue's administrator for a new one",
  )

async function findUsable(ctx: Visitor, token: string, lock = false) {
  const row = await ctx.db.models.Invitation.findOne({
    where: { tokenHash: hashInvitationToken(token), ...pendingAndValid(ctx.clock.now()) },
    transaction: ctx.transaction,
    ...(lock && ctx.transaction ? { lock: ctx.transaction.LOCK.UPDATE } : {}),
  })
  if (!row) throw unusable()
  return row
}

/** What a link invites to, for the person holding it (who owns the address, so may learn it has an account). */
export async function previewInvitation(ctx: Visitor, token: string): Promise<InvitationPreview> {
  const invitation = await findUsable(ctx, token)
  const { db, transaction } = ctx
  const venue = await db.models.Venue.findByPk(invitation.venueId, { attributes: ['name'], transaction })
  const account = await db.models.User.count({ where: { email: invitation.email }, transaction })
  return {
    email: invitation.email,
    name: invitation.name,
    role: invitation.role,
    venueName: venue?.name ?? '',
    hasAccount: account > 0,
    expiresAt: invitation.expiresAt.toISOString(),
  }
}

/** The owner of an existing account consents by being signed in as it or by giving its password. */
async function confirmOwner(tx: TransactionContext<SessionUser | null>, account: UserModel, password?: string) {
  if (tx.actor?.id === account.id) return account
  if (password === undefined)
    throw new AppError(
      401,
      'account_password_required',
      `Sign in as ${account.email} or enter its password to accept`,
      {
        password: 'Enter the password of your account',
      },
    )
  if (!(await bcrypt.compare(password, account.passwordHash)))
    throw new AppError(401, 'bad_credentials', 'That password does not match the account', {
      password: 'Not the password of this account',
    })
  return account
}

async function newAccount(
  tx: TransactionContext<SessionUser | null>,
  email: string,
  body: InvitationAccept,
  name: string,
) {
  const password = passwordSchema.safeParse(body.password)
  if (!password.success)
    throw new AppError(400, 'validation_failed', 'Choose a password for your new account', {
      password: password.error.issues[0]?.message ?? 'Enter a password',
    })
  if (passwordMatchesEmail(password.data, email))
    throw new AppError(400, 'validation_failed', 'Choose a password for your new account', {
      password: "Must not be the account's e-mail address",
    })
  return createAccount(tx, { email, name: body.name ?? name, passwordHash: await hashPassword(password.data) })
}

/**
 * Accepts an invitation: the account joins the venue with the role offered, and nothing else about it
 * changes. Only a pending, unexpired invitation is accepted, and only once: its row is locked and the
 * acceptance is written conditional on it still being pending, so of two accepts at once one answers 410.
 *
 * @returns the new member, for signing in to the venue.
 */
export function acceptInvitation(ctx: Visitor, body: InvitationAccept): Promise<SessionUser> {
  return inTransaction(ctx, async (tx) => {
    const { db, transaction } = tx
    const invitation = await findUsable(tx, body.token, true)
    const account = await db.models.User.findOne({ where: { email: invitation.email }, transaction })
    const user = account
      ? await confirmOwner(tx, account, body.password)
      : await newAccount(tx, invitation.email, body, invitation.name)
    const now = tx.clock.now()
    const [count] = await db.models.Invitation.update(
      { state: 'accepted', acceptedBy: user.id, decidedAt: now, version: invitation.version + 1 },
      { where: { id: invitation.id, version: invitation.version, ...pendingAndValid(now) }, transaction },
    )
    if (count === 0) throw unusable()
    await joinVenue(tx, { userId: user.id, venueId: invitation.venueId, role: invitation.role })
    const member = await memberFor(tx, { userId: user.id, venueId: invitation.venueId })
    if (!member) throw unusable() // not reachable: the role was given in this transaction
    return member
  })
}

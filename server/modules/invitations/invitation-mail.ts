import { ROLE_LABELS, type Role } from '../../../shared/schemas/role.js'
import type { MailMessage } from '../../mail/mail-sender.js'
import { INVITATION_LIFETIME_DAYS } from './invitation-token.js'

interface InvitationMail {
  to: string
  name: string
  role: Role
  venueName: string
  invitedBy: string
  link: string
}

/** The invitation e-mail: who asks, for what, the link, and what to do if it was not expected. */
export function invitationMail(invitation: InvitationMail): MailMessage {
  const role = ROLE_LABELS[invitation.role].toLowerCase()
  return {
    to: invitation.to,
    subject: `Join ${invitation.venueName} on Loftledger`,
    text: [
      `Hello ${invitation.name},`,
      '',
      `${invitation.invitedBy} invites you to ${invitation.venueName}'s fly workbook on Loftledger, as ${role}.`,
      '',
      `To accept, open this link within ${INVITATION_LIFETIME_DAYS} days:`,
      invitation.link,
      '',
      'If you already have a Loftledger account under this address, you will be asked for its password.',
      'If you did not expect this invitation, ignore this e-mail: nothing changes until the link is used.',
    ].join('\n'),
  }
}

import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { invitationAcceptSchema, invitationLookupSchema } from '../../../shared/schemas/invitation.js'
import { PEOPLE_MANAGERS } from '../../../shared/schemas/role.js'
import { memberContext, visitorContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import type { CsrfProtection } from '../../http/csrf.js'
import { validate } from '../../http/validate.js'
import { acceptInvitation, previewInvitation } from './invitation-accept.service.js'
import { listInvitations, withdrawInvitation } from './invitation.service.js'

/** `/invitations`: administrators list and withdraw; whoever holds a link looks it up and accepts it. */
export function invitationRoutes(app: AppContext, csrf: CsrfProtection) {
  const router = Router()
  router.get('/', requireRole(PEOPLE_MANAGERS), async (req, res) => {
    res.json(await listInvitations(memberContext(app, req)))
  })
  router.delete('/:id', requireRole(PEOPLE_MANAGERS), validate({ params: idParamsSchema }), async (req, res) => {
    await withdrawInvitation(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  router.post('/lookup', validate({ body: invitationLookupSchema }), async (req, res) => {
    res.json(await previewInvitation(visitorContext(app, req), req.body.token))
  })
  // Accepting signs the person in to the venue they joined, like signing in does (a new session id and token).
  router.post('/accept', validate({ body: invitationAcceptSchema }), async (req, res, next) => {
    const member = await acceptInvitation(visitorContext(app, req), req.body)
    req.logIn(member, (error) => {
      if (error) return next(error)
      res.json({ user: member, csrfToken: csrf.tokenFor(req, res) })
    })
  })
  return router
}

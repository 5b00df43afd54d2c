import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { personInputSchema, personUpdateSchema } from '../../../shared/schemas/person.js'
import { PEOPLE_MANAGERS } from '../../../shared/schemas/role.js'
import { memberContext, type AppContext } from '../../context.js'
import { requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import { invite } from '../invitations/invitation.service.js'
import * as people from './people.service.js'

export function peopleRoutes(app: AppContext) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.use(requireRole(PEOPLE_MANAGERS))
  router.get('/', async (req, res) => {
    res.json(await people.listPeople(memberContext(app, req)))
  })
  // Adding a person is inviting them: the same answer whether or not the address has an account anywhere.
  router.post('/', validate({ body: personInputSchema }), async (req, res) => {
    res.status(201).json(await invite(memberContext(app, req), req.body))
  })
  router.put('/:id', byId, validate({ body: personUpdateSchema }), async (req, res) => {
    res.json(await people.changeRole(memberContext(app, req), req.params.id as string, req.body))
  })
  router.delete('/:id', byId, async (req, res) => {
    await people.removePerson(memberContext(app, req), req.params.id as string)
    res.status(204).end()
  })
  return router
}

import { Router } from 'express'
import { idParamsSchema } from '../../../shared/schemas/id.js'
import { personInputSchema, personUpdateSchema } from '../../../shared/schemas/person.js'
import { PEOPLE_MANAGERS } from '../../../shared/schemas/role.js'
import type { Database } from '../../db/models.js'
import { currentUser, requireRole } from '../../http/auth.js'
import { validate } from '../../http/validate.js'
import * as people from './people.service.js'

export function peopleRoutes(db: Database) {
  const router = Router()
  const byId = validate({ params: idParamsSchema })
  router.use(requireRole(PEOPLE_MANAGERS))
  router.get('/', async (req, res) => {
    res.json(await people.listPeople(db, currentUser(req)))
  })
  router.post('/', validate({ body: personInputSchema }), async (req, res) => {
    res.status(201).json(await people.addPerson(db, currentUser(req), req.body))
  })
  router.put('/:id', byId, validate({ body: personUpdateSchema }), async (req, res) => {
    res.json(await people.changeRole(db, currentUser(req), req.params.id as string, req.body))
  })
  router.delete('/:id', byId, async (req, res) => {
    await people.removePerson(db, currentUser(req), req.params.id as string)
    res.status(204).end()
  })
  return router
}

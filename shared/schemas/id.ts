import { z } from 'zod'

/** Route parameter `:id`; anything that is not a UUID can name no record, so it is a 404, not a 400. */
export const idParamsSchema = z.object({ id: z.uuid() })

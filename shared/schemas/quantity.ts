import { z } from 'zod'
import { UNIT_SYSTEMS } from '../units/systems.js'

/**
 * Field builders shared by every form and route, so a figure is refused with the
 * same words on the screen and from the API.
 */

/** A finite figure at or above zero. */
export const nonNegative = () =>
  z.number({ error: 'Enter a number' }).finite('Enter a finite number').min(0, 'Must not be negative')

/** A finite figure above zero. */
export const positive = () =>
  z.number({ error: 'Enter a number' }).finite('Enter a finite number').gt(0, 'Must be more than zero')

/** An optional figure: `null` or absent means "not known / not fitted". */
export const optionalNonNegative = () => nonNegative().nullable().optional()
export const optionalPositive = () => positive().nullable().optional()

/** A short, required piece of text. */
export const requiredText = (max: number) =>
  z.string({ error: 'Enter some text' }).trim().min(1, 'Must not be empty').max(max, `At most ${max} characters`)

/** Optimistic-lock token every update carries; a stale one is refused with 409. */
// A version is a PostgreSQL integer that a save adds one to, so the highest a request may carry is one below its top.
const HIGHEST_VERSION = 2147483646
export const versionField = () =>
  z.number({ error: 'Version is required' }).int().min(0).max(HIGHEST_VERSION, 'No record has that version')

/**
 * The unit system a write's figures were typed in (the venue's, as the form last read it). The server
 * refuses the write with 409 when the venue has switched since, so 40 ft is never stored as 40 m.
 */
export const typedInField = () => z.enum(UNIT_SYSTEMS, { error: 'Say which units the figures were typed in' })

/** Where services take the time from, so tests can move it (an invitation that has expired, say). */
export interface Clock {
  now(): Date
}

export const systemClock: Clock = { now: () => new Date() }

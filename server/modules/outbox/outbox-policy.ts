/** How the outbox delivers: how often it looks, how much at once, and how it backs off. From config. */
export interface OutboxPolicy {
  /** How often every app process looks for messages that are due. */
  sweepIntervalMs: number
  /** The most messages one look claims (and so sends at once). */
  batchSize: number
  /** Attempts before a message is given up as failed. */
  maxAttempts: number
  /** The wait after the first failed attempt; it doubles after each further one ... */
  firstRetrySeconds: number
  /** ... up to this. */
  longestRetrySeconds: number
}

/**
 * How long a claimed message is held for the process that claimed it: longer than one send can take
 * (server/mail/smtp-mail-sender.ts: 10 s to connect, 10 s for the greeting, 30 s of silence), so only a
 * process that died mid-send lets another try it again, and only after this.
 */
export const CLAIM_SECONDS = 300

/**
 * The wait before the next attempt after `attempts` have failed: bounded exponential back-off.
 *
 * @example
 * retryDelaySeconds(policy, 1) // 30 with a first retry of 30 s
 * retryDelaySeconds(policy, 3) // 120
 */
export function retryDelaySeconds(policy: OutboxPolicy, attempts: number): number {
  const doublings = Math.min(Math.max(attempts - 1, 0), 30)
  return Math.min(policy.firstRetrySeconds * 2 ** doublings, policy.longestRetrySeconds)
}

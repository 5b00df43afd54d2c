import { createHmac, randomBytes, timingSafeEqual } from 'node:crypto'

const RANDOM_BYTES = 32
const MAC_BYTES = 32 // SHA-256

/**
 * Tokens of a random value and its HMAC, bound to a context (a session id, an e-mail address): only the
 * server, which holds the secret, can make one, and one made for a context is refused in any other.
 * Each use gets its own key derived from the session secret, so a token of one kind never passes as another.
 */
export class SignedTokens {
  private readonly key: Buffer

  constructor(secret: string, purpose: string) {
    this.key = createHmac('sha256', secret).update(`loftledger ${purpose}`).digest()
  }

  private mac(random: Buffer, context: string) {
    return createHmac('sha256', this.key).update(context).update('\0').update(random).digest()
  }

  /** A new token for the context: 64 bytes, base64url (86 characters). */
  issue(context: string): string {
    const random = randomBytes(RANDOM_BYTES)
    return Buffer.concat([random, this.mac(random, context)]).toString('base64url')
  }

  /** Whether the token was issued by this server for this context. */
  verify(token: string | undefined, context: string): boolean {
    if (!token || token.length > 100) return false
    const bytes = Buffer.from(token, 'base64url')
    if (bytes.length !== RANDOM_BYTES + MAC_BYTES) return false
    const expected = this.mac(bytes.subarray(0, RANDOM_BYTES), context)
    return timingSafeEqual(expected, bytes.subarray(RANDOM_BYTES))
  }

  /** A keyed digest naming the context without revealing it (to key rows by an e-mail address, say). */
  digest(context: string): string {
    return createHmac('sha256', this.key).update(context).digest('base64url')
  }

  /** The token's random part, a stable name for what the token stands for (it reveals nothing of the key). */
  static idOf(token: string): string {
    return Buffer.from(token, 'base64url').subarray(0, RANDOM_BYTES).toString('base64url')
  }
}

import { createHash, randomBytes } from 'node:crypto';

/**
 * A secret for an e-mailed link (invitation, password reset): 32 random bytes, base64url.
 * Only its SHA-256 hash is stored; a fast hash is enough because the token has 256 bits of
 * entropy, so it cannot be guessed from the hash the way a password could.
 */
export function newLinkToken() {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashLinkToken(token) };
}

export function hashLinkToken(token: string) {
  return createHash('sha256').update(token, 'utf8').digest('hex');
}

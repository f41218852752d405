import { createHash, randomBytes } from 'node:crypto';

/** A fresh random token (32 bytes = 256 bits, beyond any guessing) and the hash we store. */
export function newSecretToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString('base64url');
  return { token, hash: hashSecretToken(token) };
}

/** SHA-256 suffices here: the tokens are random, so there is nothing to brute-force. */
export function hashSecretToken(token: string): string {
  return createHash('sha256').update(token).digest('hex');
}

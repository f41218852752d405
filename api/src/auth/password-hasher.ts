import { randomBytes } from 'node:crypto';
import argon2 from 'argon2';

// OWASP Password Storage Cheat Sheet, argon2id minimum: m = 19 MiB, t = 2, p = 1. The library's
// defaults (64 MiB, t = 3, p = 4) cost about half a second per hash on a two-core server.
const argonOptions = {
  type: argon2.argon2id,
  memoryCost: 19_456,
  timeCost: 2,
  parallelism: 1,
} as const;

export function hashPassword(password: string): Promise<string> {
  return argon2.hash(password, argonOptions);
}

export async function verifyPassword(hash: string, password: string): Promise<boolean> {
  try {
    return await argon2.verify(hash, password);
  } catch {
    // A malformed stored hash must read as "wrong password", never as a server error.
    return false;
  }
}

let dummyHash: Promise<string> | undefined;

/**
 * Spends the same argon2 work as a real check, for an e-mail that has no account, so the
 * response time of sign-in does not reveal which e-mails are registered.
 */
export async function verifyAgainstDummy(password: string): Promise<false> {
  dummyHash ??= hashPassword(randomBytes(16).toString('hex'));
  await verifyPassword(await dummyHash, password);
  return false;
}

/** Computes the dummy hash ahead of the first sign-in for an unknown e-mail. */
export function warmDummyHash(): void {
  dummyHash ??= hashPassword(randomBytes(16).toString('hex'));
}

import { and, eq, exists, gt, isNull, sql } from 'drizzle-orm';
import { passwordResets, refreshTokens, users, type UserRow } from '../../../schema/src/index';
import type { Executor } from '../db/database';

// The only place where the auth feature talks to the database.

export async function findUserByEmail(ex: Executor, email: string): Promise<UserRow | undefined> {
  const rows = await ex
    .select()
    .from(users)
    .where(sql`lower(${users.email}) = ${email.toLowerCase()}`)
    .limit(1);
  return rows[0];
}

export async function findUserById(ex: Executor, id: string): Promise<UserRow | undefined> {
  const rows = await ex.select().from(users).where(eq(users.id, id)).limit(1);
  return rows[0];
}

/**
 * The user of an access token, or undefined when the token no longer counts: its session (refresh
 * family) was revoked, or the user's token version moved on. One query, because it runs on every
 * authenticated request; the family index serves the EXISTS.
 */
export async function findUserForAccessToken(
  ex: Executor,
  subject: { userId: string; sessionId: string; tokenVersion: number },
): Promise<{ id: string; email: string; displayName: string } | undefined> {
  const liveSession = ex
    .select({ one: sql`1` })
    .from(refreshTokens)
    .where(
      and(
        eq(refreshTokens.familyId, subject.sessionId),
        eq(refreshTokens.userId, users.id),
        isNull(refreshTokens.revokedAt),
      ),
    );
  const rows = await ex
    .select({ id: users.id, email: users.email, displayName: users.displayName })
    .from(users)
    .where(
      and(
        eq(users.id, subject.userId),
        eq(users.tokenVersion, subject.tokenVersion),
        exists(liveSession),
      ),
    )
    .limit(1);
  return rows[0];
}

/** Inserts a user; returns undefined when the e-mail is taken (no exception, no half state). */
export async function insertUser(
  ex: Executor,
  values: { email: string; displayName: string; passwordHash: string },
): Promise<UserRow | undefined> {
  const rows = await ex.insert(users).values(values).onConflictDoNothing().returning();
  return rows[0];
}

/**
 * Sets the password and raises the token version in one statement, so no access token issued
 * before the new password can outlive it.
 */
export async function replacePasswordHash(ex: Executor, userId: string, hash: string) {
  await ex
    .update(users)
    .set({
      passwordHash: hash,
      tokenVersion: sql`${users.tokenVersion} + 1`,
      updatedAt: new Date(),
    })
    .where(eq(users.id, userId));
}

export async function insertRefreshToken(
  ex: Executor,
  values: { userId: string; familyId: string; tokenHash: string; expiresAt: Date },
): Promise<void> {
  await ex.insert(refreshTokens).values(values);
}

export async function findRefreshToken(ex: Executor, tokenHash: string) {
  const rows = await ex
    .select()
    .from(refreshTokens)
    .where(eq(refreshTokens.tokenHash, tokenHash))
    .limit(1);
  return rows[0];
}

/**
 * Marks a token rotated only if it is still live; false means another request used it first,
 * which the caller treats as reuse.
 */
export async function markRotated(ex: Executor, id: string, now: Date): Promise<boolean> {
  const rows = await ex
    .update(refreshTokens)
    .set({ rotatedAt: now })
    .where(
      and(
        eq(refreshTokens.id, id),
        isNull(refreshTokens.rotatedAt),
        isNull(refreshTokens.revokedAt),
        gt(refreshTokens.expiresAt, now),
      ),
    )
    .returning({ id: refreshTokens.id });
  return rows.length === 1;
}

export async function revokeFamily(ex: Executor, familyId: string, now: Date): Promise<void> {
  await ex
    .update(refreshTokens)
    .set({ revokedAt: now })
    .where(and(eq(refreshTokens.familyId, familyId), isNull(refreshTokens.revokedAt)));
}

export async function revokeAllForUser(ex: Executor, userId: string, now: Date): Promise<void> {
  await ex
    .update(refreshTokens)
    .set({ revokedAt: now })
    .where(and(eq(refreshTokens.userId, userId), isNull(refreshTokens.revokedAt)));
}

export async function insertPasswordReset(
  ex: Executor,
  values: { userId: string; tokenHash: string; expiresAt: Date },
): Promise<string> {
  const rows = await ex.insert(passwordResets).values(values).returning({ id: passwordResets.id });
  return rows[0]!.id;
}

/** Uses a reset token atomically: returns its user only for the first caller within its hour. */
export async function consumePasswordReset(
  ex: Executor,
  tokenHash: string,
  now: Date,
): Promise<string | undefined> {
  const rows = await ex
    .update(passwordResets)
    .set({ usedAt: now })
    .where(
      and(
        eq(passwordResets.tokenHash, tokenHash),
        isNull(passwordResets.usedAt),
        gt(passwordResets.expiresAt, now),
      ),
    )
    .returning({ userId: passwordResets.userId });
  return rows[0]?.userId;
}

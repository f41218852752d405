import { randomUUID } from 'node:crypto';
import { recordAudit } from '../audit/audit-repository';
import type { Database, Executor } from '../db/database';
import {
  ConflictError,
  InvalidCredentialsError,
  UnauthenticatedError,
  ValidationError,
} from '../errors/app-errors';
import { passwordResetMail } from '../mail/mail-templates';
import { insertOutboxMessage } from '../mail/outbox-repository';
import type { UserRow } from '../../../schema/src/index';
import type { AccessTokens, AccessTokenSubject } from './access-tokens';
import * as repo from './auth-repository';
import type { SignInRequest, SignUpRequest, UserResponse } from './auth-dto';
import { hashPassword, verifyAgainstDummy, verifyPassword } from './password-hasher';
import { refreshTokenLifetimeMs } from './refresh-cookie';
import { hashSecretToken, newSecretToken } from './secret-token';

// One hour gives a person time to find the mail and little time to anyone who finds it later.
const resetTokenLifetimeMs = 3600_000;

export interface IssuedSession {
  user: UserResponse;
  accessToken: string;
  expiresAt: string;
  /** Goes into the httpOnly cookie, never into a JSON body. */
  refreshToken: string;
}

export function toUserResponse(user: UserRow): UserResponse {
  return {
    id: user.id,
    email: user.email,
    displayName: user.displayName,
    createdAt: user.createdAt.toISOString(),
  };
}

export function normaliseEmail(email: string): string {
  return email.trim().toLowerCase();
}

export class AuthService {
  constructor(
    private readonly db: Database,
    private readonly tokens: AccessTokens,
    private readonly appUrl: string,
  ) {}

  async signUp(input: SignUpRequest): Promise<IssuedSession> {
    const email = normaliseEmail(input.email);
    const passwordHash = await hashPassword(input.password);
    return this.db.transaction(async (tx) => {
      const user = await repo.insertUser(tx, {
        email,
        displayName: input.displayName,
        passwordHash,
      });
      if (!user) throw new ConflictError('An account with this e-mail exists already', 'email');
      await recordAudit(tx, {
        workspaceId: null,
        actorId: user.id,
        action: 'user.signed_up',
        subject: email,
      });
      return this.startSession(tx, user, randomUUID());
    });
  }

  async signIn(input: SignInRequest): Promise<IssuedSession> {
    const user = await repo.findUserByEmail(this.db, normaliseEmail(input.email));
    const ok = user
      ? await verifyPassword(user.passwordHash, input.password)
      : await verifyAgainstDummy(input.password);
    if (!user || !ok) throw new InvalidCredentialsError();
    return this.startSession(this.db, user, randomUUID());
  }

  /** Exchanges a refresh token for a new one of the same family; reuse revokes the family. */
  async refresh(refreshToken: string | undefined): Promise<IssuedSession> {
    if (!refreshToken) throw new UnauthenticatedError('No session; sign in again');
    const now = new Date();
    const found = await repo.findRefreshToken(this.db, hashSecretToken(refreshToken));
    if (!found || found.revokedAt || found.expiresAt <= now) {
      throw new UnauthenticatedError('The session has ended; sign in again');
    }
    const user = await repo.findUserById(this.db, found.userId);
    if (!user) throw new UnauthenticatedError('The session has ended; sign in again');
    const session = await this.db.transaction(async (tx) =>
      (await repo.markRotated(tx, found.id, now))
        ? this.startSession(tx, user, found.familyId)
        : undefined,
    );
    if (!session) {
      // Someone presented a token that was already exchanged: one of the two holders is a thief.
      await repo.revokeFamily(this.db, found.familyId, now);
      throw new UnauthenticatedError('The session has ended; sign in again');
    }
    return session;
  }

  /**
   * Revokes the cookie's refresh family. Access tokens carry that family as `sid`, so they stop
   * working too, on this device only. Per session rather than a per-user cut-off because the web
   * client sends only the cookie to auth routes (never the bearer token), and because signing
   * out of one browser should not end the others; checking `sid` costs no extra query.
   */
  async signOut(refreshToken: string | undefined): Promise<void> {
    if (!refreshToken) return;
    const found = await repo.findRefreshToken(this.db, hashSecretToken(refreshToken));
    if (found) await repo.revokeFamily(this.db, found.familyId, new Date());
  }

  /** Always succeeds from the caller's view, so it does not reveal which e-mails exist. */
  async forgotPassword(emailInput: string): Promise<void> {
    const user = await repo.findUserByEmail(this.db, normaliseEmail(emailInput));
    if (!user) return;
    const { token, hash } = newSecretToken();
    await this.db.transaction(async (tx) => {
      const resetId = await repo.insertPasswordReset(tx, {
        userId: user.id,
        tokenHash: hash,
        expiresAt: new Date(Date.now() + resetTokenLifetimeMs),
      });
      await insertOutboxMessage(
        tx,
        passwordResetMail({ resetId, to: user.email, appUrl: this.appUrl, token }),
      );
    });
  }

  async resetPassword(token: string, password: string): Promise<void> {
    const passwordHash = await hashPassword(password);
    await this.db.transaction(async (tx) => {
      const now = new Date();
      const userId = await repo.consumePasswordReset(tx, hashSecretToken(token), now);
      if (!userId) {
        throw new ValidationError('token: is invalid, used already or expired', 'token');
      }
      // The new version refuses every access token issued before; revoking the families ends
      // the refresh tokens (and, through `sid`, their access tokens as well).
      await repo.replacePasswordHash(tx, userId, passwordHash);
      await repo.revokeAllForUser(tx, userId, now);
      const user = await repo.findUserById(tx, userId);
      await recordAudit(tx, {
        workspaceId: null,
        actorId: userId,
        action: 'user.password_reset',
        subject: user?.email ?? userId,
      });
    });
  }

  /** The user of a verified access token whose session and token version are still current. */
  async loadUser(subject: AccessTokenSubject) {
    return repo.findUserForAccessToken(this.db, subject);
  }

  async getUser(id: string): Promise<UserResponse> {
    const user = await repo.findUserById(this.db, id);
    if (!user) throw new UnauthenticatedError();
    return toUserResponse(user);
  }

  private async startSession(
    ex: Executor,
    user: UserRow,
    familyId: string,
  ): Promise<IssuedSession> {
    const { token, hash } = newSecretToken();
    await repo.insertRefreshToken(ex, {
      userId: user.id,
      familyId,
      tokenHash: hash,
      expiresAt: new Date(Date.now() + refreshTokenLifetimeMs),
    });
    const access = this.tokens.issue({
      userId: user.id,
      sessionId: familyId,
      tokenVersion: user.tokenVersion,
    });
    return {
      user: toUserResponse(user),
      accessToken: access.token,
      expiresAt: access.expiresAt.toISOString(),
      refreshToken: token,
    };
  }
}

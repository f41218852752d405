import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import {
  ExtractJwt,
  Strategy as JwtStrategy,
  type StrategyOptionsWithoutRequest,
} from 'passport-jwt';
import { z } from 'zod';
import type { AuthUser } from '../http/request-context';

// Fifteen minutes bounds how long a stolen access token works; the refresh cookie renews it.
export const accessTokenLifetimeS = 15 * 60;
export const tokenIssuer = 'couplet';
export const tokenAudience = 'couplet-api';

export interface IssuedAccessToken {
  token: string;
  expiresAt: Date;
}

/**
 * What an access token binds besides its user. `sid` is the refresh-token family the token was
 * issued with, so ending that session (sign-out, detected reuse) stops its access tokens too;
 * `ver` is the user's token version, so a password reset stops every access token at once.
 */
export interface AccessTokenSubject {
  userId: string;
  sessionId: string;
  tokenVersion: number;
}

// The claims every token of ours carries. jsonwebtoken checks exp only when present (a token
// without one would never expire), and the ids go into uuid columns, so their shape is checked
// before any query. Tokens signed before sid/ver existed fail here: the client refreshes once.
const requiredClaims = z.object({
  exp: z.number(),
  sub: z.guid(),
  sid: z.guid(),
  ver: z.number().int().nonnegative(),
});

/** Signs and verifies access tokens (HS256, key held as a KeyObject, never as a string). */
export class AccessTokens {
  private readonly key: KeyObject;

  constructor(secretHex: string) {
    this.key = createSecretKey(Buffer.from(secretHex, 'hex'));
  }

  issue(subject: AccessTokenSubject, now = new Date()): IssuedAccessToken {
    const iat = Math.floor(now.getTime() / 1000);
    const exp = iat + accessTokenLifetimeS;
    const claims = { iat, exp, sid: subject.sessionId, ver: subject.tokenVersion };
    const token = jwt.sign(claims, this.key, {
      algorithm: 'HS256',
      issuer: tokenIssuer,
      audience: tokenAudience,
      subject: subject.userId,
    });
    return { token, expiresAt: new Date(exp * 1000) };
  }

  /**
   * A passport strategy that accepts only HS256 tokens with exp, our issuer and audience, and
   * hands their subject to `loadUser`, which answers undefined for an ended session or version.
   */
  strategy(loadUser: (subject: AccessTokenSubject) => Promise<AuthUser | undefined>): JwtStrategy {
    const options: StrategyOptionsWithoutRequest = {
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // passport-jwt hands the key straight to jsonwebtoken, which takes a KeyObject.
      secretOrKey: this.key as unknown as Buffer,
      algorithms: ['HS256'],
      issuer: tokenIssuer,
      audience: tokenAudience,
    };
    return new JwtStrategy(options, (payload: jwt.JwtPayload, done) => {
      const claims = requiredClaims.safeParse(payload);
      if (!claims.success) {
        done(null, false);
        return;
      }
      const { sub, sid, ver } = claims.data;
      loadUser({ userId: sub, sessionId: sid, tokenVersion: ver }).then(
        (user) => done(null, user ?? false),
        (err: unknown) => done(err, false),
      );
    });
  }
}

import { createSecretKey, type KeyObject } from 'node:crypto';
import jwt from 'jsonwebtoken';
import {
  ExtractJwt,
  Strategy as JwtStrategy,
  type StrategyOptionsWithoutRequest,
} from 'passport-jwt';
import type { AuthUser } from '../http/request-context';

// Fifteen minutes bounds how long a stolen access token works; the refresh cookie renews it.
export const accessTokenLifetimeS = 15 * 60;
export const tokenIssuer = 'couplet';
export const tokenAudience = 'couplet-api';

export interface IssuedAccessToken {
  token: string;
  expiresAt: Date;
}

/** Signs and verifies access tokens (HS256, key held as a KeyObject, never as a string). */
export class AccessTokens {
  private readonly key: KeyObject;

  constructor(secretHex: string) {
    this.key = createSecretKey(Buffer.from(secretHex, 'hex'));
  }

  issue(userId: string, now = new Date()): IssuedAccessToken {
    const iat = Math.floor(now.getTime() / 1000);
    const exp = iat + accessTokenLifetimeS;
    const token = jwt.sign({ iat, exp }, this.key, {
      algorithm: 'HS256',
      issuer: tokenIssuer,
      audience: tokenAudience,
      subject: userId,
    });
    return { token, expiresAt: new Date(exp * 1000) };
  }

  /** A passport strategy that accepts only HS256 tokens with exp, our issuer and audience. */
  strategy(loadUser: (id: string) => Promise<AuthUser | undefined>): JwtStrategy {
    const options: StrategyOptionsWithoutRequest = {
      jwtFromRequest: ExtractJwt.fromAuthHeaderAsBearerToken(),
      // passport-jwt hands the key straight to jsonwebtoken, which takes a KeyObject.
      secretOrKey: this.key as unknown as Buffer,
      algorithms: ['HS256'],
      issuer: tokenIssuer,
      audience: tokenAudience,
    };
    return new JwtStrategy(options, (payload: jwt.JwtPayload, done) => {
      // jsonwebtoken checks exp only when present; a token without one would never expire.
      if (typeof payload.exp !== 'number' || typeof payload.sub !== 'string') {
        done(null, false);
        return;
      }
      loadUser(payload.sub).then(
        (user) => done(null, user ?? false),
        (err: unknown) => done(err, false),
      );
    });
  }
}

import type { RequestHandler } from 'express';
import { ipKeyGenerator, rateLimit } from 'express-rate-limit';
import type { RateLimitConfig } from '../config/config';
import { RateLimitedError } from '../errors/app-errors';

/**
 * A limiter keyed by client address and the e-mail in the body, so one address cannot guess
 * passwords for one account quickly, and the answer is our 429 problem body.
 */
export function emailRateLimiter(config: RateLimitConfig): RequestHandler {
  return rateLimit({
    windowMs: config.windowMs,
    limit: config.limit,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    keyGenerator: (req) => {
      const body: unknown = req.body;
      const email =
        typeof body === 'object' &&
        body !== null &&
        'email' in body &&
        typeof body.email === 'string'
          ? body.email.trim().toLowerCase().slice(0, 254)
          : '';
      return `${ipKeyGenerator(req.ip ?? '')}|${email}`;
    },
    handler: (_req, _res, next) => next(new RateLimitedError()),
  });
}

import type { ProblemCode } from './problem-dto';

/** Base of every error the API turns into a problem-details body. */
export class AppError extends Error {
  constructor(
    readonly status: number,
    readonly code: ProblemCode,
    message: string,
    readonly field?: string,
  ) {
    super(message);
    this.name = new.target.name;
  }
}

export class ValidationError extends AppError {
  constructor(message: string, field?: string) {
    super(400, 'validation_failed', message, field);
  }
}

export class MalformedJsonError extends AppError {
  constructor() {
    super(400, 'malformed_json', 'The request body is not valid JSON');
  }
}

export class PayloadTooLargeError extends AppError {
  constructor(limit: string) {
    super(413, 'payload_too_large', `The request body is larger than ${limit}`);
  }
}

export class UnauthenticatedError extends AppError {
  constructor(message = 'Sign in to continue') {
    super(401, 'unauthenticated', message);
  }
}

export class InvalidCredentialsError extends AppError {
  constructor() {
    super(401, 'invalid_credentials', 'E-mail or password is wrong');
  }
}

export class TokenExpiredError extends AppError {
  constructor() {
    super(401, 'token_expired', 'The access token has expired; refresh it');
  }
}

export class ForbiddenError extends AppError {
  constructor(message = 'Your role in this workspace does not allow this') {
    super(403, 'forbidden', message);
  }
}

export class NotFoundError extends AppError {
  constructor(message = 'Not found') {
    super(404, 'not_found', message);
  }
}

export class ConflictError extends AppError {
  constructor(message: string, field?: string) {
    super(409, 'conflict', message, field);
  }
}

/** A delete refused because other records still use the thing (a coil used by studies). */
export class InUseError extends AppError {
  constructor(
    message: string,
    readonly usedBy: { id: string; name: string }[],
  ) {
    super(409, 'in_use', message);
  }
}

/** An update sent with a version older than the stored one (optimistic concurrency). */
export class StaleVersionError extends AppError {
  constructor(
    message: string,
    readonly currentVersion: number,
  ) {
    super(409, 'stale_version', message, 'version');
  }
}

export class LastOwnerError extends AppError {
  constructor() {
    super(409, 'last_owner', 'A workspace must keep at least one owner');
  }
}

export class RateLimitedError extends AppError {
  constructor() {
    super(429, 'rate_limited', 'Too many attempts; wait a few minutes and try again');
  }
}

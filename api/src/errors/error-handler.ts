import type { ErrorRequestHandler, RequestHandler } from 'express';
import type { Logger } from 'pino';
import {
  AppError,
  InUseError,
  MalformedJsonError,
  NotFoundError,
  PayloadTooLargeError,
  StaleVersionError,
} from './app-errors';
import type { ProblemResponse } from './problem-dto';

const titles: Record<number, string> = {
  400: 'Bad Request',
  401: 'Unauthorized',
  403: 'Forbidden',
  404: 'Not Found',
  409: 'Conflict',
  413: 'Content Too Large',
  429: 'Too Many Requests',
  500: 'Internal Server Error',
};

function problemOf(error: AppError): ProblemResponse {
  const body: ProblemResponse = {
    type: 'about:blank',
    status: error.status,
    title: titles[error.status] ?? 'Error',
    code: error.code,
    message: error.message,
  };
  if (error.field !== undefined) body.field = error.field;
  if (error instanceof InUseError) body.usedBy = error.usedBy;
  if (error instanceof StaleVersionError) body.currentVersion = error.currentVersion;
  return body;
}

/** Express's body parser marks its own failures with `type`. */
function bodyParserError(err: unknown, jsonLimit: string): AppError | undefined {
  if (typeof err !== 'object' || err === null || !('type' in err)) return undefined;
  if (err.type === 'entity.parse.failed') return new MalformedJsonError();
  if (err.type === 'entity.too.large') return new PayloadTooLargeError(jsonLimit);
  return undefined;
}

/** The one error middleware: every failure becomes an RFC 9457 problem-details body. */
export function errorHandler(logger: Logger, jsonLimit: string): ErrorRequestHandler {
  return (err, req, res, next) => {
    if (res.headersSent) {
      next(err);
      return;
    }
    let known = err instanceof AppError ? err : bodyParserError(err, jsonLimit);
    if (!known) {
      logger.error({ err, method: req.method, url: req.originalUrl }, 'unhandled error');
      known = new AppError(500, 'internal', 'Something went wrong on our side');
    }
    res.status(known.status).type('application/problem+json').json(problemOf(known));
  };
}

/** The last route: anything unmatched under the API is a JSON 404. */
export const notFoundHandler: RequestHandler = (req, _res, next) => {
  next(new NotFoundError(`No route for ${req.method} ${req.path}`));
};

import cookieParser from 'cookie-parser';
import express, { type Express } from 'express';
import helmet from 'helmet';
import passport from 'passport';
import pino, { type Logger } from 'pino';
import { pinoHttp } from 'pino-http';
import { AccessTokens } from './auth/access-tokens';
import { authRoutes } from './auth/auth-routes';
import { AuthService } from './auth/auth-service';
import { warmDummyHash } from './auth/password-hasher';
import { emailRateLimiter } from './auth/rate-limits';
import { coilsRoutes } from './coils/coils-routes';
import { CoilsService } from './coils/coils-service';
import type { AppConfig } from './config/config';
import type { Database } from './db/database';
import { renderDocsPage } from './docs/docs-page';
import { buildOpenApiDocument } from './docs/openapi-document';
import { TokenExpiredError, UnauthenticatedError } from './errors/app-errors';
import { errorHandler, notFoundHandler } from './errors/error-handler';
import { healthRoutes } from './health/health-routes';
import { mountRoutes, type AccessGuards, type RouteDefinition } from './http/route-definition';
import { devMailRoutes } from './mail/dev-mail-routes';
import type { CapturedMailStore } from './mail/fake-smtp-server';
import { RevisionsService } from './studies/revisions-service';
import { studiesRoutes } from './studies/studies-routes';
import { StudiesService } from './studies/studies-service';
import { sweepsRoutes } from './sweeps/sweeps-routes';
import { SweepsRuntime } from './sweeps/sweeps-runtime';
import { SweepsService } from './sweeps/sweeps-service';
import { serveWeb } from './web/serve-web';
import { InvitationsService } from './workspaces/invitations-service';
import { loadMembership, requireRole } from './workspaces/membership-guards';
import { workspacesRoutes } from './workspaces/workspaces-routes';
import { WorkspacesService } from './workspaces/workspaces-service';

export const apiVersion = '0.1.0';

// The API takes small JSON forms; 100 kB is far above any of them (a coil spec is a few kB) and
// stops a client from making the event loop parse megabytes. File uploads use their own limits.
export const jsonBodyLimit = '100kb';

export interface AppDeps {
  config: AppConfig;
  db: Database;
  logger?: Logger;
  /** Where the local fake SMTP server keeps mail; served at /api/v1/dev/mail outside production. */
  capturedMail?: CapturedMailStore;
  /** Sweep queue, estimate thread and event hub; one that needs no clean-up is made if absent. */
  sweeps?: SweepsRuntime;
}

export interface CreatedApp {
  app: Express;
  routes: RouteDefinition[];
}

function contentSecurityPolicy(https: boolean) {
  return {
    directives: {
      // Over plain http (local development) upgrading would break every request.
      upgradeInsecureRequests: https ? [] : null,
      defaultSrc: ["'self'"],
      scriptSrc: ["'self'"],
      // Angular Material and component styles are inlined at run time.
      styleSrc: ["'self'", "'unsafe-inline'"],
      // The physics previews run in web workers, some of them created from blobs.
      workerSrc: ["'self'", 'blob:'],
      // Map and chart exports are drawn to data: and blob: images.
      imgSrc: ["'self'", 'data:', 'blob:'],
      fontSrc: ["'self'", 'data:'],
      connectSrc: ["'self'"],
      objectSrc: ["'none'"],
      frameAncestors: ["'none'"],
      baseUri: ["'self'"],
      formAction: ["'self'"],
    },
  };
}

/** Builds the Express app; tests import this, main.ts listens on it. */
export function createApp(deps: AppDeps): CreatedApp {
  const { config, db } = deps;
  const logger = deps.logger ?? pino({ level: config.logLevel });
  const tokens = new AccessTokens(config.jwtSecretHex);
  const auth = new AuthService(db, tokens, config.appUrl);
  const workspaces = new WorkspacesService(db);
  const invitations = new InvitationsService(db, config.appUrl);
  const coils = new CoilsService(db);
  const studies = new StudiesService(db);
  const revisions = new RevisionsService(db);
  const sweepsRuntime =
    deps.sweeps ?? new SweepsRuntime({ databaseUrl: config.databaseUrl, logger });
  const sweeps = new SweepsService(db, sweepsRuntime);
  warmDummyHash();

  // A private Passport instance: no global state shared between apps (tests build many).
  const authenticator = new passport.Passport();
  authenticator.use(
    'jwt',
    tokens.strategy((subject) => auth.loadUser(subject)),
  );
  const guards: AccessGuards = {
    authenticate: (req, res, next) => {
      authenticator.authenticate(
        'jwt',
        { session: false },
        (err: unknown, user: unknown, info: unknown) => {
          if (err) return next(err);
          if (!user) {
            const expired = info instanceof Error && info.name === 'TokenExpiredError';
            return next(expired ? new TokenExpiredError() : new UnauthenticatedError());
          }
          req.user = user as Express.User;
          next();
        },
      )(req, res, next);
    },
    loadMembership: loadMembership(workspaces),
    requireRole,
  };

  const https = config.appUrl.startsWith('https://');
  const routes: RouteDefinition[] = [
    ...healthRoutes(db),
    ...authRoutes({
      auth,
      workspaces,
      secureCookies: https,
      signInLimiter: emailRateLimiter(config.rateLimits.signIn),
      forgotPasswordLimiter: emailRateLimiter(config.rateLimits.forgotPassword),
    }),
    ...workspacesRoutes(workspaces, invitations),
    ...coilsRoutes(coils),
    ...studiesRoutes(studies, revisions),
    ...sweepsRoutes(sweeps, sweepsRuntime, { logger }),
    ...(config.nodeEnv === 'production' ? [] : devMailRoutes(deps.capturedMail)),
  ];
  const openApi = buildOpenApiDocument(routes, apiVersion);
  const docsPage = renderDocsPage(openApi);

  const app = express();
  app.disable('x-powered-by');
  app.use(
    helmet({
      contentSecurityPolicy: contentSecurityPolicy(https),
      // HSTS on a plain-http origin would pin browsers to https that is not there.
      strictTransportSecurity: https,
    }),
  );
  app.use(
    pinoHttp({
      logger,
      // One short line per request; headers (tokens, cookies) are never logged, and the secret
      // part of invitation links is masked.
      serializers: {
        req: (req: { method: string; url: string }) => ({
          method: req.method,
          url: req.url.replace(/\/invitations\/[^/?]+/, '/invitations/[token]'),
        }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
    }),
  );

  const api = express.Router();
  api.use(express.json({ limit: jsonBodyLimit }));
  api.use(cookieParser());
  api.use((_req, res, next) => {
    // API answers are per user; no shared cache may keep them.
    res.setHeader('Cache-Control', 'no-store');
    next();
  });
  api.get('/docs/openapi.json', (_req, res) => {
    res.json(openApi);
  });
  api.get('/docs', (_req, res) => {
    res.type('html').send(docsPage);
  });
  const v1 = express.Router();
  mountRoutes(v1, routes, guards);
  api.use('/v1', v1);
  api.use(notFoundHandler);
  app.use('/api', api);

  if (config.webDist) app.use(serveWeb(config.webDist));
  app.use(notFoundHandler);
  app.use(errorHandler(logger, jsonBodyLimit));
  return { app, routes };
}

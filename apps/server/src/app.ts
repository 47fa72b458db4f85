import { createRequire } from 'node:module';
import cookieParser from 'cookie-parser';
import { doubleCsrf } from 'csrf-csrf';
import express, { type Express, type RequestHandler } from 'express';
import { rateLimit } from 'express-rate-limit';
import session from 'express-session';
import helmet from 'helmet';
import { RequestContext } from '@mikro-orm/core';
import type { MikroORM } from '@mikro-orm/sqlite';
import { pinoHttp } from 'pino-http';
import { SurfaceRunner } from './jobs/surface-runner.js';
import { ScoringRunner } from './jobs/scoring-runner.js';
import type { AppConfig } from './config.js';
import { ormInit } from './db.js';
import { loggerCreate } from './logger.js';
import { authRoutes } from './modules/auth/auth.routes.js';
import { customerFilesInterrupted } from './modules/customer-file/customer-file-import.js';
import { customerFileRoutes } from './modules/customer-file/customer-file.routes.js';
import { passportCreate } from './modules/auth/passport-setup.js';
import { AppError } from './modules/common/errors.js';
import { apiNotFound, errorHandler } from './modules/common/error-handler.js';
import { healthRoutes } from './modules/health/health.routes.js';
import { mailerCreate, type OutgoingMail } from './modules/mail/mailer.js';
import { organizationRoutes } from './modules/organization/organization.routes.js';
import { billingRoutes } from './modules/billing/billing.routes.js';
import { lowBalanceNotifierCreate } from './modules/billing/billing-notify.js';
import { billingWebhookHandler } from './modules/billing/billing-webhook.js';
import { creditsLowBalanceNotifierSet } from './modules/billing/credits.service.js';
import { stripeClientCreate } from './modules/billing/stripe-client.js';
import { invitationOrgRoutes, invitationPublicRoutes } from './modules/invitation/invitation.routes.js';
import { SqliteSessionStore } from './modules/session/session-store.js';
import { meRoutes } from './modules/user/user.routes.js';
import { surfaceRoutes } from './modules/surface/surface.routes.js';
import { siteRoutes } from './modules/site/site.routes.js';
import { scoringRoutes } from './modules/scoring/scoring.routes.js';
import { reportRunRoutes } from './modules/report/report.routes.js';
import { shortlistOrgRoutes, shortlistRoutes } from './modules/shortlist/shortlist.routes.js';
import { webStaticMount } from './web-static.js';

const { version } = createRequire(import.meta.url)('../package.json') as { version: string };

/** The running app and its handles. */
export interface DemandscapeApp {
  app: Express;
  orm: MikroORM;
  /** Messages sent while MAIL_TRANSPORT=capture (tests read tokens from here). */
  mailbox: OutgoingMail[];
  sessionStore: SqliteSessionStore;
  /** Whether the built web app is served. */
  servesWeb: boolean;
  /** Runs queued demand surfaces; `server.ts` (and tests that need runs) call `start()`. */
  surfaceRunner: SurfaceRunner;
  /** Computes scoring runs, stability checks and candidate sets in worker threads (started by createApp). */
  scoringRunner: ScoringRunner;
  close: () => Promise<void>;
}

/**
 * Builds the Express app: opens SQLite and runs migrations, then wires security headers, sessions,
 * CSRF, rate limits, passport, the API routes, the built web app and the single error handler.
 * @param config - validated configuration (see `configFromEnv`)
 * @returns the app, ORM, captured mailbox and a `close` that releases everything
 * @example
 * const { app, close } = await createApp(configFromEnv(process.env));
 */
export async function createApp(config: AppConfig): Promise<DemandscapeApp> {
  const log = loggerCreate(config.logLevel);
  const orm = await ormInit(config.databaseFile, (message) => log.info({ component: 'orm' }, message));
  const em = orm.em;
  const mailer = mailerCreate(config.mail, log);
  const sessionStore = new SqliteSessionStore(orm, config.sessionTtlMs);
  const passport = passportCreate(em, config);
  const stripe = stripeClientCreate(config.billing);
  creditsLowBalanceNotifierSet(em, lowBalanceNotifierCreate(em, mailer, config.publicUrl, log));
  const pruneTimer = setInterval(() => void sessionStore.prune().catch((err) => log.warn({ err }, 'session prune failed')), 3600_000);
  pruneTimer.unref();

  const app = express();
  app.disable('x-powered-by');
  if (config.trustProxy) app.set('trust proxy', 1);
  app.use(
    pinoHttp({
      logger: log,
      // Paths only: query strings can carry OAuth codes.
      serializers: {
        req: (req: { id: unknown; method: string; url: string }) => ({ id: req.id, method: req.method, path: req.url.split('?')[0] }),
        res: (res: { statusCode: number }) => ({ statusCode: res.statusCode }),
      },
      customProps: (req) => ({ userId: (req as express.Request).user?.id }),
    }),
  );
  app.use(
    helmet({
      contentSecurityPolicy: {
        directives: {
          defaultSrc: ["'self'"],
          scriptSrc: ["'self'"],
          styleSrc: ["'self'", "'unsafe-inline'"],
          imgSrc: ["'self'", 'data:', 'blob:'],
          workerSrc: ["'self'", 'blob:'],
          childSrc: ["'self'", 'blob:'],
          connectSrc: ["'self'"],
          fontSrc: ["'self'", 'data:'],
          objectSrc: ["'none'"],
          frameAncestors: ["'none'"],
          upgradeInsecureRequests: config.secureCookies ? [] : null,
        },
      },
    }),
  );
  app.use((_req, _res, next) => RequestContext.create(em, next));
  // Raw body for the signature check, so this sits before JSON parsing; no session or CSRF (the provider has neither).
  app.post('/api/billing/webhook', express.raw({ type: '*/*', limit: '1mb' }), billingWebhookHandler({ em, stripe, billing: config.billing, mailer, publicUrl: config.publicUrl, log }));
  app.use(express.json({ limit: '1mb' }));
  app.use(cookieParser());
  app.use(
    session({
      name: 'ds.sid',
      secret: config.sessionSecret,
      store: sessionStore,
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: { httpOnly: true, sameSite: 'lax', secure: config.secureCookies, maxAge: config.sessionTtlMs, path: '/' },
    }),
  );
  app.use(passport.session());

  const csrf = doubleCsrf({
    getSecret: () => config.sessionSecret,
    getSessionIdentifier: (req) => req.sessionID,
    cookieName: config.secureCookies ? '__Host-ds.csrf' : 'ds.csrf',
    cookieOptions: { sameSite: 'lax', secure: config.secureCookies, httpOnly: true, path: '/' },
    getCsrfTokenFromRequest: (req) => req.headers['x-csrf-token'],
  });
  app.use('/api', csrf.doubleCsrfProtection);

  const limiter = (): RequestHandler =>
    rateLimit({
      windowMs: 60_000,
      limit: config.rateLimitAuthPerMinute,
      standardHeaders: 'draft-8',
      legacyHeaders: false,
      handler: (_req, _res, next) => next(new AppError(429, 'RATE_LIMITED', 'Too many attempts from this address. Wait a minute and try again.')),
    });

  app.use('/api/health', healthRoutes(orm, version));
  app.use(
    '/api/auth',
    authRoutes({
      em,
      mailer,
      publicUrl: config.publicUrl,
      googleEnabled: config.google.enabled,
      passport,
      sessionStore,
      limiter,
      csrfToken: (req, res) => csrf.generateCsrfToken(req, res),
    }),
  );
  app.use('/api/me', meRoutes(em, sessionStore));
  await customerFilesInterrupted(orm);
  const customerFiles = customerFileRoutes({ em, orm, uploadsDir: config.uploadsDir, uploadMaxBytes: config.uploadMaxBytes });
  app.use('/api/organizations/:orgId/workspaces/:workspaceId/customer-files', customerFiles.router);
  const surfaceRunner = new SurfaceRunner(orm, { concurrency: config.runnerConcurrency, log, mailer, publicUrl: config.publicUrl });
  app.use('/api/organizations/:orgId/workspaces/:workspaceId/surfaces', surfaceRoutes(em, surfaceRunner));
  app.use('/api/organizations/:orgId/workspaces/:workspaceId/sites', siteRoutes(em));
  const scoringRunner = new ScoringRunner(orm, { concurrency: config.runnerConcurrency, log });
  await scoringRunner.start();
  app.use('/api/organizations/:orgId/workspaces/:workspaceId', scoringRoutes(em, scoringRunner));
  app.use('/api/organizations/:orgId/workspaces/:workspaceId/scoring-runs', reportRunRoutes(em));
  app.use('/api/organizations/:orgId/workspaces/:workspaceId/shortlists', shortlistRoutes({ em, mailer, publicUrl: config.publicUrl }));
  app.use('/api/organizations/:orgId/shortlists', shortlistOrgRoutes(em));
  app.use('/api/organizations/:orgId/billing', billingRoutes({ em, stripe, billing: config.billing, publicUrl: config.publicUrl }));
  app.use('/api/organizations/:orgId/invitations', invitationOrgRoutes({ em, mailer, publicUrl: config.publicUrl }));
  app.use('/api/invitations', invitationPublicRoutes({ em }));
  app.use('/api/organizations', organizationRoutes(em));
  app.use('/api', apiNotFound());
  const servesWeb = webStaticMount(app, config.webDist);
  app.use(errorHandler(log));

  return {
    app,
    orm,
    mailbox: mailer.captured,
    sessionStore,
    servesWeb,
    surfaceRunner,
    scoringRunner,
    close: async () => {
      clearInterval(pruneTimer);
      await surfaceRunner.stop();
      await scoringRunner.stop();
      await customerFiles.imports.idle();
      mailer.close();
      await orm.close(true);
    },
  };
}

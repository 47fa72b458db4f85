import { Router, type Request, type RequestHandler } from 'express';
import type { EntityManager } from '@mikro-orm/sqlite';
import type { Passport } from 'passport';
import {
  authEmailVerify,
  authPasswordForgot,
  authPasswordReset,
  authSignUp,
  authVerificationResend,
  type AuthDeps,
} from './auth.service.js';
import { forgotPasswordSchema, resetPasswordSchema, signInSchema, signUpSchema, verifyEmailSchema } from './auth.schemas.js';
import { auditRecord } from '../audit/audit.service.js';
import { InvalidCredentialsError } from '../common/errors.js';
import { requireSession, sessionUser } from '../common/guards.js';
import { inputParse } from '../common/validate.js';
import type { SqliteSessionStore } from '../session/session-store.js';
import { userView, type User } from '../user/user.entity.js';
import type { Mailer } from '../mail/mailer.js';

/** What the auth routes need from the app. */
export interface AuthRouteDeps {
  em: EntityManager;
  mailer: Mailer;
  publicUrl: string;
  googleEnabled: boolean;
  passport: InstanceType<typeof Passport>;
  sessionStore: SqliteSessionStore;
  /** Rate limiter per sensitive route (sign-in, sign-up, forgot, reset). */
  limiter: () => RequestHandler;
  csrfToken: (req: Request, res: Parameters<RequestHandler>[1]) => string;
}

function signIn(req: Request, user: User): Promise<void> {
  return new Promise((resolve, reject) => req.login(user, (err) => (err ? reject(err) : resolve())));
}

function signOut(req: Request): Promise<void> {
  return new Promise((resolve, reject) => req.logout((err) => (err ? reject(err) : resolve())));
}

/**
 * `/api/auth`: CSRF token, sign-up/in/out, password reset, e-mail verification, Google sign-in.
 * @param deps - entity manager, mailer, passport, session store, limiter factory, CSRF token issuer
 * @returns the router
 * @example
 * app.use('/api/auth', authRoutes(deps));
 */
export function authRoutes(deps: AuthRouteDeps): Router {
  const router = Router();
  const { em, passport } = deps;
  const serviceDeps: AuthDeps = { em, mailer: deps.mailer, publicUrl: deps.publicUrl };

  router.get('/csrf', (req, res) => {
    // The token is bound to the session id, so the (possibly anonymous) session must persist.
    req.session.csrfIssuedAt = Date.now();
    res.json({ csrfToken: deps.csrfToken(req, res) });
  });

  router.get('/providers', (_req, res) => {
    res.json({ google: { enabled: deps.googleEnabled, label: 'Continue with Google' } });
  });

  router.post('/sign-up', deps.limiter(), async (req, res) => {
    const input = inputParse(signUpSchema, req.body);
    const user = await authSignUp(serviceDeps, input);
    await signIn(req, user);
    res.status(201).json({ user: userView(user) });
  });

  router.post('/sign-in', deps.limiter(), async (req, res, next) => {
    req.body = inputParse(signInSchema, req.body);
    const user = await new Promise<User | false>((resolve, reject) => {
      passport.authenticate('local', { session: false }, (err: unknown, found: User | false) => (err ? reject(err) : resolve(found)))(req, res, next);
    });
    if (!user) throw new InvalidCredentialsError();
    await signIn(req, user);
    auditRecord(em, { action: 'auth.sign_in', actor: user, details: { method: 'password' } });
    await em.flush();
    res.json({ user: userView(user) });
  });

  router.post('/sign-out', async (req, res) => {
    if (req.user) {
      auditRecord(em, { action: 'auth.sign_out', actor: req.user });
      await em.flush();
      await signOut(req);
    }
    res.status(204).end();
  });

  router.post('/forgot-password', deps.limiter(), async (req, res) => {
    const { email } = inputParse(forgotPasswordSchema, req.body);
    await authPasswordForgot(serviceDeps, email);
    res.status(202).json({ message: 'If an account exists for this e-mail, a reset link is on its way.' });
  });

  router.post('/reset-password', deps.limiter(), async (req, res) => {
    const { token, password } = inputParse(resetPasswordSchema, req.body);
    const user = await authPasswordReset(em, token, password);
    await deps.sessionStore.destroyForUser(user.id);
    res.status(204).end();
  });

  router.post('/verify-email', async (req, res) => {
    const { token } = inputParse(verifyEmailSchema, req.body);
    await authEmailVerify(em, token);
    res.status(204).end();
  });

  router.post('/resend-verification', requireSession(), async (req, res) => {
    await authVerificationResend(serviceDeps, sessionUser(req));
    res.status(204).end();
  });

  router.get('/google', (req, res, next) => {
    if (!deps.googleEnabled) return res.redirect(302, '/sign-in?error=google');
    passport.authenticate('google', { scope: ['openid', 'email', 'profile'] })(req, res, next);
  });

  router.get('/google/callback', async (req, res, next) => {
    if (!deps.googleEnabled) return res.redirect(302, '/sign-in?error=google');
    const user = await new Promise<User | false>((resolve) => {
      passport.authenticate('google', { session: false }, (err: unknown, found: User | false) => {
        if (err) req.log.warn({ err }, 'Google sign-in failed');
        resolve(err ? false : found);
      })(req, res, next);
    });
    if (!user) return res.redirect(302, '/sign-in?error=google');
    await signIn(req, user);
    auditRecord(em, { action: 'auth.sign_in', actor: user, details: { method: 'google' } });
    await em.flush();
    res.redirect(302, '/');
  });

  return router;
}

declare module 'express-session' {
  interface SessionData {
    csrfIssuedAt?: number;
  }
}

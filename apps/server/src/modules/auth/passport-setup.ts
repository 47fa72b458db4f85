import { Passport } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import { Strategy as GoogleStrategy, type Profile } from 'passport-google-oauth20';
import type { EntityManager } from '@mikro-orm/sqlite';
import { authCredentialsCheck, authGoogleUser } from './auth.service.js';
import { UserSchema } from '../user/user.entity.js';
import type { AppConfig } from '../../config.js';

/**
 * A passport instance for one app: sessions hold only the user id; `local` checks e-mail and
 * password; `google` talks to the configured OAuth 2.0 endpoints (the local fake in development).
 * @param em - entity manager (request-scoped through RequestContext)
 * @param config - app configuration (Google endpoints and callback URL)
 * @returns the configured passport instance
 * @example
 * const passport = passportCreate(orm.em, config); app.use(passport.session());
 */
export function passportCreate(em: EntityManager, config: AppConfig): InstanceType<typeof Passport> {
  const passport = new Passport();
  passport.serializeUser<string>((user, done) => done(null, user.id));
  passport.deserializeUser<string>((id, done) => {
    em.findOne(UserSchema, { id })
      .then((user) => done(null, user ?? false))
      .catch((err) => done(err));
  });

  passport.use(
    'local',
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', session: true }, (email, password, done) => {
      authCredentialsCheck(em, email, password)
        .then((user) => done(null, user ?? false))
        .catch((err) => done(err));
    }),
  );

  if (config.google.enabled) {
    passport.use(
      'google',
      new GoogleStrategy(
        {
          clientID: config.google.clientId,
          clientSecret: config.google.clientSecret,
          callbackURL: config.google.callbackUrl,
          authorizationURL: config.google.authorizationUrl,
          tokenURL: config.google.tokenUrl,
          userProfileURL: config.google.userInfoUrl,
          state: true,
        },
        (_accessToken: string, _refreshToken: string, profile: Profile, done: (err: unknown, user?: Express.User | false) => void) => {
          const email = profile.emails?.[0];
          authGoogleUser(em, {
            subject: profile.id,
            email: email?.value ?? null,
            emailVerified: email?.verified === true || (email?.verified as unknown) === 'true',
            name: profile.displayName ?? '',
          })
            .then((user) => done(null, user ?? false))
            .catch((err) => done(err));
        },
      ),
    );
  }
  return passport;
}

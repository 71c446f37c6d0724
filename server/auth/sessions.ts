import type { Express, RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import passport from 'passport';
import type pg from 'pg';
import type { Config } from '../config';
import type { Db } from '../db/database';
import { findSessionUser } from '../features/session/users.repository';
import { AppError } from '../lib/app-error';

const IDLE_MINUTES = 8 * 60;
const ABSOLUTE_DAYS = 7;

declare module 'express-session' {
  interface SessionData {
    startedAt?: number;
    csrfReady?: boolean;
  }
}

/**
 * Sessions live in PostgreSQL so app servers stay stateless. The cookie is HttpOnly and SameSite=Lax
 * (Secure outside local development); a session ends after 8 idle hours or 7 days whatever happens.
 */
export function installSessions(app: Express, deps: { pool: pg.Pool; db: Db; config: Config }): void {
  const PgStore = connectPgSimple(session);
  app.use(
    session({
      name: 'dwell.sid',
      secret: deps.config.sessionSecret,
      store: new PgStore({ pool: deps.pool, tableName: 'session', pruneSessionInterval: 15 * 60 }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: deps.config.secureCookies,
        maxAge: IDLE_MINUTES * 60_000,
      },
    }),
  );
  app.use(absoluteTimeout);
  passport.serializeUser((user, done) => done(null, (user as { id: string }).id));
  passport.deserializeUser((id: string, done) => {
    findSessionUser(deps.db, id)
      .then((user) => done(null, user ?? false))
      .catch(done);
  });
  app.use(passport.session());
}

const absoluteTimeout: RequestHandler = (req, _res, next) => {
  const started = req.session?.startedAt;
  if (started && Date.now() - started > ABSOLUTE_DAYS * 86_400_000) {
    return req.session.destroy(() => next(new AppError('UNAUTHENTICATED', 401, 'Your session ended; sign in again.')));
  }
  next();
};

import type { Express, RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import passport from 'passport';
import type pg from 'pg';
import type { Config } from '../config';
import type { Db } from '../db/database';
import { findSessionUser } from '../features/session/users.repository';
import { AppError } from '../lib/app-error';

declare module 'express-session' {
  interface SessionData {
    startedAt?: number;
    csrfReady?: boolean;
  }
}

/**
 * Sessions live in PostgreSQL so app servers stay stateless. The cookie is HttpOnly and SameSite=Lax
 * (Secure outside local development); a session ends after `config.session.idleMinutes` without a request
 * (8 hours by default) or `absoluteHours` after sign-in (7 days by default), whatever happens.
 */
export function installSessions(app: Express, deps: { pool: pg.Pool; db: Db; config: Config }): void {
  const PgStore = connectPgSimple(session);
  // `rolling` touches the stored session on every request: an UPDATE per calendar read. Touching a session
  // at most once a minute per app server keeps the idle timeout (hours) true to within that minute.
  class ThrottledPgStore extends PgStore {
    #touched = new Map<string, number>();
    override touch(sid: string, sess: session.SessionData, done?: (err?: unknown) => void): void {
      const now = Date.now();
      if (now - (this.#touched.get(sid) ?? 0) < TOUCH_EVERY_MS) {
        done?.();
        return;
      }
      if (this.#touched.size > 10_000) this.#touched.clear();
      this.#touched.set(sid, now);
      super.touch(sid, sess, done);
    }
  }
  app.use(
    session({
      name: 'dwell.sid',
      secret: deps.config.sessionSecret,
      store: new ThrottledPgStore({ pool: deps.pool, tableName: 'session', pruneSessionInterval: 15 * 60 }),
      resave: false,
      saveUninitialized: false,
      rolling: true,
      cookie: {
        httpOnly: true,
        sameSite: 'lax',
        secure: deps.config.secureCookies,
        maxAge: deps.config.session.idleMinutes * 60_000,
      },
    }),
  );
  app.use(absoluteTimeout(deps.config.session.absoluteHours));
  passport.serializeUser((user, done) => done(null, (user as { id: string }).id));
  passport.deserializeUser((id: string, done) => {
    findSessionUser(deps.db, id)
      .then((user) => done(null, user ?? false))
      .catch(done);
  });
  app.use(passport.session());
}

const TOUCH_EVERY_MS = 60_000;

const absoluteTimeout =
  (hours: number): RequestHandler =>
  (req, _res, next) => {
    const started = req.session?.startedAt;
    if (started && Date.now() - started > hours * 3_600_000) {
      return req.session.destroy(() => next(new AppError('UNAUTHENTICATED', 401, 'Your session ended; sign in again.')));
    }
    next();
  };

import type { Express, Request, RequestHandler } from 'express';
import session from 'express-session';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';
import type { Config } from '../config';
import type { Db } from '../db/database';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { findSessionUser } from '../features/session/users.repository';
import { AppError } from '../lib/app-error';

declare module 'express-session' {
  interface SessionData {
    startedAt?: number;
    csrfReady?: boolean;
    /** The signed-in user's id. Stored sessions keep it under this name, so a release does not sign anyone out. */
    passport?: { user?: string };
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own way to add to its Request
  namespace Express {
    interface Request {
      /** The signed-in user, read from the session on every request; absent when nobody is signed in. */
      user?: SessionUser;
    }
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
  app.use(loadSessionUser(deps.db));
}

/** Puts the session's user on `req.user`; a session whose account was deactivated or removed is signed out. */
const loadSessionUser =
  (db: Db): RequestHandler =>
  (req, _res, next) => {
    const id = req.session.passport?.user;
    if (!id) return next();
    findSessionUser(db, id).then((user) => {
      if (user) req.user = user;
      else delete req.session.passport!.user;
      next();
    }, next);
  };

const settled = (resolve: () => void, reject: (err: unknown) => void) => (err: unknown) => (err ? reject(err) : resolve());
const regenerate = (req: Request) => new Promise<void>((resolve, reject) => req.session.regenerate(settled(resolve, reject)));
const save = (req: Request) => new Promise<void>((resolve, reject) => req.session.save(settled(resolve, reject)));

/** Signs `user` in on a new session id, so an id known before sign-in is worth nothing after it (no fixation). */
export async function startSession(req: Request, user: SessionUser): Promise<void> {
  await regenerate(req);
  req.session.passport = { user: user.id };
  req.session.startedAt = Date.now();
  // Stored before the answer goes out: a sign-in the store did not keep must fail, not look signed in.
  await save(req);
  req.user = user;
}

/** Signs out: the stored session is destroyed and the request goes on with a new, empty one. */
export async function endSession(req: Request): Promise<void> {
  await regenerate(req);
  delete req.user;
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

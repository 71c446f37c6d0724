import type { Express, Request, RequestHandler, Response } from 'express';
import session from 'express-session';
import { Authenticator } from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import connectPgSimple from 'connect-pg-simple';
import type pg from 'pg';
import type { Config } from '../config';
import type { Db } from '../db/database';
import { SignInBodySchema, type SessionUser } from '@shared/schemas/auth.schemas';
import { findSessionUser, signIn } from '../features/session';
import { AppError } from '../lib/app-error';

declare module 'express-session' {
  interface SessionData {
    startedAt?: number;
    csrfReady?: boolean;
    /** Where passport keeps the signed-in user's id. */
    passport?: { user?: string };
  }
}

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace -- Express's own way to add to its Request
  namespace Express {
    /** The signed-in user passport puts on `req.user`, read from the session on every request. */
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type -- passport's own way to name its user type
    interface User extends SessionUser {}
  }
}

/**
 * Sign-in is passport's: the local strategy checks an e-mail and password (through the session service, which
 * also limits failed attempts), the session keeps the user's id, and every request reads the user back, so an
 * account deactivated meanwhile is signed out at its next request. One Authenticator per app, not the module's
 * global one, so several apps in one process (tests) keep their own database.
 */
function authenticator(db: Db) {
  const auth = new Authenticator();
  auth.use(
    'local',
    new LocalStrategy({ usernameField: 'email', passwordField: 'password', passReqToCallback: true }, (req, email, password, done) => {
      // The contract has checked the body already; parsing again gives the same normalised e-mail the service expects.
      signIn(db, SignInBodySchema.parse({ email, password }), req.ip ?? 'unknown').then((user) => done(null, user), done);
    }),
  );
  auth.serializeUser((user, done) => done(null, user.id));
  // A removed or deactivated account reads back as no user: passport then drops it from the session.
  auth.deserializeUser((id: string, done) => findSessionUser(db, id).then((user) => done(null, user ?? false), done));
  return auth;
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
  const auth = authenticator(deps.db);
  app.set(AUTHENTICATOR, auth);
  app.use(auth.session());
}

const AUTHENTICATOR = 'dwell.authenticator';

const settled = (resolve: () => void, reject: (err: unknown) => void) => (err: unknown) => (err ? reject(err) : resolve());
const save = (req: Request) => new Promise<void>((resolve, reject) => req.session.save(settled(resolve, reject)));

/** Checks the request's e-mail and password with passport's local strategy; the user, or the service's refusal. */
export function authenticate(req: Request, res: Response): Promise<SessionUser> {
  const auth = req.app.get(AUTHENTICATOR) as ReturnType<typeof authenticator>;
  return new Promise((resolve, reject) => {
    auth.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false) => {
      if (err) reject(err);
      else if (!user) reject(new AppError('VALIDATION_FAILED', 400, 'Enter your e-mail and password.'));
      else resolve(user);
    })(req, res, reject);
  });
}

/**
 * Signs `user` in. passport's logIn puts the user on a new session id, so an id known before sign-in is worth
 * nothing after it (no fixation), and stores it before the answer goes out: a sign-in the store did not keep
 * fails rather than looking signed in.
 */
export async function startSession(req: Request, user: SessionUser): Promise<void> {
  await new Promise<void>((resolve, reject) => req.logIn(user, settled(resolve, reject)));
  req.session.startedAt = Date.now();
  await save(req);
}

/** Signs out: passport drops the user and the request goes on with a new, empty session. */
export async function endSession(req: Request): Promise<void> {
  await new Promise<void>((resolve, reject) => req.logOut(settled(resolve, reject)));
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

import type { RequestHandler } from 'express';
import type { Access } from '@shared/api/endpoint';
import type { SessionUser } from '@shared/schemas/auth.schemas';
import { AppError } from '../lib/app-error';

/** The one role check every route goes through (declared on the route, never an if inside a handler). */
export function requireAccess(access: Access): RequestHandler {
  return (req, _res, next) => {
    if (access === 'public') return next();
    const user = req.user as SessionUser | undefined;
    if (!user) return next(new AppError('UNAUTHENTICATED', 401, 'Sign in first.'));
    if (access !== 'signed_in' && !access.includes(user.role)) {
      return next(new AppError('FORBIDDEN', 403, 'Your role may not do this.'));
    }
    next();
  };
}

export { DESK, STAFF, type Access } from '@shared/api/endpoint';

import type { Request, RequestHandler, Response } from 'express';
import type { Role, PublicUser } from '../../shared/schemas/auth';
import { AppError } from '../http/app-error';
import type { Auth } from './lucia';
import type { SessionCache } from './session-cache';

declare global {
  namespace Express {
    interface Request {
      user?: PublicUser;
      sessionId?: string;
    }
  }
}

export function writeSessionCookie(auth: Auth, req: Request, res: Response, sessionId: string | null) {
  const cookie = sessionId ? auth.createSessionCookie(sessionId) : auth.createBlankSessionCookie();
  const { sameSite, maxAge, path, httpOnly } = cookie.attributes;
  res.cookie(cookie.name, cookie.value, {
    httpOnly: httpOnly ?? true,
    sameSite: sameSite ?? 'lax',
    secure: req.secure,
    path: path ?? '/',
    ...(maxAge !== undefined ? { maxAge: maxAge * 1000 } : {}),
  });
}

/** Reads the session cookie on every request and attaches the signed-in user, if any. */
export function loadSession(auth: Auth, sessions: SessionCache): RequestHandler {
  return async (req, res, next) => {
    const sessionId = auth.readSessionCookie(req.headers.cookie ?? '');
    if (!sessionId) return next();
    const { session, user } = await sessions.validate(sessionId);
    if (!session || !user || !user.active) {
      if (session) await sessions.invalidateSession(session.id);
      writeSessionCookie(auth, req, res, null);
      return next();
    }
    if (session.fresh) writeSessionCookie(auth, req, res, session.id);
    req.user = { id: user.id, email: user.email, name: user.name, role: user.role };
    req.sessionId = session.id;
    next();
  };
}

export function currentUser(req: Request): PublicUser {
  if (!req.user) throw AppError.unauthorized();
  return req.user;
}

/** Refuses anonymous requests with 401 and other roles with 403. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, _res, next) => {
    const user = currentUser(req);
    if (roles.length > 0 && !roles.includes(user.role)) throw AppError.forbidden();
    next();
  };
}

export const requireSignedIn = requireRole();

import type { RequestHandler } from 'express';
import { ROLE_LABELS, type Role } from '../../shared/schemas/roles';
import { AppError } from '../lib/errors';

export const requireSignIn: RequestHandler = (req, _res, next) => {
  if (!req.user) {
    next(new AppError(401, 'not_signed_in', 'You are not signed in, or your session has ended. Sign in and try again.'));
    return;
  }
  next();
};

/** Allows the request only for the roles listed; 401 without a session, 403 for any other role. */
export function requireRole(...roles: Role[]): RequestHandler {
  return (req, res, next) => {
    requireSignIn(req, res, (err?: unknown) => {
      if (err) {
        next(err);
        return;
      }
      const role = req.user!.role;
      if (!roles.includes(role)) {
        const who = roles.map((r) => ROLE_LABELS[r].toLowerCase()).join(' or ');
        next(new AppError(403, 'forbidden', `This needs the ${who} role; you are signed in as ${ROLE_LABELS[role].toLowerCase()}. Ask your administrator if you need access.`));
        return;
      }
      next();
    });
  };
}

export const ANY_ROLE: Role[] = ['technician', 'manager', 'admin'];
export const OFFICE_ROLES: Role[] = ['manager', 'admin'];

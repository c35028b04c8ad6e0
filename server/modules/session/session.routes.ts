import { Router, type Request } from 'express';
import { rateLimit } from 'express-rate-limit';
import passport from 'passport';
import { signInSchema, type SessionUser } from '../../../shared/schemas/session';
import { SESSION_COOKIE } from '../../auth/session';
import { requireSignIn } from '../../auth/require-role';
import { AppError } from '../../lib/errors';
import { validate } from '../../lib/validate';

export function sessionRoutes(opts: { signInLimit: number; signInWindowMs: number }): Router {
  const router = Router();

  // Counts failed sign-ins only, per client address, so a technician who typed well is never held back.
  const signInLimiter = rateLimit({
    windowMs: opts.signInWindowMs,
    limit: opts.signInLimit,
    skipSuccessfulRequests: true,
    standardHeaders: 'draft-8',
    legacyHeaders: false,
    handler: (_req, _res, next) => {
      const minutes = Math.ceil(opts.signInWindowMs / 60_000);
      next(new AppError(429, 'too_many_attempts', `Too many failed sign-ins from this device. Wait ${minutes} minutes, or ask your administrator to reset your password.`));
    },
  });

  router.post('/', signInLimiter, validate('body', signInSchema), async (req, res) => {
    const user = await authenticate(req);
    // passport (0.6+) regenerates the session id here, so a planted id is useless after sign-in.
    await new Promise<void>((resolve, reject) => req.login(user, (err) => (err ? reject(err as Error) : resolve())));
    res.json({ user });
  });

  router.get('/', requireSignIn, (req, res) => {
    res.json({ user: req.user });
  });

  router.delete('/', async (req, res) => {
    await new Promise<void>((resolve, reject) => req.logout((err) => (err ? reject(err as Error) : resolve())));
    await new Promise<void>((resolve, reject) => req.session.destroy((err) => (err ? reject(err as Error) : resolve())));
    res.clearCookie(SESSION_COOKIE, { path: '/' });
    res.status(204).end();
  });

  return router;
}

function authenticate(req: Request): Promise<SessionUser> {
  return new Promise((resolve, reject) => {
    passport.authenticate('local', { session: false }, (err: unknown, user: SessionUser | false, info?: { message?: string }) => {
      if (err) reject(err instanceof Error ? err : new Error(String(err)));
      else if (!user) reject(new AppError(401, 'bad_credentials', info?.message ?? 'Sign-in failed.'));
      else resolve(user);
    })(req, req.res, reject);
  });
}

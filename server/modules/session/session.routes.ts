import { Router, type Request } from 'express';
import passport from 'passport';
import { signInSchema, type SessionUser } from '../../../shared/schemas/session';
import { SESSION_COOKIE } from '../../auth/session';
import { requireSignIn } from '../../auth/require-role';
import { AppError } from '../../lib/errors';
import { valid, validate } from '../../lib/validate';
import type { signInThrottle } from './sign-in-throttle';

type SignInThrottle = ReturnType<typeof signInThrottle>;

export function sessionRoutes(throttle: SignInThrottle): Router {
  const router = Router();

  // Only failures count, per account and per client address separately (sign-in-throttle.ts).
  router.post('/', validate('body', signInSchema), async (req, res) => {
    const { email } = valid(req, 'body', signInSchema);
    await throttle.check(email, req.ip);
    const user = await authenticate(req).catch(async (err: unknown) => {
      if (err instanceof AppError && err.code === 'bad_credentials') await throttle.recordFailure(email, req.ip);
      throw err;
    });
    await throttle.recordSuccess(email);
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

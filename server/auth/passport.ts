import passport from 'passport';
import { Strategy as LocalStrategy } from 'passport-local';
import type { SessionUser } from '../../shared/schemas/session';
import { User } from '../modules/users/users.model';
import { dummyPasswordHash, verifyPassword } from './password';

declare global {
  // eslint-disable-next-line @typescript-eslint/no-namespace
  namespace Express {
    // eslint-disable-next-line @typescript-eslint/no-empty-object-type
    interface User extends SessionUser {}
  }
}

export function toSessionUser(user: User): SessionUser {
  return { id: user.id, email: user.email, name: user.name, role: user.role };
}

export function configurePassport(): passport.PassportStatic {
  passport.use(
    new LocalStrategy({ usernameField: 'email', passwordField: 'password' }, (email, password, done) => {
      void (async () => {
        const user = await User.scope('withPassword').findOne({ where: { email: email.trim().toLowerCase() } });
        const ok = await verifyPassword(user?.passwordHash ?? (await dummyPasswordHash()), password);
        if (!user || !ok || !user.active) {
          done(null, false, { message: 'That e-mail and password do not match an active account. Check both and try again.' });
          return;
        }
        done(null, toSessionUser(user));
      })().catch(done);
    }),
  );

  passport.serializeUser((user, done) => {
    done(null, user.id);
  });

  // Re-read on every request so a role change or deactivation takes effect at once.
  passport.deserializeUser((id: number, done) => {
    User.findByPk(id)
      .then((user) => done(null, user && user.active ? toSessionUser(user) : false))
      .catch(done);
  });
  return passport;
}

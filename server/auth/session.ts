import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import type pg from 'pg';

export const SESSION_COOKIE = 'crankwise.sid';

export function createSessionMiddleware(opts: { pool: pg.Pool; secret: string; secureCookie: boolean }) {
  const PgStore = connectPgSimple(session);
  return session({
    name: SESSION_COOKIE,
    store: new PgStore({ pool: opts.pool, tableName: 'session', createTableIfMissing: false, pruneSessionInterval: 15 * 60 }),
    secret: opts.secret,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: opts.secureCookie,
      maxAge: 12 * 60 * 60 * 1000, // one working shift and then some
    },
  });
}

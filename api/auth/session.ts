import connectPgSimple from 'connect-pg-simple';
import session from 'express-session';
import pg from 'pg';
import { throttleTouch } from './session-touch';

export interface SessionOptions {
  databaseUrl: string;
  secret: string;
  secureCookies: boolean;
}

/** Sessions live in PostgreSQL (table `session`), so a restart signs nobody out. */
export function createSessionMiddleware(options: SessionOptions) {
  const PgStore = connectPgSimple(session);
  const pool = new pg.Pool({ connectionString: options.databaseUrl, max: 4 });
  pool.on('error', () => {
    // An idle client lost its server (PostgreSQL restarting): the pool replaces it on next use.
  });
  const store = new PgStore({ pool, tableName: 'session', pruneSessionInterval: false });
  throttleTouch(store);
  const middleware = session({
    name: 'cyclewright.sid',
    secret: options.secret,
    store,
    resave: false,
    saveUninitialized: false,
    rolling: true,
    cookie: {
      httpOnly: true,
      sameSite: 'lax',
      secure: options.secureCookies,
      maxAge: 1000 * 60 * 60 * 24 * 14,
    },
  });
  return { middleware, close: () => pool.end() };
}

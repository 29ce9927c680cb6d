import pino from 'pino';

/** The process logger; request logs come from pino-http built on it. */
export function createLogger(level: string) {
  return pino({ level, redact: ['req.headers.cookie', 'req.headers.authorization', 'res.headers["set-cookie"]'] });
}

export type Logger = ReturnType<typeof createLogger>;

import { pino, type Logger } from 'pino';

export type { Logger };

/** JSON logs on stdout; LOG_LEVEL=silent in tests keeps the output clean. */
export function createLogger(level: string): Logger {
  return pino({
    level,
    base: { service: 'quietlayer' },
    redact: { paths: ['req.headers.cookie', 'res.headers["set-cookie"]', '*.password', '*.token'], censor: '[redacted]' },
  });
}

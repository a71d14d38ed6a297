import pino from 'pino';

/**
 * The app's structured log: one JSON line per event on stdout. Secrets never belong in a log line; the
 * redact list is a second guard for any that slip into a logged object (bodies, headers, errors).
 */
export const log = pino({
  level: process.env.LOG_LEVEL ?? (process.env.VITEST ? 'silent' : 'info'),
  base: { app: 'arcline' },
  redact: {
    paths: ['password', '*.password', 'newPassword', '*.newPassword', 'currentPassword', '*.currentPassword', 'token', '*.token', 'authorization', '*.authorization', 'cookie', '*.cookie', 'headers.cookie', 'headers.authorization', 'password_hash', '*.password_hash'],
    censor: '[redacted]',
  },
});

const REQUEST_ID = /^[A-Za-z0-9._-]{1,64}$/;

/** The caller's X-Request-Id when it is a sane token (so logs join up across a proxy), else a new one. */
export function requestIdFor(req: Request): string {
  const given = req.headers.get('x-request-id');
  return given && REQUEST_ID.test(given) ? given : crypto.randomUUID();
}

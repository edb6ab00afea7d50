import { logger } from './logger';

/**
 * Auth.js's logger, replaced: its default prints coloured lines and full stack traces to the
 * console. Here an auth error is one JSON line (type and scrubbed message, the cause's too);
 * a used or expired sign-in link is the user's problem, so it logs at warn.
 */
const USER_ERRORS = new Set(['Verification', 'MissingCSRF', 'AccessDenied']);

export const authLogger = {
  error(error: Error): void {
    const type = (error as { type?: string }).type ?? error.name;
    const cause = (error.cause as { err?: unknown } | undefined)?.err;
    const fields = { authError: type, err: error, ...(cause ? { cause } : {}) };
    if (USER_ERRORS.has(type)) logger.warn(fields, 'auth refused');
    else logger.error(fields, 'auth failed');
  },
  warn(code: string): void {
    logger.warn({ authWarning: code }, 'auth warning');
  },
  debug(message: string): void {
    // Auth.js's debug metadata holds tokens and cookies: the message only.
    logger.debug({ source: 'auth' }, message.slice(0, 200));
  },
};

/**
 * The server's one logger: pino, JSON lines on stdout, level from LOG_LEVEL (default info).
 * The custom server and Astro's built bundle each import this module, so the instance lives on
 * globalThis and both write through one destination.
 *
 * What never reaches a line: request or response bodies, headers (so no cookie or
 * Authorization), query strings, configured secrets, key-shaped strings. Errors are logged as
 * their type and scrubbed message; the stack is added only at LOG_LEVEL=debug or trace, which
 * is for reproducing a fault on one's own machine, never for production.
 */
import pino from 'pino';
import type { Logger } from 'pino';
import { REDACTED, scrub } from './redact';
import { currentRequestId } from './request-context';

export type { Logger };

const LEVELS = ['fatal', 'error', 'warn', 'info', 'debug', 'trace', 'silent'];

/** Fields on every line. */
const BASE = { service: 'drainwright', pid: process.pid };

function levelFromEnv(): string {
  const raw = (process.env.LOG_LEVEL ?? '').trim().toLowerCase();
  return LEVELS.includes(raw) ? raw : 'info';
}

/** Serialize an error as { type, message } (scrubbed); with the stack only when debugging. */
export function errorFields(error: unknown, withStack = false): Record<string, string> {
  if (!(error instanceof Error)) return { type: typeof error, message: scrub(String(error)) };
  const fields: Record<string, string> = { type: error.name, message: scrub(error.message) };
  if (withStack && error.stack) fields.stack = scrub(error.stack);
  return fields;
}

/**
 * stdout written asynchronously: a line costs the request no write system call, and lines that
 * pile up while a write is in flight go out together. What is still buffered when the process
 * exits (including after an uncaught exception) is written synchronously on the way out.
 */
function destination(): pino.DestinationStream {
  const stream = pino.destination({ dest: 1, sync: false });
  process.once('exit', () => {
    try {
      stream.flushSync();
    } catch {
      // stdout already closed: nothing left to write to
    }
  });
  return stream;
}

function createLogger(): Logger {
  const level = levelFromEnv();
  const withStack = level === 'debug' || level === 'trace';
  const serialize = (error: unknown): Record<string, string> => errorFields(error, withStack);
  return pino(
    {
      level,
      base: BASE,
      timestamp: pino.stdTimeFunctions.isoTime,
      formatters: { level: (label) => ({ level: label }) },
      serializers: { err: serialize, cause: serialize },
      // Lines written while a request is handled carry its id.
      mixin: () => {
        const reqId = currentRequestId();
        return reqId ? { reqId } : {};
      },
      // Belt and braces for fields someone might add later. Top-level paths only: wildcard
      // paths made every line about 2.5 times slower to write.
      redact: {
        paths: [
          'headers',
          'cookie',
          'cookies',
          'authorization',
          'token',
          'secret',
          'password',
          'url',
          'body',
        ],
        censor: REDACTED,
      },
    },
    destination(),
  );
}

const KEY = Symbol.for('drainwright.logger');
const store = globalThis as typeof globalThis & { [KEY]?: Logger };

/** The process-wide logger. */
export const logger: Logger = (store[KEY] ??= createLogger());

const BASE_FIELDS = JSON.stringify(BASE).slice(1, -1);

let isoMs = 0;
let isoText = '';

/** The time as ISO 8601, formatted once per millisecond: a busy server writes many lines in one. */
function isoNow(): string {
  const now = Date.now();
  if (now !== isoMs) {
    isoMs = now;
    isoText = new Date(now).toISOString();
  }
  return isoText;
}

/**
 * One line in pino's own layout, written straight to the logger's destination (order kept with
 * pino's lines). For the access log, where pino's per-line work (mixin, redaction, serializers,
 * serialising an object) was about a seventh of an API call's time. `fields` is the JSON of the
 * line's own fields without braces; the caller writes nothing the redaction would remove.
 */
export function writeLine(level: 'info' | 'warn' | 'error', fields: string, msg: string): void {
  if (!logger.isLevelEnabled(level)) return;
  const stream = (logger as unknown as Record<symbol, pino.DestinationStream>)[
    pino.symbols.streamSym
  ];
  const time = isoNow();
  stream.write(
    `{"level":"${level}","time":"${time}",${BASE_FIELDS},${fields},"msg":${JSON.stringify(msg)}}\n`,
  );
}

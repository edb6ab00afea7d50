import { inspect } from 'node:util';
import { logger } from './logger';
import { scrub } from './redact';

/**
 * Route console.* in the server process into the logger. Astro's runtime and some libraries
 * print errors (with stack traces) straight to the console; this turns each call into one JSON
 * line: stack lines removed (kept only at debug level), ANSI colours removed, secrets scrubbed,
 * at most 2000 characters.
 */
const STACK_LINE = /\n\s+at .*/g;
const ANSI = /\u001b\[[0-9;]*m/g;

function textOf(args: unknown[], withStack: boolean): string {
  const parts = args.map((a) => {
    if (a instanceof Error) return `${a.name}: ${a.message}`;
    return typeof a === 'string' ? a : inspect(a, { depth: 2, breakLength: Infinity });
  });
  let text = parts.join(' ').replace(ANSI, '');
  if (!withStack) text = text.replace(STACK_LINE, '');
  return scrub(text).slice(0, 2000);
}

type Level = 'error' | 'warn' | 'info' | 'debug';

/** Install the console routing and the fatal-error line; call once, first thing in the server. */
export function routeConsoleToLogger(): void {
  const withStack = logger.isLevelEnabled('debug');
  const send =
    (level: Level) =>
    (...args: unknown[]): void => {
      const error = args.find((a): a is Error => a instanceof Error);
      const fields = { source: 'console', ...(error ? { err: error } : {}) };
      logger[level](fields, textOf(args, withStack));
    };
  console.error = send('error');
  console.warn = send('warn');
  console.info = send('info');
  console.log = send('info');
  console.debug = send('debug');
  // Node would print the stack to stderr itself; exit the same way, as one fatal line.
  process.on('uncaughtException', (error) => {
    logger.fatal({ err: error }, 'uncaught exception');
    process.exit(1);
  });
}

import { AsyncLocalStorage } from 'node:async_hooks';

/**
 * The id of the request being handled, carried through its async work so that every log line
 * written while handling it gets `reqId` (see logger.ts). Shared through globalThis because the
 * server and Astro's bundle each load this module. Astro's handler already runs requests in an
 * AsyncLocalStorage, so this adds no new kind of cost.
 */
const KEY = Symbol.for('drainwright.request-context');
const store = globalThis as typeof globalThis & { [KEY]?: AsyncLocalStorage<string> };
const context: AsyncLocalStorage<string> = (store[KEY] ??= new AsyncLocalStorage<string>());

/** Run `fn` (a request's handling) with `id` as the current request id. */
export function runWithRequestId<T>(id: string, fn: () => T): T {
  return context.run(id, fn);
}

/** The current request's id, or undefined outside a request. */
export function currentRequestId(): string | undefined {
  return context.getStore();
}

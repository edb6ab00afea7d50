/**
 * The locale number boxes read and write numbers in: the browser's language. The server and the
 * first (hydrating) render use en-US so the markup matches; the browser's own follows at once.
 */
import { useSyncExternalStore } from 'react';

const SERVER_LOCALE = 'en-US';
const never = (): (() => void) => () => undefined;

/** The browser's BCP 47 language tag (en-US on the server). */
export function useInputLocale(): string {
  return useSyncExternalStore(
    never,
    () => window.navigator.language || SERVER_LOCALE,
    () => SERVER_LOCALE,
  );
}

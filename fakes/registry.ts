import type { FakeSpec } from './runner';
import { resendSpec } from './resend/spec';
import { stripeSpec } from './stripe/spec';

/**
 * Every local stand-in of a hosted service. Each issue that brings a service adds its fake here
 * (entry, port, env); the start command and the test setup start them all. `dataDir` is where
 * fakes keep their state.
 */
export function fakeSpecs(dataDir: string): FakeSpec[] {
  return [resendSpec(dataDir), stripeSpec(dataDir)];
}

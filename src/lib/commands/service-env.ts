import type { RunningFake } from '../../../fakes/runner';

/**
 * Environment that points each service SDK at its running fake, unless a real key is configured.
 * Each fake's issue adds its mapping here.
 */
export function serviceEnv(_fakes: RunningFake[]): Record<string, string> {
  return {};
}

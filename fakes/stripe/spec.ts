import path from 'node:path';
import { fileURLToPath } from 'node:url';
import { getConfig } from '../../src/lib/config';
import type { FakeSpec } from '../runner';

/** Dummy key the fake accepts; marks the SDK as pointed at the fake, never at the real service. */
export const FAKE_STRIPE_KEY = 'sk_test_drainwright_fake';
/** Signing secret shared by the fake and the app when no real one is configured. */
export const FAKE_STRIPE_WEBHOOK_SECRET = 'whsec_drainwright_local_fake';

/**
 * The payments fake's port: FAKE_STRIPE_PORT, else 4620 beside the default app port, else the
 * app's PORT + 12000 so apps started side by side (tests, engineers) do not share one fake, and the
 * range never meets the e-mail fake's PORT + 10000 unless two apps run 2000 apart (tests keep their
 * ports in 16100–19999, below Linux's ephemeral range 32768–60999 even with these offsets, so a
 * port the OS hands to an outgoing socket or a test's free-port fake never takes one of them).
 */
export function stripePort(): number {
  const explicit = Number.parseInt(process.env.FAKE_STRIPE_PORT ?? '', 10);
  if (Number.isFinite(explicit) && explicit > 0) return explicit;
  const app = Number.parseInt(process.env.PORT ?? '', 10);
  if (!Number.isFinite(app) || app === 4321 || app + 12_000 > 65_535) return 4620;
  return app + 12_000;
}

/** The fake delivers events to the app's own webhook route, found from PUBLIC_URL. */
export function stripeSpec(dataDir: string): FakeSpec {
  const port = stripePort();
  return {
    name: 'stripe',
    entry: fileURLToPath(new URL('./server.ts', import.meta.url)),
    port,
    healthPath: '/health',
    env: {
      FAKE_STRIPE_DATA_DIR: path.join(dataDir, 'fake-stripe'),
      FAKE_STRIPE_PUBLIC_URL: process.env.FAKE_STRIPE_PUBLIC_URL || `http://127.0.0.1:${port}`,
      FAKE_STRIPE_WEBHOOK_URL: `${getConfig().publicUrl}/api/webhooks/stripe`,
      FAKE_STRIPE_WEBHOOK_SECRET: process.env.STRIPE_WEBHOOK_SECRET || FAKE_STRIPE_WEBHOOK_SECRET,
      // Duplicated and reordered deliveries are on under the test runner, off otherwise.
      FAKE_STRIPE_CHAOS: process.env.FAKE_STRIPE_CHAOS ?? (process.env.VITEST ? '1' : '0'),
    },
  };
}

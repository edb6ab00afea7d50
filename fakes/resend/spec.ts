import path from 'node:path';
import { fileURLToPath } from 'node:url';
import type { FakeSpec } from '../runner';

/** Marks the dummy key the fake accepts, so it is never mistaken for a real one. */
export const FAKE_RESEND_KEY = 're_fake_local_key';

/**
 * The e-mail fake's port: FAKE_RESEND_PORT, else 4610 beside the default app port, else the app's
 * PORT + 10000 so several apps started side by side (tests, engineers) do not share one fake.
 */
export function resendPort(): number {
  const explicit = Number.parseInt(process.env.FAKE_RESEND_PORT ?? '', 10);
  if (Number.isFinite(explicit) && explicit > 0) return explicit;
  const app = Number.parseInt(process.env.PORT ?? '', 10);
  if (!Number.isFinite(app) || app === 4321 || app + 10_000 > 65_535) return 4610;
  return app + 10_000;
}

export function resendSpec(dataDir: string): FakeSpec {
  return {
    name: 'resend',
    entry: fileURLToPath(new URL('./server.ts', import.meta.url)),
    port: resendPort(),
    healthPath: '/health',
    env: { FAKE_RESEND_DIR: path.join(dataDir, 'fake-resend') },
  };
}

import { fileURLToPath } from 'node:url';
import { defineConfig } from 'vitest/config';

// Lives under tests/ to keep the top level to the project's fixed list; `root` points back up.
export default defineConfig({
  root: fileURLToPath(new URL('..', import.meta.url)),
  test: {
    include: ['tests/**/*.test.ts'],
    globalSetup: ['tests/setup/global-setup.ts'],
    testTimeout: 30_000,
    hookTimeout: 120_000,
    pool: 'forks',
    env: { ASTRO_TELEMETRY_DISABLED: '1' },
  },
});

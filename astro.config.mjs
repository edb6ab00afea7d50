// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import auth from 'auth-astro';
import { fileURLToPath } from 'node:url';
import { compileHints } from './src/lib/build/compile-hints.ts';
import { offlineCheck } from './src/lib/offline/integration.ts';
import { CSP_DIRECTIVES } from './src/lib/server/security-headers.ts';

// Host names the built server answers as. Astro ignores the Host header unless it matches one of
// these, which breaks same-origin checks and absolute URLs; PUBLIC_HOSTNAMES adds deployment names.
const allowedDomains = ['localhost', '127.0.0.1', ...(process.env.PUBLIC_HOSTNAMES ?? '').split(',')]
  .map((h) => h.trim())
  .filter(Boolean)
  .map((hostname) => ({ hostname }));

export default defineConfig({
  output: 'server',
  // experimentalStaticHeaders: prerendered pages get Astro's CSP as a header too (see security-headers.ts).
  adapter: node({ mode: 'standalone', experimentalStaticHeaders: true }),
  // Auth.js config lives under src/ (the top level is a fixed list of files).
  integrations: [
    react(),
    offlineCheck(),
    auth({ configFile: fileURLToPath(new URL('./src/lib/auth/auth.config.ts', import.meta.url)) }),
  ],
  // Astro's checkOrigin would answer 403 to cross-site API v1 calls before our code runs; the
  // same rule is applied in src/middleware.ts (src/lib/api/origin-check.ts) to every other route.
  security: { checkOrigin: false, allowedDomains },
  // Hash-based script-src and style-src for Astro's own inline scripts and styles, sent as a header
  // on every page; the other directives are ours (src/lib/server/security-headers.ts).
  experimental: {
    csp: {
      directives: [...CSP_DIRECTIVES],
      scriptDirective: { resources: ["'self'"] },
      styleDirective: { resources: ["'self'"] },
    },
  },
  server: {
    host: process.env.HOST || '127.0.0.1',
    port: Number(process.env.PORT) || 4321,
  },
  vite: {
    // compileHints: the browser compiles the start-up scripts off the main thread (see its file).
    plugins: [tailwindcss(), compileHints()],
  },
});

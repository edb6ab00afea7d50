// @ts-check
import { defineConfig } from 'astro/config';
import node from '@astrojs/node';
import react from '@astrojs/react';
import tailwindcss from '@tailwindcss/vite';
import { offlineCheck } from './src/lib/offline/integration.ts';

// Host names the built server answers as. Astro ignores the Host header unless it matches one of
// these, which breaks same-origin checks and absolute URLs; PUBLIC_HOSTNAMES adds deployment names.
const allowedDomains = ['localhost', '127.0.0.1', ...(process.env.PUBLIC_HOSTNAMES ?? '').split(',')]
  .map((h) => h.trim())
  .filter(Boolean)
  .map((hostname) => ({ hostname }));

export default defineConfig({
  output: 'server',
  adapter: node({ mode: 'standalone' }),
  integrations: [react(), offlineCheck()],
  security: { checkOrigin: true, allowedDomains },
  server: {
    host: process.env.HOST || '127.0.0.1',
    port: Number(process.env.PORT) || 4321,
  },
  vite: {
    plugins: [tailwindcss()],
  },
});

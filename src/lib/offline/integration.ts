import AstroPWA from '@vite-pwa/astro';
import type { AstroIntegration } from 'astro';
import { offlinePrecacheTransform } from './precache';

/**
 * The service worker, built by the PWA integration (Workbox generateSW). It precaches the quick
 * check page, its scripts, styles and font so the check works with no network after one visit.
 * Nothing else is cached: no navigation fallback and no runtime caching, so the API, the app and
 * the support desk always go to the network. The web app manifest is the one in public/.
 */
export function offlineCheck(): AstroIntegration {
  let clientDir: URL | undefined;
  const pwa = AstroPWA({
    // Workbox otherwise follows NODE_ENV, and test runners set it to 'test'.
    mode: 'production',
    registerType: 'autoUpdate',
    injectRegister: false,
    manifest: false,
    workbox: {
      globPatterns: ['check/index.html', '_astro/*.{js,css,woff2}', 'favicon.svg', 'manifest.webmanifest'],
      manifestTransforms: [offlinePrecacheTransform(() => clientDir)],
      navigateFallback: null,
      // The check keeps its inputs in the query string (share URL); any query maps to the page.
      ignoreURLParametersMatching: [/.*/],
      navigateFallbackDenylist: [/^\/api\//, /^\/app(?:\/|$)/, /^\/support(?:\/|$)/],
      runtimeCaching: [],
      cleanupOutdatedCaches: true,
      clientsClaim: true,
      skipWaiting: true,
    },
  });
  // The built client folder is known only once the config is final (it follows --outDir).
  return {
    name: 'drainwright:offline-check',
    hooks: {
      ...pwa.hooks,
      'astro:config:done': ({ config }) => {
        clientDir = config.build.client;
      },
    },
  };
}

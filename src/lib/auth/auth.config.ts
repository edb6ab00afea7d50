import Resend from '@auth/core/providers/resend';
import type { Adapter } from '@auth/core/adapters';
import { defineConfig } from 'auth-astro';
import { ensureAuthSecret } from '../commands/secret';
import { getConfig } from '../config';
import { getDb } from '../db/client';
import { authLogger } from '../server/auth-logger';
import { drainwrightAdapter } from './adapter';
import { sendEmail, senderAddress } from '../email/send';
import { signInEmail } from '../email/sign-in-email';

/** How long a sign-in link works. */
export const LINK_MINUTES = 30;
const SESSION_DAYS = 30;

/** The adapter, built on first use so importing this file opens no database (e.g. at build). */
let adapter: Adapter | undefined;
function lazyAdapter(): Adapter {
  adapter ??= drainwrightAdapter(getDb());
  return adapter;
}

/** Cookies get the Secure flag (and __Secure-/__Host- names) in production or behind https. */
function secureCookies(): boolean {
  return getConfig().production || (process.env.PUBLIC_URL ?? '').startsWith('https:');
}

/**
 * Auth.js for auth-astro (configFile in astro.config.mjs points here): e-mail links sent through
 * our sendEmail, database sessions in our SQLite, our own pages. Secret and host trust are read
 * from process.env at run time, never baked in at build time.
 */
const config = defineConfig({
  get secret(): string {
    return process.env.AUTH_SECRET || ensureAuthSecret(getConfig().dataDir);
  },
  // Host names are checked by Astro (security.allowedDomains) before a request gets here.
  trustHost: true,
  get adapter(): Adapter {
    return lazyAdapter();
  },
  session: { strategy: 'database', maxAge: SESSION_DAYS * 86_400, updateAge: 86_400 },
  get useSecureCookies(): boolean {
    return secureCookies();
  },
  providers: [
    Resend({
      from: senderAddress(),
      maxAge: LINK_MINUTES * 60,
      async sendVerificationRequest({ identifier, url }) {
        await sendEmail(signInEmail(identifier, url, LINK_MINUTES));
      },
    }),
  ],
  pages: { signIn: '/signin', verifyRequest: '/signin/sent', error: '/signin' },
  // One JSON line per auth error, no stack traces (src/lib/server/auth-logger.ts).
  logger: authLogger,
  callbacks: {
    // Only ever send people back into this site.
    redirect({ url, baseUrl }) {
      if (url.startsWith('/') && !url.startsWith('//')) return `${baseUrl}${url}`;
      return new URL(url).origin === baseUrl ? url : `${baseUrl}/app`;
    },
  },
});

export default config;

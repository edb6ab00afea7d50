import { randomBytes } from 'node:crypto';
import path from 'node:path';
import Database from 'better-sqlite3';
import type { BrowserContext, Page } from 'playwright-core';
import { startApp } from '../helpers/server';
import { assertPortFree } from '../support/helpers';
import type { StartedApp } from '../helpers/server';

/**
 * The real app (npm start on a temp DATA_DIR, seeded demo, its own fakes on PORT+10000 and
 * PORT+12000) with direct access to its database, so a test signs a user in by writing an Auth.js
 * session row, exactly as clicking the e-mailed link would leave it.
 */
export interface SecApp {
  app: StartedApp;
  db: Database.Database;
  /** The e-mail fake this app started. */
  inboxUrl: string;
  /** A session token for a user (a fresh Auth.js database session). */
  session: (userId: string) => string;
  /** Headers for a signed-in same-origin request as this user. */
  as: (userId: string, json?: boolean) => Record<string, string>;
  stop: () => Promise<void>;
}

export const OWNER = 'usr_demo_owner';
export const CREW = 'usr_demo_crew1';
export const SUPPORT = 'usr_demo_support';
export const ORG = 'org_demo_heronsgate';

export async function startSecApp(port: number, env: Record<string, string> = {}): Promise<SecApp> {
  // A leftover app on the port would answer the health check with another database.
  await assertPortFree(port);
  const app = await startApp(port, env);
  const db = new Database(path.join(app.dataDir, 'drainwright.sqlite'));
  const session = (userId: string): string => {
    const token = randomBytes(24).toString('hex');
    db.prepare('insert into sessions (session_token, user_id, expires) values (?, ?, ?)').run(
      token,
      userId,
      Date.now() + 86_400_000,
    );
    return token;
  };
  const as = (userId: string, json = true): Record<string, string> => ({
    cookie: `authjs.session-token=${session(userId)}`,
    origin: app.url,
    ...(json ? { 'content-type': 'application/json' } : {}),
  });
  const stop = async (): Promise<void> => {
    db.close();
    await app.stop();
  };
  return { app, db, inboxUrl: `http://127.0.0.1:${port + 10_000}`, session, as, stop };
}

/** A browser context signed in as a user (the session cookie set for the app's origin). */
export async function signIn(context: BrowserContext, sec: SecApp, userId: string): Promise<void> {
  await context.addCookies([
    {
      name: 'authjs.session-token',
      value: sec.session(userId),
      url: sec.app.url,
      httpOnly: true,
      sameSite: 'Lax',
    },
  ]);
}

export interface PageWatch {
  /** CSP violations seen by the page: "directive blocked-uri sample". */
  violations: () => Promise<string[]>;
  /** Console errors (but failed loads, see failed) and uncaught page errors. */
  errors: string[];
  /** Dialogs (alert/confirm/prompt) that opened; each is dismissed. */
  dialogs: string[];
  /** URLs answered with 4xx/5xx, but /favicon.ico (a page without an icon link asks for it). */
  failed: string[];
}

/** Watch a page for CSP violations, console errors and dialogs (install before navigating). */
export async function watchPage(page: Page): Promise<PageWatch> {
  await page.addInitScript(() => {
    const w = window as unknown as { __violations: string[] };
    w.__violations = [];
    document.addEventListener('securitypolicyviolation', (e) => {
      w.__violations.push(`${e.violatedDirective} ${e.blockedURI} ${e.sample}`);
    });
  });
  const errors: string[] = [];
  const dialogs: string[] = [];
  // The browser's "Failed to load resource" line names no URL; failed[] records those instead.
  page.on('console', (m) => {
    if (m.type() === 'error' && !m.text().startsWith('Failed to load resource'))
      errors.push(m.text());
  });
  page.on('pageerror', (e) => errors.push(e.message));
  const failed: string[] = [];
  page.on('response', (r) => {
    if (r.status() >= 400 && new URL(r.url()).pathname !== '/favicon.ico')
      failed.push(`${r.status()} ${r.url()}`);
  });
  page.on('dialog', (d) => {
    dialogs.push(d.message());
    void d.dismiss();
  });
  const violations = (): Promise<string[]> =>
    page.evaluate(() => (window as unknown as { __violations?: string[] }).__violations ?? []);
  return {
    violations,
    errors,
    dialogs,
    failed,
  };
}

/** Wait until every island on the page has hydrated (Astro removes the ssr attribute). */
export async function hydrated(page: Page): Promise<void> {
  await page.waitForFunction(
    () => document.querySelectorAll('astro-island[ssr]').length === 0,
    null,
    { timeout: 15_000 },
  );
}

/**
 * Injection and XSS probes: hostile text in every user text field (tests/security/payloads.ts),
 * then every place it is shown — pages in a real browser, the print report, the share link, the
 * PDF (read back by pdfjs-dist, as tests/jobs does), the e-mails in the fake inbox and the CSV
 * export. Each must show the text as text: no element or attribute added, no dialog, the data
 * unchanged, and the CSV's formula cells prefixed with ' (common practice against formula
 * injection).
 */
import Papa from 'papaparse';
import { getDocument } from 'pdfjs-dist/legacy/build/pdf.mjs';
import { afterAll, beforeAll, describe, expect, test } from 'vitest';
import type { Browser, Page } from 'playwright-core';
import { launchBrowser, phoneContext } from '../helpers/browser';
import { inbox } from '../support/helpers';
import { CREW, OWNER, SUPPORT, hydrated, signIn, startSecApp, watchPage } from './helpers';
import type { SecApp } from './helpers';
import { FLAG_EMAIL, FORMULAS, PAYLOAD, SHORT, plant } from './payloads';
import type { Planted } from './payloads';

const PORT = 19520;
let sec: SecApp;
let browser: Browser;
let planted: Planted;

beforeAll(async () => {
  [sec, browser] = await Promise.all([startSecApp(PORT), launchBrowser()]);
  planted = await plant(sec);
}, 180_000);
afterAll(async () => {
  await browser?.close();
  await sec?.stop();
});

/** What hostile text would leave in the DOM if it became markup. */
function scan(
  page: Page,
): Promise<{ injected: number; jsLinks: number; handlers: number; text: string }> {
  return page.evaluate(() => ({
    injected: document.querySelectorAll('[data-pwned], img[src="x"], img[src$="/x"]').length,
    jsLinks: [...document.querySelectorAll('[href], [src], [action]')].filter((e) =>
      /^\s*javascript:/i.test(
        e.getAttribute('href') ?? e.getAttribute('src') ?? e.getAttribute('action') ?? '',
      ),
    ).length,
    handlers: [...document.querySelectorAll('*')].filter((e) =>
      [...e.attributes].some((a) => /^on/i.test(a.name)),
    ).length,
    text: document.body.innerText,
  }));
}

/** Open a page as a user and check that no payload became markup; returns the page's text. */
async function probe(who: string | null, path: string): Promise<string> {
  const context = await phoneContext(browser, sec.app.url);
  if (who) await signIn(context, sec, who);
  const page = await context.newPage();
  const watch = await watchPage(page);
  const res = await page.goto(path);
  expect(res?.status(), path).toBe(200);
  await hydrated(page);
  await page.waitForLoadState('networkidle');
  const found = await scan(page);
  expect(found.injected, `${path}: injected element`).toBe(0);
  expect(found.jsLinks, `${path}: javascript: link`).toBe(0);
  expect(found.handlers, `${path}: event-handler attribute`).toBe(0);
  expect(watch.dialogs, path).toEqual([]);
  expect(await watch.violations(), `${path}: CSP violation (something tried to run)`).toEqual([]);
  await context.close();
  return found.text;
}

describe('hostile text in pages', () => {
  test.each([
    ['the job list', OWNER, () => '/app/jobs', PAYLOAD],
    ['the job page', OWNER, () => `/app/jobs/${planted.jobId}`, PAYLOAD],
    ['the print report', OWNER, () => `/app/jobs/${planted.jobId}/report`, PAYLOAD],
    ['the share link', null, () => new URL(planted.shareUrl).pathname, PAYLOAD],
    ['the brand kit page', OWNER, () => '/app/brand', null],
    ['the team page', OWNER, () => '/app/team', SHORT],
    ['the account page', CREW, () => '/app/account', null],
    ['the support queue', SUPPORT, () => '/support', null],
    ['the support flag page', SUPPORT, () => `/support/flags/${planted.flagId}`, PAYLOAD],
    ["the reporter's flag page", null, () => new URL(planted.flagThreadUrl).pathname, PAYLOAD],
  ])(
    'does show %s with the text as text',
    async (_what, who, path, shown) => {
      const text = await probe(who, path());
      if (shown) expect(text).toContain(shown.slice(0, 60));
    },
    60_000,
  );

  test('does notice markup when it is there (the scan can fail)', async () => {
    const page = await (await phoneContext(browser, sec.app.url)).newPage();
    await page.goto('/check');
    await page.evaluate(
      (html) => document.body.insertAdjacentHTML('beforeend', html),
      `${PAYLOAD}<a href="javascript:void 0">x</a>`,
    );
    const found = await scan(page);
    expect(found.injected).toBeGreaterThanOrEqual(2);
    expect(found.handlers).toBeGreaterThanOrEqual(1);
    expect(found.jsLinks).toBe(1);
    await page.context().close();
  });

  test('does keep the data intact: same text back from the API, the jobs table still there', async () => {
    const r = await fetch(`${sec.app.url}/api/jobs/${planted.jobId}`, { headers: sec.as(OWNER) });
    const { job } = (await r.json()) as { job: { title: string; notes: string; client: string } };
    expect(job.title).toBe(PAYLOAD);
    expect(job.notes).toBe(`${PAYLOAD}\n${PAYLOAD}`);
    const count = sec.db.prepare('select count(*) as n from jobs').get() as { n: number };
    expect(count.n).toBeGreaterThan(3);
    const found = await fetch(
      `${sec.app.url}/api/jobs?q=${encodeURIComponent("'; DROP TABLE jobs;--")}`,
      { headers: sec.as(OWNER) },
    );
    expect(found.status).toBe(200);
    expect(((await found.json()) as { items: { id: string }[] }).items.map((j) => j.id)).toContain(
      planted.jobId,
    );
  });
});

/** Text of every page of a PDF, read back by pdfjs-dist (Mozilla's PDF reader). */
async function pdfText(bytes: ArrayBuffer): Promise<string> {
  const doc = await getDocument({ data: new Uint8Array(bytes) }).promise;
  let out = '';
  for (let i = 1; i <= doc.numPages; i++) {
    const content = await (await doc.getPage(i)).getTextContent();
    out += content.items.map((it) => ('str' in it ? it.str : '')).join('') + '\n';
  }
  return out;
}

describe('hostile text in PDFs, e-mails and exports', () => {
  test('does print the text literally in the report PDF', async () => {
    const r = await fetch(`${sec.app.url}/app/jobs/${planted.jobId}/report.pdf`, {
      headers: sec.as(OWNER),
    });
    expect(r.status).toBe(200);
    const text = (await pdfText(await r.arrayBuffer())).replace(/\s+/g, ' ');
    // The ASCII part; the standard PDF fonts have no glyphs for the RTL mark or 𝔇.
    expect(text).toContain(`"><img src=x data-pwned onerror=alert(2)>'; DROP TABLE jobs;--`);
  });

  test('does escape the text in the report, reply and invitation e-mails', async () => {
    const to = `client-sec-${Date.now()}@example.test`;
    const sent = await fetch(`${sec.app.url}/api/jobs/${planted.jobId}/report/email`, {
      method: 'POST',
      headers: sec.as(OWNER),
      body: JSON.stringify({ to, message: PAYLOAD }),
    });
    expect(sent.status, await sent.clone().text()).toBe(202);
    const [report] = await inbox(sec.inboxUrl, to);
    const [reply] = (await inbox(sec.inboxUrl, FLAG_EMAIL)).filter((e) =>
      e.subject.startsWith('Reply'),
    );
    const [invite] = await inbox(sec.inboxUrl, "o'brien+sec@example.test");
    for (const mail of [report, reply, invite]) {
      // Raw tags would be markup; the escaped text (&#60;img …) may say onerror= as words.
      expect(mail.html).not.toMatch(/<(script|img)\b|href="\s*javascript:/i);
      expect(mail.html).toContain('&#60;img src=x data-pwned');
    }
    expect(report.text).toContain(PAYLOAD);
    expect(reply.text).toContain(PAYLOAD);
    expect(invite.text).toContain(SHORT);
  });

  test('does prefix formula cells in the CSV export and keep them intact in the JSON export', async () => {
    const csv = await (
      await fetch(`${sec.app.url}/api/jobs/export?format=csv`, { headers: sec.as(OWNER) })
    ).text();
    const rows = Papa.parse<Record<string, string>>(csv.replace(/^\ufeff/, ''), {
      header: true,
      skipEmptyLines: true,
    }).data;
    for (const f of FORMULAS) {
      const row = rows.find((r) => r.job_title === `'${f}`);
      expect(row, `CSV row for ${f}`).toBeDefined();
      expect(row!.client).toBe(`'${f}`);
      expect(row!.notes).toBe(`'${f}`);
    }
    expect(rows.some((r) => r.job_title === PAYLOAD)).toBe(true);
    const json = (await (
      await fetch(`${sec.app.url}/api/jobs/export?format=json`, { headers: sec.as(OWNER) })
    ).json()) as { jobs: { title: string }[] };
    for (const f of FORMULAS) expect(json.jobs.map((j) => j.title)).toContain(f);
  });
});

import type { Page } from 'playwright-core';

/** Collects console errors and uncaught page errors of a page. */
export function watchErrors(page: Page): string[] {
  const errors: string[] = [];
  page.on('console', (m) => m.type() === 'error' && errors.push(m.text()));
  page.on('pageerror', (e) => errors.push(e.message));
  return errors;
}

/** Open a path and wait until every island has hydrated. */
export async function openHydrated(page: Page, path: string): Promise<void> {
  await page.goto(path);
  await calculatorReady(page);
}

/** Wait until the islands have hydrated and a calculator has applied the link's inputs. */
export async function calculatorReady(page: Page): Promise<void> {
  await page.waitForFunction(
    () =>
      document.querySelectorAll('astro-island[ssr]').length === 0 &&
      (!location.pathname.match(/^\/(check|siphon|gravity-line|drain)/) || document.documentElement.dataset.calcReady === '1'),
  );
}

/** Widest right edge of any element minus the viewport width, and the document's own overflow. */
export async function sidewaysOverflow(page: Page): Promise<number> {
  return page.evaluate(() => {
    let right = document.documentElement.scrollWidth;
    for (const el of Array.from(document.querySelectorAll('body *'))) {
      const r = el.getBoundingClientRect();
      if (r.width > 0 && getComputedStyle(el).position !== 'fixed' && !el.closest('.sr-only'))
        right = Math.max(right, r.right);
    }
    return right - window.innerWidth;
  });
}

/** The text of a result figure by its id. */
export async function figure(page: Page, id: string): Promise<string> {
  return (await page.locator(`[data-figure="${id}"]`).first().textContent()) ?? '';
}

/** Number at the start of a figure text ("4.87 L/s" → 4.87), digit-group spaces removed. */
export const leadingNumber = (text: string): number => Number(text.replace(/[\u202f\s]/g, '').match(/^-?[\d.]+/)?.[0]);

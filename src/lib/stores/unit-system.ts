/**
 * The crew's unit system, shared by every island on a page and remembered in localStorage and,
 * for a signed-in person, on their account (PUT /api/account/units). A page rendered for a
 * signed-in person names the account's choice on <html data-account-units>, which wins and is
 * copied to this browser, so a new device starts on it from the first signed-in page. Otherwise
 * the first visit takes it from the browser's language: en-US (and the US territories' English)
 * reads US customary, everything else metric.
 */
import { atom } from 'nanostores';
import type { UnitSystem } from '../hydraulics/units';
import { isUnitSystem } from '../hydraulics/units';

export const UNIT_STORAGE_KEY = 'drainwright:units';

/** The default for a BCP 47 language tag: 'us' for en-US, else 'metric'. */
export function unitSystemForLanguage(language: string | undefined): UnitSystem {
  return /^en-US\b/i.test(language ?? '') ? 'us' : 'metric';
}

/** The account's unit system named on this page, copied to this browser; null when none is. */
export function adoptAccountUnits(): UnitSystem | null {
  const account = document.documentElement.dataset.accountUnits;
  if (!isUnitSystem(account)) return null;
  remember(account);
  return account;
}

function initial(): UnitSystem {
  if (typeof window === 'undefined') return 'metric';
  const account = adoptAccountUnits();
  if (account) return account;
  try {
    const saved = window.localStorage.getItem(UNIT_STORAGE_KEY);
    if (isUnitSystem(saved)) return saved;
  } catch {
    // storage blocked (private mode): fall back to the language
  }
  return unitSystemForLanguage(window.navigator.language);
}

export const $unitSystem = atom<UnitSystem>(initial());

function remember(system: UnitSystem): void {
  try {
    window.localStorage.setItem(UNIT_STORAGE_KEY, system);
  } catch {
    // not remembered, still switched
  }
}

/** Tell the account (the server ignores it when nobody is signed in); offline, it stays local. */
function rememberOnAccount(system: UnitSystem): void {
  fetch('/api/account/units', {
    method: 'PUT',
    headers: { 'content-type': 'application/json' },
    body: JSON.stringify({ unit_system: system }),
    keepalive: true,
  }).catch(() => undefined);
}

/** Switch the unit system and remember the choice. */
export function setUnitSystem(system: UnitSystem): void {
  $unitSystem.set(system);
  remember(system);
  rememberOnAccount(system);
}

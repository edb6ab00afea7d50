/**
 * The crew's unit system, shared by every island on a page and remembered in localStorage.
 * The first visit takes it from the browser's language: en-US (and the US territories' English)
 * reads US customary, everything else metric.
 */
import { atom } from 'nanostores';
import type { UnitSystem } from '../hydraulics/units';

export const UNIT_STORAGE_KEY = 'drainwright:units';

/** The default for a BCP 47 language tag: 'us' for en-US, else 'metric'. */
export function unitSystemForLanguage(language: string | undefined): UnitSystem {
  return /^en-US\b/i.test(language ?? '') ? 'us' : 'metric';
}

function initial(): UnitSystem {
  if (typeof window === 'undefined') return 'metric';
  try {
    const saved = window.localStorage.getItem(UNIT_STORAGE_KEY);
    if (saved === 'metric' || saved === 'us') return saved;
  } catch {
    // storage blocked (private mode): fall back to the language
  }
  return unitSystemForLanguage(window.navigator.language);
}

export const $unitSystem = atom<UnitSystem>(initial());

/** Switch the unit system and remember the choice. */
export function setUnitSystem(system: UnitSystem): void {
  $unitSystem.set(system);
  try {
    window.localStorage.setItem(UNIT_STORAGE_KEY, system);
  } catch {
    // not remembered, still switched
  }
}

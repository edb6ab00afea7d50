import fs from 'node:fs';
import path from 'node:path';
import { fileURLToPath } from 'node:url';

/**
 * Build-time helper for the service worker (used by astro.config.mjs, never shipped to the
 * browser). Workbox globs every built asset; this keeps only what the quick check needs offline:
 * its page, the scripts and styles it loads (followed through their imports), and the latin
 * subsets of the shipped font. Everything else — other tools, charts, the app — stays online.
 */

/** Minimal shape of a Workbox manifest entry. */
export interface PrecacheEntry {
  url: string;
  revision: string | null;
  size: number;
}

export type ManifestTransform = (
  entries: PrecacheEntry[],
) => Promise<{ manifest: PrecacheEntry[]; warnings: string[] }>;

/** The pages kept offline: built HTML file (relative to the client dir) → URL they answer. */
export const OFFLINE_PAGES: Readonly<Record<string, string>> = { 'check/index.html': 'check' };

const ASSET_REF = /\/_astro\/[\w.@-]+\.(?:js|css|woff2)/g;
const RELATIVE_IMPORT = /(?:from\s*|import\s*\(?\s*)["']\.\/([\w.@-]+\.js)["']/g;

/** Asset paths (like `_astro/x.js`) reachable from the given HTML files. */
export function assetsReachableFrom(clientDir: string, htmlFiles: readonly string[]): Set<string> {
  const found = new Set<string>();
  const queue: string[] = [];
  const add = (rel: string): void => {
    if (found.has(rel) || !fs.existsSync(path.join(clientDir, rel))) return;
    found.add(rel);
    queue.push(rel);
  };
  for (const html of htmlFiles) {
    for (const m of fs.readFileSync(path.join(clientDir, html), 'utf8').matchAll(ASSET_REF)) {
      add(m[0].slice(1));
    }
  }
  while (queue.length > 0) {
    const rel = queue.pop()!;
    if (rel.endsWith('.woff2')) continue;
    const text = fs.readFileSync(path.join(clientDir, rel), 'utf8');
    for (const m of text.matchAll(ASSET_REF)) add(m[0].slice(1));
    for (const m of text.matchAll(RELATIVE_IMPORT)) add(path.posix.join('_astro', m[1]));
  }
  return found;
}

/** Fonts: the browser only fetches the subsets the text needs; ours is English. */
function isWantedAsset(rel: string): boolean {
  return !rel.endsWith('.woff2') || rel.includes('-latin-');
}

/** A Workbox manifest transform that keeps the offline pages and their assets only. */
export function offlinePrecacheTransform(clientDirUrl: () => URL | undefined): ManifestTransform {
  return async (entries) => {
    const url = clientDirUrl();
    if (!url)
      return { manifest: entries, warnings: ['client folder unknown; precaching everything'] };
    const clientDir = fileURLToPath(url);
    const pages = Object.keys(OFFLINE_PAGES).filter((f) => fs.existsSync(path.join(clientDir, f)));
    if (pages.length === 0) {
      return { manifest: entries, warnings: ['offline pages not found; precaching everything'] };
    }
    const assets = assetsReachableFrom(clientDir, pages);
    const manifest = entries
      .filter((e) => !e.url.startsWith('_astro/') || (assets.has(e.url) && isWantedAsset(e.url)))
      .map((e) => (OFFLINE_PAGES[e.url] ? { ...e, url: OFFLINE_PAGES[e.url] } : e));
    return { manifest, warnings: [] };
  };
}

import fs from 'node:fs';
import path from 'node:path';

const SOURCES = ['src', 'db', 'public', 'astro.config.mjs', 'package.json', 'package-lock.json', 'tsconfig.json'];

function newestMtime(target: string): number {
  let stat: fs.Stats;
  try {
    stat = fs.statSync(target);
  } catch {
    return 0;
  }
  if (!stat.isDirectory()) return stat.mtimeMs;
  let newest = stat.mtimeMs;
  for (const entry of fs.readdirSync(target)) {
    newest = Math.max(newest, newestMtime(path.join(target, entry)));
  }
  return newest;
}

/** True when dist/ is missing or older than any source that goes into it. */
export function buildIsStale(root: string): boolean {
  const entry = path.join(root, 'dist', 'server', 'entry.mjs');
  if (!fs.existsSync(entry)) return true;
  const built = fs.statSync(entry).mtimeMs;
  return SOURCES.some((s) => newestMtime(path.join(root, s)) > built);
}

/**
 * V8's explicit compile hint for the scripts every island page runs at start-up. A file that
 * begins with the `//# allFunctionsCalledOnLoad` magic comment has all its functions compiled
 * eagerly on the background thread that streams it, instead of one by one on the main thread
 * the first time hydration calls them (Chrome 136 and later; other engines ignore a comment).
 * Only chunks reached by static imports from an entry are hinted: those loaded on demand (the
 * charts, the hints fallback) would be compiled for nothing.
 */
import type { Plugin } from 'vite';

export const COMPILE_HINT = '//# allFunctionsCalledOnLoad\n';

/** The chunk shape read here (a subset of Rollup's output chunk). */
export interface HintableChunk {
  type: 'chunk';
  fileName: string;
  isEntry: boolean;
  imports: string[];
  code: string;
}

type Bundle = Record<string, HintableChunk | { type: 'asset' }>;

/** File names of the entries and every chunk they import statically, transitively. */
export function startupChunks(bundle: Bundle): Set<string> {
  const chunks = Object.values(bundle).filter((c): c is HintableChunk => c.type === 'chunk');
  const byName = new Map(chunks.map((c) => [c.fileName, c]));
  const reached = new Set<string>();
  const visit = (name: string): void => {
    const chunk = byName.get(name);
    if (!chunk || reached.has(name)) return;
    reached.add(name);
    chunk.imports.forEach(visit);
  };
  chunks.filter((c) => c.isEntry).forEach((c) => visit(c.fileName));
  return reached;
}

/** Prefix the hint to every start-up chunk of the bundle, in place. */
export function addCompileHints(bundle: Bundle): void {
  for (const name of startupChunks(bundle)) {
    const chunk = bundle[name] as HintableChunk;
    if (!chunk.code.startsWith(COMPILE_HINT)) chunk.code = COMPILE_HINT + chunk.code;
  }
}

/** Vite plugin: hint the browser build's start-up chunks (the server build is left alone). */
export function compileHints(): Plugin {
  let ssr = false;
  return {
    name: 'drainwright:compile-hints',
    apply: 'build',
    configResolved(config) {
      ssr = Boolean(config.build.ssr);
    },
    // Last, after Vite has put its preload helper at the top of chunks with dynamic imports.
    generateBundle: {
      order: 'post',
      handler(_options, bundle) {
        if (!ssr) addCompileHints(bundle as unknown as Bundle);
      },
    },
  };
}

/**
 * Which chunks get V8's explicit compile hint (`//# allFunctionsCalledOnLoad`, described in the
 * V8 project's 2025 post on explicit compile hints; recalled from memory): entries and what they
 * import statically, never a chunk reached only by a dynamic import.
 */
import { describe, expect, test } from 'vitest';
import type { HintableChunk } from '../../../src/lib/build/compile-hints';
import { COMPILE_HINT, addCompileHints, startupChunks } from '../../../src/lib/build/compile-hints';

function chunk(fileName: string, isEntry: boolean, imports: string[] = []): HintableChunk {
  return { type: 'chunk', fileName, isEntry, imports, code: `/* ${fileName} */` };
}

function bundle(): Record<string, HintableChunk | { type: 'asset' }> {
  const chunks = [
    chunk('island.js', true, ['react.js', 'engine.js']),
    chunk('renderer.js', true, ['react.js']),
    chunk('react.js', false),
    chunk('engine.js', false, ['units.js']),
    chunk('units.js', false),
    // reached only through import(): the charts and what they alone use
    chunk('chart.js', false, ['chart-kit.js', 'react.js']),
    chunk('chart-kit.js', false),
  ];
  return {
    ...Object.fromEntries(chunks.map((c) => [c.fileName, c])),
    'style.css': { type: 'asset' },
  };
}

describe('startupChunks', () => {
  test('does follow static imports from every entry, transitively', () => {
    expect([...startupChunks(bundle())].sort()).toEqual([
      'engine.js',
      'island.js',
      'react.js',
      'renderer.js',
      'units.js',
    ]);
  });

  test('does leave out chunks that only dynamic imports reach', () => {
    const reached = startupChunks(bundle());
    expect(reached.has('chart.js')).toBe(false);
    expect(reached.has('chart-kit.js')).toBe(false);
  });
});

describe('addCompileHints', () => {
  test('does put the hint first in start-up chunks only, once', () => {
    const b = bundle();
    addCompileHints(b);
    addCompileHints(b);
    const code = (name: string): string => (b[name] as HintableChunk).code;
    expect(code('react.js')).toBe(`${COMPILE_HINT}/* react.js */`);
    expect(code('units.js').startsWith(COMPILE_HINT)).toBe(true);
    expect(code('chart.js')).toBe('/* chart.js */');
  });
});

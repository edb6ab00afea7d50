/**
 * The production server wrapper (serve.ts and the src/lib modules it uses) bundled into plain
 * JavaScript with esbuild before it starts. Run through a TypeScript loader instead, every module
 * import Astro makes per request passes the loader's hooks on another thread, and the loader's
 * output wraps each closure in a naming helper: together about a fifth of the API's time per call.
 * Packages stay external and load from node_modules as usual.
 */
import { build } from 'esbuild';
import fs from 'node:fs';
import path from 'node:path';

/** Bundle src/lib/commands/serve.ts into dist/serve.mjs; returns the bundle's path. */
export async function bundleServer(root: string): Promise<string> {
  const outfile = path.join(root, 'dist', 'serve.mjs');
  const result = await build({
    entryPoints: [path.join(root, 'src', 'lib', 'commands', 'serve.ts')],
    bundle: true,
    platform: 'node',
    target: 'node20',
    format: 'esm',
    packages: 'external',
    write: false,
    logLevel: 'warning',
  });
  // Several apps may start from one checkout at once (tests): write aside, then rename atomically.
  const temporary = `${outfile}.${process.pid}.tmp`;
  fs.mkdirSync(path.dirname(outfile), { recursive: true });
  fs.writeFileSync(temporary, result.outputFiles[0].contents);
  fs.renameSync(temporary, outfile);
  return outfile;
}

/**
 * `npm run bench` runs the benchmarks from one esbuild bundle (.data/bench/run.mjs), the
 * way the app ships the engine (bundled by Next), rather than through tsx's loader, whose
 * transform wraps every function in a name-keeping call. Through tsx the generate
 * benchmark measured 15–30 ms more in alternating runs.
 */
import { build } from 'esbuild';

await build({
  entryPoints: ['tests/bench/run.ts'],
  bundle: true,
  platform: 'node',
  format: 'esm',
  target: 'node20',
  outfile: '.data/bench/run.mjs',
  // CommonJS packages in an ES module bundle need a require of their own
  banner: { js: "import { createRequire as __benchRequire } from 'node:module'; const require = __benchRequire(import.meta.url);" },
  logLevel: 'warning',
});

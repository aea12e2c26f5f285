/**
 * `npm run bench [name]`: runs every benchmark (or those whose name contains `name`), each
 * in a process of its own so that one's heap does not slow the next; each measures and
 * prints its own figures beside a floor measured in the same process. A benchmark, not a
 * test: it asserts nothing and is not part of `npm test`. Bundled first (bundle.ts); a new
 * `*.bench.ts` is added to the list below.
 */
import { spawnSync } from 'node:child_process';
import { fileURLToPath } from 'node:url';
import evaluate from './evaluate.bench';
import generate from './generate.bench';

const benches: [string, () => Promise<void>][] = [
  ['evaluate.bench.ts', evaluate],
  ['generate.bench.ts', generate],
];

const [only, inProcess] = [process.argv[2], process.argv[3] === '--here'];
for (const [name, run] of benches) {
  if (only && !name.includes(only)) continue;
  if (inProcess) {
    await run();
    continue;
  }
  console.log(`\n== ${name} ==`);
  const child = spawnSync(process.execPath, [fileURLToPath(import.meta.url), name, '--here'], { stdio: 'inherit' });
  if (child.status !== 0) process.exitCode = child.status ?? 1;
}

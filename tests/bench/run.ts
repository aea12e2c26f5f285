/**
 * `npm run bench`: runs every `tests/bench/*.bench.ts` module in turn (each exports a
 * default async function that measures and prints its own figures beside a floor
 * measured in the same run). A benchmark, not a test: it asserts nothing and is not
 * part of `npm test`.
 */
import { readdirSync } from 'node:fs';
import { dirname, join } from 'node:path';
import { fileURLToPath, pathToFileURL } from 'node:url';

const here = dirname(fileURLToPath(import.meta.url));
const only = process.argv[2];
const files = readdirSync(here)
  .filter((f) => f.endsWith('.bench.ts') && (!only || f.includes(only)))
  .sort();

for (const file of files) {
  console.log(`\n== ${file} ==`);
  const mod = (await import(pathToFileURL(join(here, file)).href)) as { default: () => Promise<void> };
  await mod.default();
}

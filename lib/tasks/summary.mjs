// Adds up the vitest and Playwright JSON reports and prints the closing line
// "N passed, N failed" (exit 1 when anything failed, a step failed, or nothing ran).
//   node lib/tasks/summary.mjs <reports-dir> [failed-step …]
import { existsSync, readFileSync } from 'node:fs';
import { join } from 'node:path';
import console from 'node:console';
import process from 'node:process';

const [dir = 'test-results/reports', ...failedSteps] = process.argv.slice(2);
const read = (name) => {
  const path = join(dir, name);
  return existsSync(path) ? JSON.parse(readFileSync(path, 'utf8')) : null;
};

const vitest = read('vitest.json');
const playwright = read('playwright.json');
const v = vitest
  ? { passed: vitest.numPassedTests, failed: vitest.numFailedTests + (vitest.numRuntimeErrorTestSuites ?? 0), skipped: vitest.numPendingTests + vitest.numTodoTests }
  : { passed: 0, failed: 0, skipped: 0 };
const p = playwright
  ? { passed: playwright.stats.expected + playwright.stats.flaky, failed: playwright.stats.unexpected, skipped: playwright.stats.skipped }
  : { passed: 0, failed: 0, skipped: 0 };

console.log(`vitest:     ${v.passed} passed, ${v.failed} failed, ${v.skipped} skipped${vitest ? '' : ' (no report)'}`);
console.log(`playwright: ${p.passed} passed, ${p.failed} failed, ${p.skipped} skipped${playwright ? '' : ' (no report)'}`);
if (failedSteps.length) console.log(`failed steps: ${failedSteps.join(', ')}`);
const passed = v.passed + p.passed;
const failed = v.failed + p.failed;
console.log(`${passed} passed, ${failed} failed, ${v.skipped + p.skipped} skipped`);
process.exit(failed > 0 || failedSteps.length > 0 || passed === 0 ? 1 : 0);

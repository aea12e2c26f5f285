/**
 * The engine command line: `npm run -s engine -- <command> < input.json`
 * (spec/engine-cli.md; lib/README.md documents each command with an example).
 */
import { readFileSync } from 'node:fs';
import { runCli } from './cli/run';

const stdin = readFileSync(0, 'utf8');
const result = runCli(process.argv[2], stdin);
process.stdout.write(result.stdout);
process.exitCode = result.exitCode;

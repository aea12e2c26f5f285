/**
 * The CLI runner, without process I/O (so tests call it directly): one JSON value in,
 * output text and exit status back. An array is a batch: one output per element, in
 * order, an element's failure becoming its error object. Exit 0 when all succeeded,
 * 2 when any failed validation or computation, 1 for an internal fault.
 * `post` prints the program text; in a batch it prints a JSON array of program strings
 * (and error objects).
 */
import { commands } from './registry';
import { errorObject, isErrorObject, toErrorObject, type ErrorObject } from './errors';

export interface CliResult { stdout: string; exitCode: 0 | 1 | 2 }

const json = (v: unknown) => `${JSON.stringify(v, null, 2)}\n`;

function runOne(handler: (input: unknown) => unknown, input: unknown): { out: unknown; failed: boolean } {
  try {
    return { out: handler(input), failed: false };
  } catch (e) {
    return { out: toErrorObject(e), failed: true };
  }
}

const withIndex = (o: unknown, i: number): unknown =>
  isErrorObject(o) ? errorObject(o.error.code, o.error.message, o.error.path ? `[${i}].${o.error.path}` : `[${i}]`) : o;

export function runCli(command: string | undefined, stdinText: string): CliResult {
  const handler = command ? commands[command] : undefined;
  if (!handler) {
    const msg = `unknown command "${command ?? ''}"; use one of: ${Object.keys(commands).join(', ')}`;
    return { stdout: json(errorObject('UNKNOWN_COMMAND', msg, '')), exitCode: 2 };
  }
  let input: unknown;
  try {
    input = JSON.parse(stdinText);
  } catch (e) {
    const detail = e instanceof Error ? e.message : String(e);
    return { stdout: json(errorObject('BAD_JSON', `standard input is not valid JSON: ${detail}`, '')), exitCode: 2 };
  }
  try {
    if (Array.isArray(input)) {
      const results = input.map((el) => runOne(handler, el));
      const outs = results.map((r, i) => withIndex(r.out, i));
      return { stdout: json(outs), exitCode: results.some((r) => r.failed) ? 2 : 0 };
    }
    const r = runOne(handler, input);
    if (typeof r.out === 'string') return { stdout: r.out, exitCode: 0 };
    return { stdout: json(r.out), exitCode: r.failed ? 2 : 0 };
  } catch (e) {
    const err: ErrorObject = errorObject('INTERNAL', `internal fault: ${e instanceof Error ? e.message : String(e)}`, '');
    return { stdout: json(err), exitCode: 1 };
  }
}

/**
 * The command table of `npm run -s engine -- <command>`: a plain map from the command
 * name to its handler. A handler takes one parsed JSON request and returns the output
 * value (a string is printed as text, e.g. `post`), or throws a CommandError /
 * GeometryError for an expected failure. The evaluation commands (fit, evaluate,
 * simulate) are added here by their own module, one line each.
 */
import { fkCommand, ikCommand, planCommand, postCommand, verifyCommand } from './engine-commands';
import { evaluateCommand } from './evaluate';
import { fitCommand } from './fit';
import { simulateCommand } from './simulate';

export type CommandHandler = (input: unknown) => unknown;

export const commands: Record<string, CommandHandler> = {
  fk: fkCommand,
  ik: ikCommand,
  plan: planCommand,
  post: postCommand,
  verify: verifyCommand,
  fit: fitCommand,
  evaluate: evaluateCommand,
  simulate: simulateCommand,
};

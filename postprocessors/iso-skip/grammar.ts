/** How the verifier reads `iso-skip` programs back: G31 moves told apart by the check after them. */
import type { PostGrammar } from '../../lib/program/render';
import { isoSkipDefinition } from './definition';

const v = isoSkipDefinition.trip.variables;
const esc = (s: string) => s.replace(/[#[\]]/g, (c) => `\\${c}`);
const num = '(-?\\d+(?:\\.\\d+)?)';
const check = (op: string, label: string) =>
  new RegExp(`^IF\\[\\[ABS\\[${esc(v.X ?? '')}-\\[${num}\\]\\]\\+ABS\\[${esc(v.Y ?? '')}-\\[${num}\\]\\]\\+ABS\\[${esc(v.Z ?? '')}-\\[${num}\\]\\]\\]${op}\\d+(?:\\.\\d+)?\\]GOTO${label}$`);

export const isoSkipGrammar: PostGrammar = {
  protectedCodes: [],
  touchCodes: [],
  skipCodes: ['G31'],
  fixedLines: ['%'],
  protectedCheck: check('GT', '9002'),
  touchCheck: check('LT', '9001'),
  labelPrefixes: ['N9001', 'N9002'],
};

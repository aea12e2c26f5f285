/**
 * `ngc`: the RS274/NGC family. Probe moves and parameters after Kramer, Proctor & Messina,
 * The NIST RS274NGC Interpreter v3, NISTIR 6556 (2000), §3.5.9.1 (G38.2; trip position in
 * #5061–#5066 = X Y Z A B C; a G38.2 that does not trip signals an error and stops).
 * G38.3 (no error without contact) and the success flag #5070, O-word subroutines and
 * the LOGOPEN/LOG/LOGCLOSE and MSG comments are common extensions of that family
 * (LinuxCNC G-code documentation, REFERENCES.md §6).
 */
import type { PostDefinition } from '../../lib/program/postprocessor-schema';

export const ngcDefinition: PostDefinition = {
  id: 'ngc',
  name: 'RS274/NGC family (G38.2 / G38.3)',
  description: 'Straight probe G38.2 for touches, G38.3 with a check of #5070 for protected moves, trip position from #5061-#5066, results through LOG.',
  fileExtension: 'ngc',
  decimals: { linear: 4, angular: 4, feed: 0 },
  lineNumbers: { enabled: false, start: 10, step: 10, letter: 'N' },
  comments: { open: '(', close: ')', maxLength: 120, uppercase: false },
  programStart: ['%'],
  programEnd: ['M2', '%'],
  safeStart: ['G21 G90 G40 G17 G94 G54'],
  probeOn: ['M5', 'M64 P0'],
  probeOff: ['M65 P0'],
  repeatFeed: true,
  trip: {
    variables: { X: '#5061', Y: '#5062', Z: '#5063', A: '#5064', B: '#5065', C: '#5066' },
    open: ['(LOGOPEN,{program}-trips.txt)'],
    close: ['(LOGCLOSE)'],
    record: '(LOG,TRIP {uuid} {values})',
    value: '{word}{var}',
    separator: ' ',
    uuidCase: 'lower',
  },
  stops: {
    miss: [],
    hit: ['(MSG,UNEXPECTED PROBE TRIGGER - PROGRAM STOPPED)', 'M2'],
  },
  skipTolerance: 0.001,
  knownCodes: ['G0', 'G1', 'G17', 'G21', 'G38.2', 'G38.3', 'G40', 'G54', 'G90', 'G91', 'G94', 'M2', 'M5', 'M64', 'M65', 'P0'],
};

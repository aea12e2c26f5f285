/**
 * `iso-skip`: ISO-style controls probing with the skip move G31. Probing is not
 * standardised in ISO 6983-1 (REFERENCES.md §6, from memory), so the details are settings:
 * the skip position variables (#5061–#5063 on many ISO controls, from memory; set the
 * rotary ones to your control's axis order), the output statements (POPEN / DPRNT / PCLOS
 * style, from memory) and the stop statements (#3000 alarm with a message, from memory).
 * A G31 that does not trip completes its move, so the skip position is compared with the
 * programmed end: equal means "no trigger" after a touch and "no contact" after a protected move.
 * DPRNT: set the control so positive values print without a leading space, so that each
 * record reads `TRIP <uuid> X<x> Y<y> Z<z> …` (`*` prints a space).
 */
import type { PostDefinition } from '../../lib/program/postprocessor-schema';

export const isoSkipDefinition: PostDefinition = {
  id: 'iso-skip',
  name: 'ISO-style skip (G31)',
  description: 'Skip move G31 for touches and protected moves, skip position from configurable system variables, results through a configurable output statement.',
  fileExtension: 'nc',
  decimals: { linear: 3, angular: 3, feed: 0 },
  lineNumbers: { enabled: false, start: 10, step: 10, letter: 'N' },
  comments: { open: '(', close: ')', maxLength: 120, uppercase: true },
  programStart: ['%', 'O0100'],
  programEnd: ['M30'],
  safeStart: ['G21 G90 G40 G17 G94 G54'],
  probeOn: ['M5', 'M19'],
  probeOff: ['M5'],
  repeatFeed: true,
  trip: {
    variables: { X: '#5061', Y: '#5062', Z: '#5063', A: '#5064', B: '#5065', C: '#5066' },
    open: ['POPEN'],
    close: ['PCLOS'],
    record: 'DPRNT[TRIP*{uuid}*{values}]',
    value: '{word}{var}[54]',
    separator: '*',
    uuidCase: 'upper',
  },
  stops: {
    miss: ['#3000=1(NO PROBE TRIGGER - CHECK PART AND PROBE)'],
    hit: ['#3000=2(UNEXPECTED PROBE TRIGGER - PROGRAM STOPPED)'],
  },
  skipTolerance: 0.001,
  knownCodes: ['G0', 'G1', 'G17', 'G21', 'G31', 'G40', 'G54', 'G90', 'G91', 'G94', 'M5', 'M19', 'M30'],
};

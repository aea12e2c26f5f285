/**
 * The safety cautions printed on every setup sheet and run page (DESIGN.md, "Safety").
 * Common practice for proving out a new CNC program; the machine builder's instructions
 * and local rules always come first.
 */
export const SAFETY_CAUTIONS: readonly string[] = [
  'The machine builder\'s instructions and your local safety rules come first; where they differ from this sheet, follow them.',
  'Prove out this program before running it unattended: single block, rapid and feed override turned well down, hand on the feed hold.',
  'Check clearance before every run: fixture, clamps, part and stylus must clear each rotary move and each approach.',
  'Confirm the probe is on, calibrated and triggering (tap the stylus and watch the signal) before the first touch.',
  'Keep guards closed and stay clear of the working area while the machine moves.',
];

export const SAFETY_HEADLINE = 'Caution — machines hurt people';

/**
 * The caution every screen, report and CLI output shows beside a pass/fail or a design number.
 * The tool can hurt someone if its numbers are taken as a design: say so every time.
 */
export const CAUTION =
  'Preliminary results for layout studies only. Local building codes and a licensed structural engineer govern every design decision.'

/** Short form for tight places (badges, status bar); always link or sit next to the full CAUTION. */
export const CAUTION_SHORT = 'Preliminary: local codes and a licensed engineer govern.'

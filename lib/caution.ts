/**
 * The standing caution on every result screen and export. Arcline reports computed margins against the
 * plan's limits; it does not decide whether a lift goes ahead.
 */
export const CAUTION_LINES = [
  "The manufacturer's load chart and operator's manual govern. These figures are a planning aid, not a rating.",
  'A qualified operator decides whether and how the lift is made.',
  'Local codes, utility rules and licensed engineering practice apply.',
] as const;

export const CAUTION_TEXT = CAUTION_LINES.join(' ');

/** The caution in one line, beside a verdict or a figure; the full text (CAUTION_LINES) is a click away. */
export const CAUTION_SHORT = "Planning aid only: the manufacturer's load chart and manual govern, a qualified operator decides, local codes apply.";

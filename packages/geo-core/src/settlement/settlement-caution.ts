/** Carried by every settlement result, so no report of the numbers goes out without it. */
export const SETTLEMENT_CAUTION =
  'These are engineering calculations for review by a qualified geotechnical engineer. They depend on sample quality, test procedure and the ground model, and do not replace site-specific judgement, local codes or licensed sign-off.';

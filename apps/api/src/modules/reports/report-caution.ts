/** The caution every issued report prints in full (and, shortened, in every page's footer). */
export const REPORT_CAUTION =
  'These results are engineering calculations for review by a qualified geotechnical engineer. They depend on the quality of the sample, the test procedure and the ground model; they do not replace site-specific judgement, and their use is subject to local codes and licensed professional practice.';

export const REPORT_CAUTION_SHORT = 'For review by a qualified geotechnical engineer; use subject to local codes and licensed practice.';

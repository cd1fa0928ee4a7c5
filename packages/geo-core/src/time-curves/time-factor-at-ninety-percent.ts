/**
 * Time factor at 90 % average consolidation used with Taylor's square-root-of-
 * time method: cv = 0.848·Hdr²/t90.
 *
 * The rounded value printed in ASTM D2435/D2435M and the textbooks; the series
 * gives 0.84805.
 */
export const TIME_FACTOR_AT_NINETY_PERCENT = 0.848;

/**
 * The method statement a report prints when the laboratory has not written its own: the
 * standard the reduction follows, as laboratories usually state it.
 */
export const DEFAULT_TEST_METHOD_STATEMENT =
  'One-dimensional consolidation by incremental loading, following ASTM D2435/D2435M.';

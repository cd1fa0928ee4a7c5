import { env } from '../../config/env.js';
import type { ImportLimits } from './raw-table.js';

/** The configured limits (IMPORT_MAX_FILE_MB, IMPORT_MAX_ROWS). */
export function importLimits(): ImportLimits {
  const config = env();
  return { maxFileBytes: Math.round(config.IMPORT_MAX_FILE_MB * 1024 * 1024), maxRows: config.IMPORT_MAX_ROWS };
}

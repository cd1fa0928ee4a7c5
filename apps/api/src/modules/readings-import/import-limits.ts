import { env } from '../../config/env.js';
import type { ImportLimits } from './raw-table.js';

/** The configured limits (IMPORT_MAX_FILE_MB, IMPORT_MAX_ROWS). */
export function importLimits(): ImportLimits {
  const config = env();
  return { maxFileBytes: Math.round(config.IMPORT_MAX_FILE_MB * 1024 * 1024), maxRows: config.IMPORT_MAX_ROWS };
}

/**
 * How long a parse may take once a thread has started it: a base and a rate per MB
 * (IMPORT_PARSE_SECONDS for an import, a tenth of it and at least 2 s for a preview, which
 * reads only the first rows), generous for a loaded two-core machine (bench:parse: 499,000
 * readings, 38 MB, 7–10 s at load 8–12).
 */
export function parseDeadlineMs(sizeBytes: number, kind: 'preview' | 'import'): number {
  const megabytes = sizeBytes / (1024 * 1024);
  const base = env().IMPORT_PARSE_SECONDS * 1000;
  return Math.round(kind === 'preview' ? Math.max(2_000, base / 10) + 500 * megabytes : base + 4_000 * megabytes);
}

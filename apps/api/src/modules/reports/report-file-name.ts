/** A download name of letters, digits, dot, dash and underscore only (safe in Content-Disposition). */
export function safeReportFileName(name: string): string {
  return name.normalize('NFKD').replace(/[^A-Za-z0-9._-]+/g, '_').replace(/_+/g, '_').slice(0, 150);
}

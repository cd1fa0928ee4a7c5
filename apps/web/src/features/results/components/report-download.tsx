/**
 * Where the issued PDF report of a version is downloaded. The laboratory's reports are generated
 * when a version is approved; until this version has one, the area says so rather than offering
 * a link that would fail.
 */
export function ReportDownload({ version }: { version: number }) {
  return (
    <div className="flex flex-wrap items-center justify-between gap-3" data-testid="report-download">
      <div>
        <p className="text-sm font-medium text-slate-900">Test report, version {version}</p>
        <p className="text-sm text-slate-600">Report not issued yet. The laboratory issues a PDF report for each approved version; it will be downloadable here.</p>
      </div>
      <span className="rounded-full bg-slate-100 px-2.5 py-1 text-xs font-medium text-slate-600">Not issued yet</span>
    </div>
  );
}

import type { SoilRecordVersion } from '@porestack/types';
import { formatDateTime } from '../../../lib/format';

/** Who approved this version and when, and what it was computed from: enough to trace it. */
export function IssuedProvenance({ version, testReference }: { version: SoilRecordVersion; testReference: string }) {
  return (
    <dl className="grid gap-3 text-sm sm:grid-cols-2">
      <div>
        <dt className="text-xs uppercase tracking-wide text-slate-500">Approved by</dt>
        <dd className="text-slate-900">{version.approvedByName}</dd>
      </div>
      <div>
        <dt className="text-xs uppercase tracking-wide text-slate-500">Approved on</dt>
        <dd className="text-slate-900">{formatDateTime(version.approvedAt)}</dd>
      </div>
      <div>
        <dt className="text-xs uppercase tracking-wide text-slate-500">Version</dt>
        <dd className="text-slate-900">
          v{version.version} of the record of test {testReference}
          {version.supersededAt ? ` · superseded by v${version.supersededByVersion ?? '?'}` : ' · current'}
        </dd>
      </div>
      <div>
        <dt className="text-xs uppercase tracking-wide text-slate-500">Computed with</dt>
        <dd className="text-slate-900">geo-core {version.geoCoreVersion}</dd>
      </div>
      <div className="sm:col-span-2">
        <dt className="text-xs uppercase tracking-wide text-slate-500">Readings file SHA-256</dt>
        <dd className="break-all font-mono text-xs text-slate-900">{version.uploadSha256 ?? 'not recorded'}</dd>
      </div>
    </dl>
  );
}

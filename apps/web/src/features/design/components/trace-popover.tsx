import type { LayerSource, RecordVersionTrace } from '@porestack/types';
import { useEffect, useId, useRef, useState } from 'react';
import { Link } from 'react-router-dom';
import { Spinner } from '../../../components/spinner';
import { paths } from '../../../config/paths';
import { messageOf } from '../../../lib/api-error';
import { formatDateTime } from '../../../lib/format';
import { useRecordVersionTrace, useSetRevisionTrace } from '../api/design-records';
import { formatNumber } from './design-format';

type TracePopoverProps = {
  orgId: string;
  projectId: string;
  source: LayerSource | null;
  /** The value and its origin as the run used it. */
  label: string;
  origin: 'source' | 'hand';
};

/**
 * One click from a layer parameter to where it came from: record → version → test → approver →
 * readings file hash; a set's adopted value and its members; or "entered by hand".
 */
export function TracePopover({ orgId, projectId, source, label, origin }: TracePopoverProps) {
  const [open, setOpen] = useState(false);
  const id = useId();
  const box = useRef<HTMLDivElement>(null);
  useEffect(() => {
    if (!open) return;
    const close = (event: MouseEvent | KeyboardEvent) => {
      if (event instanceof KeyboardEvent ? event.key === 'Escape' : !box.current?.contains(event.target as Node)) setOpen(false);
    };
    document.addEventListener('mousedown', close);
    document.addEventListener('keydown', close);
    return () => {
      document.removeEventListener('mousedown', close);
      document.removeEventListener('keydown', close);
    };
  }, [open]);
  return (
    <div ref={box} className="relative inline-block">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={id}
        onClick={() => setOpen((v) => !v)}
        className={`rounded px-1 text-left underline decoration-dotted underline-offset-2 hover:bg-slate-100 ${origin === 'hand' ? 'text-amber-900' : 'text-slate-800'}`}
        title="Where this value came from"
      >
        {label}
        {origin === 'hand' ? ' ✎' : ''}
      </button>
      {open ? (
        <div id={id} role="dialog" aria-label="Where this value came from" className="absolute left-0 z-20 mt-1 w-80 rounded-md border border-slate-200 bg-white p-3 text-xs text-slate-700 shadow-lg">
          {origin === 'hand' || source === null || source.kind === 'hand' ? (
            <p>
              <strong className="text-amber-900">Entered by hand</strong> by the designer in the ground model; no test stands behind it.
            </p>
          ) : source.kind === 'record' ? (
            <RecordTrace orgId={orgId} projectId={projectId} versionId={source.versionId} />
          ) : (
            <SetTrace orgId={orgId} projectId={projectId} revisionId={source.setRevisionId} />
          )}
        </div>
      ) : null}
    </div>
  );
}

function Chain({ trace, orgId }: { trace: RecordVersionTrace; orgId: string }) {
  return (
    <ol className="space-y-1">
      <li>
        Record:{' '}
        <Link className="text-accent-700 hover:underline" to={`${paths.org.soilRecord.to(orgId, trace.recordId)}?version=${trace.version}`}>
          {trace.boreholeName} {trace.sampleReference} at {trace.sampleDepthM.toFixed(2)} m
        </Link>
      </li>
      <li>
        Version {trace.version}
        {trace.currentVersion > trace.version ? <span className="ml-1 rounded bg-amber-100 px-1 text-amber-900">v{trace.currentVersion} now approved</span> : null}
      </li>
      <li>
        Test:{' '}
        <Link className="text-accent-700 hover:underline" to={paths.org.test.to(orgId, trace.testId)}>
          {trace.testReference}
        </Link>{' '}
        (geo-core {trace.geoCoreVersion})
      </li>
      <li>
        Approved by {trace.approvedByName}, {formatDateTime(trace.approvedAt)}
      </li>
      <li className="break-all">
        Readings file {trace.readingsFileName ?? '—'}
        <span className="block font-mono text-[11px] text-slate-500">SHA-256 {trace.readingsSha256 ?? 'not recorded'}</span>
      </li>
    </ol>
  );
}

function RecordTrace({ orgId, projectId, versionId }: { orgId: string; projectId: string; versionId: string }) {
  const trace = useRecordVersionTrace(orgId, projectId, versionId, true);
  if (trace.isPending) return <Spinner label="Looking it up…" />;
  if (trace.error) return <p className="text-red-700">{messageOf(trace.error)}</p>;
  return <Chain trace={trace.data} orgId={orgId} />;
}

function SetTrace({ orgId, projectId, revisionId }: { orgId: string; projectId: string; revisionId: string }) {
  const trace = useSetRevisionTrace(orgId, projectId, revisionId, true);
  if (trace.isPending) return <Spinner label="Looking it up…" />;
  if (trace.error) return <p className="text-red-700">{messageOf(trace.error)}</p>;
  const t = trace.data;
  return (
    <div className="space-y-2">
      <p>
        Characteristic set{' '}
        <Link className="text-accent-700 hover:underline" to={`${paths.org.characteristicSet.to(orgId, projectId, t.setId)}?revision=${t.revision}`}>
          {t.name}
        </Link>
        , revision {t.revision}
        {t.currentRevision > t.revision ? ` (revision ${t.currentRevision} now saved)` : ''}, by {t.createdByName} {formatDateTime(t.createdAt)}.
      </p>
      <p>
        Adopted:{' '}
        {Object.entries(t.adopted)
          .map(([key, a]) => `${key} ${formatNumber(a.value)} (${a.basis}${a.note ? `: ${a.note}` : ''})`)
          .join('; ')}
      </p>
      <p className="font-medium">From {t.members.length} approved version{t.members.length === 1 ? '' : 's'}:</p>
      <ul className="max-h-48 space-y-2 overflow-y-auto">
        {t.members.map((m) => (
          <li key={m.versionId} className="border-t border-slate-100 pt-1">
            <Chain trace={m} orgId={orgId} />
          </li>
        ))}
      </ul>
    </div>
  );
}

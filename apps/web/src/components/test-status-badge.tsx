import { TEST_STATUS_HINTS, TEST_STATUS_LABELS, type TestStatus } from '@porestack/types';

const TONES: Record<TestStatus, string> = {
  draft: 'bg-slate-100 text-slate-700',
  readings_uploaded: 'bg-sky-50 text-sky-800',
  analysed: 'bg-indigo-50 text-indigo-800',
  submitted: 'bg-amber-50 text-amber-900',
  approved: 'bg-accent-50 text-accent-800',
  changes_requested: 'bg-red-50 text-red-800',
};

export function TestStatusBadge({ status }: { status: TestStatus }) {
  return (
    <span title={TEST_STATUS_HINTS[status]} className={`inline-block whitespace-nowrap rounded-full px-2 py-0.5 text-xs font-medium ${TONES[status]}`}>
      {TEST_STATUS_LABELS[status]}
    </span>
  );
}

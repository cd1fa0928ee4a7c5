import type { TestStatus } from '@porestack/types';

/** Our words for where a test stands: short enough for a badge, plain enough for a newcomer. */
export const TEST_STATUS_WORDS: Record<TestStatus, string> = {
  draft: 'Draft',
  readings_uploaded: 'Readings in',
  analysed: 'Reduced',
  submitted: 'Awaiting review',
  approved: 'Approved',
  changes_requested: 'Changes asked',
};

/** What each state means, for a tooltip and for screen readers. */
export const TEST_STATUS_HINTS: Record<TestStatus, string> = {
  draft: 'Set up, waiting for a readings file.',
  readings_uploaded: 'Readings imported; the analysis has not finished yet.',
  analysed: 'Analysed; the technician can check the curves and submit.',
  submitted: 'With a lab manager for review.',
  approved: 'Approved; its parameters are a soil record version.',
  changes_requested: 'Sent back by a lab manager with a comment.',
};

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
      {TEST_STATUS_WORDS[status]}
    </span>
  );
}

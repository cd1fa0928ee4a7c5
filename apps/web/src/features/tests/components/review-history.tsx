import type { ReviewEvent } from '@porestack/types';
import { formatDateTime } from '../../../lib/format';

const WORDS: Record<ReviewEvent['decision'], string> = {
  submitted: 'sent it for review',
  approved: 'approved it',
  changes_requested: 'asked for changes',
};

/** Who sent the test for review, who decided, and what they said — newest first. */
export function ReviewHistory({ events }: { events: readonly ReviewEvent[] }) {
  if (events.length === 0) return <p className="text-sm text-slate-600">Nobody has sent this test for review yet.</p>;
  const newestFirst = [...events].sort((a, b) => b.at.localeCompare(a.at));
  return (
    <ol className="space-y-3" aria-label="Review history">
      {newestFirst.map((e) => (
        <li key={e.id} className="text-sm">
          <p className="text-slate-800">
            <span className="font-medium">{e.actorName}</span> {WORDS[e.decision]} <span className="text-slate-500">· {formatDateTime(e.at)}</span>
          </p>
          {e.comment ? <blockquote className="mt-1 border-l-2 border-slate-300 pl-3 text-slate-700">{e.comment}</blockquote> : null}
        </li>
      ))}
    </ol>
  );
}

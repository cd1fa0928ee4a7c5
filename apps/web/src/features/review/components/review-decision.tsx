import { ChangeRequestSchema, type ReviewOutcome } from '@porestack/types';
import { useId, useState } from 'react';
import { Alert } from '../../../components/alert';
import { Button } from '../../../components/button';
import { ErrorMessage } from '../../../components/error-message';
import { useDecideReview } from '../api/decide-review';

type ReviewDecisionProps = {
  orgId: string;
  testId: string;
  testReference: string;
  /** Whether the signed-in person ran this test: nobody approves their own work. */
  isOwnTest: boolean;
  onDecided?: (kind: ReviewOutcome) => void;
};

/** Approve, or ask for changes with a comment the technician will read on the test page. */
export function ReviewDecision({ orgId, testId, testReference, isOwnTest, onDecided }: ReviewDecisionProps) {
  const [comment, setComment] = useState('');
  const [commentError, setCommentError] = useState<string | undefined>();
  const [done, setDone] = useState<string | null>(null);
  const decide = useDecideReview(orgId, {
    onDecided: (decision) => {
      const kind: ReviewOutcome = decision.kind === 'approve' ? 'approved' : 'changes_requested';
      setDone(kind === 'approved' ? `${testReference} approved. A new soil record version has been written.` : `${testReference} sent back to the technician with your comment.`);
      onDecided?.(kind);
    },
  });
  const commentId = useId();

  // A parent that hears about the decision shows the confirmation itself (it outlives this panel).
  if (done) return onDecided ? null : <Alert tone="success">{done}</Alert>;

  const approve = () =>
    decide.mutate({ testId, decision: { kind: 'approve', body: comment.trim() ? { comment: comment.trim() } : {} } });
  const sendBack = () => {
    const parsed = ChangeRequestSchema.safeParse({ comment });
    if (!parsed.success) {
      setCommentError(parsed.error.issues[0]?.message);
      document.getElementById(commentId)?.focus();
      return;
    }
    setCommentError(undefined);
    decide.mutate({ testId, decision: { kind: 'request-changes', body: parsed.data } });
  };

  return (
    <div className="space-y-3" role="group" aria-label={`Review ${testReference}`}>
      <div className="flex flex-col gap-1">
        <label htmlFor={commentId} className="text-sm font-medium text-slate-800">Comment for the technician</label>
        <textarea
          id={commentId}
          rows={3}
          value={comment}
          onChange={(e) => setComment(e.target.value)}
          aria-invalid={commentError ? true : undefined}
          aria-describedby={commentError ? `${commentId}-error` : undefined}
          className={`rounded-md border px-3 py-2 text-sm ${commentError ? 'border-red-600' : 'border-slate-300'}`}
        />
        {commentError ? <p id={`${commentId}-error`} className="text-sm text-red-700">{commentError}</p> : <p className="text-xs text-slate-500">Required when asking for changes; optional on approval.</p>}
      </div>
      {decide.error ? <ErrorMessage error={decide.error} title="The decision was not recorded" /> : null}
      <div className="flex flex-wrap items-center gap-2">
        {isOwnTest ? (
          <p className="text-sm text-slate-600">You ran this test, so another lab manager must approve it.</p>
        ) : (
          <Button onClick={approve} pending={decide.isPending && decide.variables.decision.kind === 'approve'} disabled={decide.isPending}>
            Approve {testReference}
          </Button>
        )}
        <Button variant="secondary" onClick={sendBack} pending={decide.isPending && decide.variables.decision.kind === 'request-changes'} disabled={decide.isPending}>
          Ask for changes
        </Button>
      </div>
    </div>
  );
}

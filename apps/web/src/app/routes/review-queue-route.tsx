import { EmptyState } from '../../components/empty-state';
import { ErrorMessage } from '../../components/error-message';
import { PageHeader } from '../../components/page-header';
import { Panel } from '../../components/panel';
import { LoadingBlock } from '../../components/spinner';
import { useReviewQueue } from '../../features/review/api/get-review-queue';
import { ReviewQueueTable } from '../../features/review/components/review-queue-table';
import { rolesFor } from '../nav-config';
import { useCurrentOrg } from '../org-context';
import { RoleGate } from '../role-gate';
import { Padded } from './padded';

export function ReviewQueueRoute() {
  return (
    <RoleGate roles={rolesFor('review-queue')} purpose="reviewing submitted tests">
      <ReviewQueuePage />
    </RoleGate>
  );
}

function ReviewQueuePage() {
  const { orgId, user } = useCurrentOrg();
  const queue = useReviewQueue(orgId);
  return (
    <>
      <PageHeader title="Review queue" description="Tests technicians have sent for review. Open one to see its curves, then approve it or ask for changes." />
      <Panel title="Waiting for a decision" flush>
        {queue.isPending ? (
          <Padded><LoadingBlock label="Loading the queue…" /></Padded>
        ) : queue.error ? (
          <Padded><ErrorMessage error={queue.error} title="The review queue could not be loaded" onRetry={() => void queue.refetch()} /></Padded>
        ) : queue.data.length === 0 ? (
          <Padded><EmptyState title="Nothing to review">Submitted tests appear here; you also get an e-mail for each one.</EmptyState></Padded>
        ) : (
          <ReviewQueueTable orgId={orgId} items={queue.data} currentUserId={user.id} />
        )}
      </Panel>
    </>
  );
}

import type { Membership, Session } from '@porestack/types';
import { useSessionQuery } from '../api/get-session';

export type SessionState = {
  session: Session | null | undefined;
  isPending: boolean;
  error: unknown;
  refetch: () => unknown;
  /** The membership for one organisation, or undefined when the person is not a member of it. */
  membershipFor: (orgId: string | undefined) => Membership | undefined;
};

/** The signed-in person, as the rest of the app reads it. `session` is null when signed out. */
export function useSession(): SessionState {
  const query = useSessionQuery();
  return {
    session: query.data,
    isPending: query.isPending,
    error: query.error,
    refetch: query.refetch,
    membershipFor: (orgId) => query.data?.memberships.find((membership) => membership.organisationId === orgId),
  };
}

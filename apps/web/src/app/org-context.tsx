import type { Membership, User } from '@porestack/types';
import { createContext, useContext } from 'react';

export type CurrentOrg = {
  orgId: string;
  membership: Membership;
  user: User;
  memberships: readonly Membership[];
};

export const CurrentOrgContext = createContext<CurrentOrg | null>(null);

/** The organisation in the URL and the signed-in person's place in it; only inside the org layout. */
export function useCurrentOrg(): CurrentOrg {
  const value = useContext(CurrentOrgContext);
  if (!value) throw new Error('useCurrentOrg is used outside the organisation layout.');
  return value;
}

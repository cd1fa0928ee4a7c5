import { useMutation } from '@tanstack/react-query';
import { apiPaths, paths } from '../../../config/paths';
import { api } from '../../../lib/api-client';

export async function signOut(): Promise<void> {
  await api.post(apiPaths.signOut);
}

/** The sign-in page's address after a deliberate sign-out; it then says so. */
export const SIGNED_OUT_URL = `${paths.signIn.to()}?notice=signed-out`;

/**
 * Signs out, then loads the sign-in page afresh. A full page load rather than a client-side
 * navigation drops every cached query, the CSRF token and any state in memory at once, and
 * avoids the signed-in pages reacting to the ended session before the redirect lands.
 */
export function useSignOut() {
  return useMutation({
    mutationFn: signOut,
    onSuccess: () => window.location.assign(SIGNED_OUT_URL),
  });
}

import type { User } from '@porestack/types';
import { Button } from '../../components/button';
import { ErrorMessage } from '../../components/error-message';
import { useSignOut } from '../../features/auth/api/sign-out';
import { Brand } from '../layout/brand';

/** Signed in, but no organisation holds a membership for this person (e.g. they were removed). */
export function NoOrganisation({ user }: { user: User }) {
  const signOut = useSignOut();
  return (
    <div className="mx-auto flex min-h-screen max-w-md flex-col justify-center gap-6 px-4">
      <Brand />
      <div className="rounded-lg border border-slate-200 bg-white p-6">
        <h1 className="text-lg font-semibold text-slate-900">You are not in any organisation</h1>
        <p className="mt-2 text-sm text-slate-700">
          You are signed in as {user.email}, but no organisation lists you as a member. Ask an administrator of your
          laboratory to invite you; the invitation e-mail has a link that adds you.
        </p>
        {signOut.error ? <div className="mt-4"><ErrorMessage error={signOut.error} /></div> : null}
        <Button
          variant="secondary"
          className="mt-5"
          pending={signOut.isPending}
          onClick={() => signOut.mutate()}
        >
          Sign out
        </Button>
      </div>
    </div>
  );
}

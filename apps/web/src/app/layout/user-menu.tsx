import { roleList, type Role, type User } from '@porestack/types';
import { useEffect, useId, useRef, useState } from 'react';
import { Button } from '../../components/button';
import { ErrorMessage } from '../../components/error-message';
import { useSignOut } from '../../features/auth/api/sign-out';

/** The person's name; opens a small panel with their address, roles and sign-out. */
export function UserMenu({ user, roles }: { user: User; roles: readonly Role[] | null }) {
  const [open, setOpen] = useState(false);
  const panelId = useId();
  const containerRef = useRef<HTMLDivElement>(null);
  const signOut = useSignOut();

  useEffect(() => {
    if (!open) return;
    const onPointerDown = (event: PointerEvent) => {
      if (!containerRef.current?.contains(event.target as Node)) setOpen(false);
    };
    const onKeyDown = (event: KeyboardEvent) => {
      if (event.key === 'Escape') setOpen(false);
    };
    document.addEventListener('pointerdown', onPointerDown);
    document.addEventListener('keydown', onKeyDown);
    return () => {
      document.removeEventListener('pointerdown', onPointerDown);
      document.removeEventListener('keydown', onKeyDown);
    };
  }, [open]);

  return (
    <div ref={containerRef} className="relative">
      <button
        type="button"
        aria-expanded={open}
        aria-controls={panelId}
        onClick={() => setOpen((value) => !value)}
        className="inline-flex h-8 items-center gap-2 rounded-md px-2 text-sm font-medium text-slate-700 hover:bg-slate-100"
      >
        <span aria-hidden="true" className="flex size-6 items-center justify-center rounded-full bg-accent-100 text-xs font-semibold text-accent-800">
          {user.name.trim().charAt(0).toUpperCase() || '?'}
        </span>
        <span className="max-w-40 truncate">{user.name}</span>
        <svg viewBox="0 0 12 12" className="size-3 text-slate-500" aria-hidden="true">
          <path d="M2.5 4.5 6 8l3.5-3.5" fill="none" stroke="currentColor" strokeWidth="1.5" />
        </svg>
      </button>
      {open ? (
        <div id={panelId} className="absolute right-0 z-40 mt-1 w-64 rounded-md border border-slate-200 bg-white p-3 shadow-lg">
          <p className="truncate text-sm font-medium text-slate-900">{user.name}</p>
          <p className="truncate text-sm text-slate-600">{user.email}</p>
          {roles ? <p className="mt-1 text-xs text-slate-500">{roleList(roles)} in this organisation</p> : null}
          {signOut.error ? (
            <div className="mt-3">
              <ErrorMessage error={signOut.error} />
            </div>
          ) : null}
          <Button
            variant="secondary"
            size="sm"
            className="mt-3 w-full"
            pending={signOut.isPending}
            onClick={() => signOut.mutate()}
          >
            Sign out
          </Button>
        </div>
      ) : null}
    </div>
  );
}

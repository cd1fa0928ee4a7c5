import type { ReactNode } from 'react';

type EmptyStateProps = {
  title: string;
  children?: ReactNode;
  action?: ReactNode;
};

/** What a list shows when it has nothing in it: what that means, and what to do next. */
export function EmptyState({ title, children, action }: EmptyStateProps) {
  return (
    <div className="rounded-md border border-dashed border-slate-300 bg-white px-6 py-8 text-center">
      <p className="text-sm font-medium text-slate-800">{title}</p>
      {children ? <div className="mx-auto mt-1 max-w-md text-sm text-slate-600">{children}</div> : null}
      {action ? <div className="mt-4">{action}</div> : null}
    </div>
  );
}

import type { ReactNode } from 'react';

type AuthPanelProps = {
  title: string;
  description?: ReactNode;
  children: ReactNode;
  /** Links under the card, e.g. "No account yet? Create one". */
  footer?: ReactNode;
};

export function AuthPanel({ title, description, children, footer }: AuthPanelProps) {
  return (
    <>
      <div className="rounded-lg border border-slate-200 bg-white p-6 shadow-xs sm:p-8">
        <h1 className="text-lg font-semibold text-slate-900">{title}</h1>
        {description ? <div className="mt-1 text-sm text-slate-600">{description}</div> : null}
        <div className="mt-6">{children}</div>
      </div>
      {footer ? <div className="mt-4 text-center text-sm text-slate-600">{footer}</div> : null}
    </>
  );
}

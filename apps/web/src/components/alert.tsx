import type { ReactNode } from 'react';

type AlertProps = {
  tone?: 'error' | 'success' | 'info' | 'warning';
  title?: string;
  children?: ReactNode;
  className?: string;
};

const TONES: Record<NonNullable<AlertProps['tone']>, string> = {
  error: 'border-red-300 bg-red-50 text-red-900',
  success: 'border-accent-200 bg-accent-50 text-accent-800',
  info: 'border-slate-300 bg-white text-slate-800',
  warning: 'border-amber-300 bg-amber-50 text-amber-900',
};

/** A boxed message. Errors are announced at once (role=alert); the other tones politely (role=status). */
export function Alert({ tone = 'info', title, children, className }: AlertProps) {
  return (
    <div role={tone === 'error' ? 'alert' : 'status'} className={`rounded-md border px-4 py-3 text-sm ${TONES[tone]} ${className ?? ''}`}>
      {title ? <p className="font-semibold">{title}</p> : null}
      {children ? <div className={title ? 'mt-1' : undefined}>{children}</div> : null}
    </div>
  );
}

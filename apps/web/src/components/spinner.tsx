type SpinnerProps = {
  /** Read by screen readers; leave out when the surrounding text already says what is loading. */
  label?: string;
  size?: 'sm' | 'md';
};

export function Spinner({ label, size = 'md' }: SpinnerProps) {
  const dimension = size === 'sm' ? 'size-4' : 'size-6';
  return (
    <span className="inline-flex items-center gap-2" {...(label ? { role: 'status' } : { 'aria-hidden': true })}>
      <svg className={`${dimension} animate-spin text-current`} viewBox="0 0 24 24" fill="none" aria-hidden="true">
        <circle cx="12" cy="12" r="9" stroke="currentColor" strokeOpacity="0.25" strokeWidth="3" />
        <path d="M21 12a9 9 0 0 0-9-9" stroke="currentColor" strokeWidth="3" strokeLinecap="round" />
      </svg>
      {label ? <span className="text-sm text-slate-600">{label}</span> : null}
    </span>
  );
}

/** A whole-area loading state, for a page or a panel that is waiting on its first data. */
export function LoadingBlock({ label }: { label: string }) {
  return (
    <div className="flex min-h-32 items-center justify-center text-accent-600">
      <Spinner label={label} />
    </div>
  );
}

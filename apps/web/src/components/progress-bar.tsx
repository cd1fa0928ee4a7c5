/** A labelled progress bar; `fraction` is 0–1, or null when the total is not known. */
export function ProgressBar({ label, fraction, detail }: { label: string; fraction: number | null; detail?: string }) {
  const percent = fraction === null ? null : Math.round(Math.min(Math.max(fraction, 0), 1) * 100);
  return (
    <div className="space-y-1">
      <div className="flex justify-between text-sm text-slate-700">
        <span>{label}</span>
        <span className="tabular-nums">{percent === null ? '' : `${percent} %`}{detail ? ` · ${detail}` : ''}</span>
      </div>
      <div
        role="progressbar"
        aria-label={label}
        aria-valuemin={0}
        aria-valuemax={100}
        {...(percent === null ? {} : { 'aria-valuenow': percent })}
        className="h-2 overflow-hidden rounded-full bg-slate-200"
      >
        <div className={`h-full rounded-full bg-accent-600 transition-[width] ${percent === null ? 'w-1/3 animate-pulse' : ''}`} style={percent === null ? undefined : { width: `${percent}%` }} />
      </div>
    </div>
  );
}

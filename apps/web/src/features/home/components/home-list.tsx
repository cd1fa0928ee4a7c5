import type { ReactNode } from 'react';
import { Link } from 'react-router-dom';

export type HomeListItem = { key: string; to: string; title: ReactNode; meta?: ReactNode; aside?: ReactNode };

/** A short list of things to open from a home page; says what an empty list means. */
export function HomeList({ label, items, empty }: { label: string; items: readonly HomeListItem[]; empty: string }) {
  if (items.length === 0) return <p className="text-sm text-slate-600">{empty}</p>;
  return (
    <ul aria-label={label} className="-my-2 divide-y divide-slate-100">
      {items.map((item) => (
        <li key={item.key} className="flex flex-wrap items-start justify-between gap-x-4 gap-y-1 py-2">
          <div className="min-w-0">
            <Link to={item.to} className="text-sm font-medium text-accent-700 hover:underline">
              {item.title}
            </Link>
            {item.meta ? <div className="text-xs text-slate-600">{item.meta}</div> : null}
          </div>
          {item.aside ? <div className="shrink-0 text-xs text-slate-600">{item.aside}</div> : null}
        </li>
      ))}
    </ul>
  );
}

/** "More in the review queue →" under a shortened list. */
export function MoreLink({ to, children }: { to: string; children: ReactNode }) {
  return (
    <p className="mt-3 text-sm">
      <Link to={to} className="font-medium text-accent-700 hover:underline">
        {children} →
      </Link>
    </p>
  );
}

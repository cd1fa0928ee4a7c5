import { Link } from 'react-router-dom';
import { paths } from '../../config/paths';

/** The product mark: a stack of three layers, like a soil column, and the name. */
export function Brand({ to = paths.root.to() }: { to?: string }) {
  return (
    <Link to={to} className="inline-flex items-center gap-2 rounded-sm font-semibold tracking-tight text-slate-900">
      <svg viewBox="0 0 20 20" className="size-5" aria-hidden="true">
        <rect x="2" y="3" width="16" height="4" rx="1" className="fill-accent-200" />
        <rect x="2" y="8" width="16" height="4" rx="1" className="fill-accent-500" />
        <rect x="2" y="13" width="16" height="4" rx="1" className="fill-accent-700" />
      </svg>
      <span>Porestack</span>
    </Link>
  );
}

/** The flag a check carries once a record or set version it pinned has been superseded. */
export function NewerParametersBadge() {
  return <span className="rounded-full bg-amber-100 px-2 py-0.5 text-xs font-medium text-amber-900">Newer parameters approved</span>;
}

import { canonicalRoles, ROLE_LABELS, ROLES, type Role } from '@porestack/types';
import { useId } from 'react';

type RoleCheckboxesProps = {
  /** Names the group for screen readers, e.g. "Roles of Ada Brook". */
  legend: string;
  /** Keeps the legend for screen readers only, e.g. inside a table row. */
  hideLegend?: boolean;
  value: readonly Role[];
  /** The whole new set, in the usual order; may be empty (the caller says why that is refused). */
  onChange: (roles: Role[]) => void;
  disabled?: boolean;
  error?: string | undefined;
};

/**
 * One native checkbox per role inside a fieldset: Tab moves from role to role, Space ticks, and a
 * screen reader hears the group's name with each box. A member may hold several roles.
 */
export function RoleCheckboxes({ legend, hideLegend = false, value, onChange, disabled = false, error }: RoleCheckboxesProps) {
  const id = useId();
  return (
    <fieldset aria-describedby={error ? `${id}-error` : undefined} aria-invalid={error ? true : undefined} className="min-w-0">
      <legend className={hideLegend ? 'sr-only' : 'mb-1 text-sm font-medium text-slate-800'}>{legend}</legend>
      <div className="flex flex-wrap gap-x-4 gap-y-1">
        {ROLES.map((role) => (
          <label key={role} className="flex items-center gap-1.5 whitespace-nowrap text-sm text-slate-800">
            <input
              type="checkbox"
              className="h-4 w-4 rounded border-slate-300 disabled:opacity-60"
              checked={value.includes(role)}
              disabled={disabled}
              onChange={(event) => onChange(canonicalRoles(event.target.checked ? [...value, role] : value.filter((held) => held !== role)))}
            />
            {ROLE_LABELS[role]}
          </label>
        ))}
      </div>
      {error ? (
        <p id={`${id}-error`} className="mt-1 text-sm text-red-700">
          {error}
        </p>
      ) : null}
    </fieldset>
  );
}

import type { ReactNode } from 'react';

/** Ids for a field's hint and error text, joined for aria-describedby. */
export function describedBy(id: string, hint: ReactNode, error: string | undefined): string | undefined {
  const ids = [hint ? `${id}-hint` : null, error ? `${id}-error` : null].filter(Boolean);
  return ids.length > 0 ? ids.join(' ') : undefined;
}

export function FieldHint({ id, children }: { id: string; children: ReactNode }) {
  return children ? (
    <p id={`${id}-hint`} className="text-xs text-slate-500">
      {children}
    </p>
  ) : null;
}

export function FieldError({ id, message }: { id: string; message: string | undefined }) {
  return message ? (
    <p id={`${id}-error`} className="text-sm text-red-700">
      {message}
    </p>
  ) : null;
}

export const controlClasses = (invalid: boolean) =>
  `block w-full rounded-md border bg-white px-3 text-sm text-slate-900 shadow-xs placeholder:text-slate-400 disabled:bg-slate-100 ${
    invalid ? 'border-red-600' : 'border-slate-300 hover:border-slate-400'
  }`;

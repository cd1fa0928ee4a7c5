import { useId, type ReactNode, type SelectHTMLAttributes } from 'react';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts';

export type SelectOption = { value: string; label: string };

type SelectProps = Omit<SelectHTMLAttributes<HTMLSelectElement>, 'id' | 'size'> & {
  label: string;
  options: readonly SelectOption[];
  /** Keeps the label for screen readers only, e.g. a role picker inside a table row. */
  hideLabel?: boolean;
  error?: string | undefined;
  hint?: ReactNode;
  size?: 'sm' | 'md';
};

export function Select({ label, options, hideLabel = false, error, hint, size = 'md', className, ...rest }: SelectProps) {
  const id = useId();
  return (
    <div className={`flex flex-col gap-1 ${className ?? ''}`}>
      <label htmlFor={id} className={hideLabel ? 'sr-only' : 'text-sm font-medium text-slate-800'}>
        {label}
      </label>
      <select
        id={id}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={`${controlClasses(Boolean(error))} ${size === 'sm' ? 'h-8 pr-8' : 'h-10 pr-8'}`}
        {...rest}
      >
        {options.map((option) => (
          <option key={option.value} value={option.value}>
            {option.label}
          </option>
        ))}
      </select>
      <FieldHint id={id}>{hint}</FieldHint>
      <FieldError id={id} message={error} />
    </div>
  );
}

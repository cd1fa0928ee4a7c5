import { useId, type ComponentPropsWithRef, type ReactNode } from 'react';
import { controlClasses, describedBy, FieldError, FieldHint } from './field-parts';

type TextFieldProps = Omit<ComponentPropsWithRef<'input'>, 'id'> & {
  label: string;
  name: string;
  /** Shown under the field in red and announced with it; also marks the input invalid. */
  error?: string | undefined;
  hint?: ReactNode;
};

export function TextField({ label, name, error, hint, type = 'text', className, ...rest }: TextFieldProps) {
  const id = useId();
  return (
    <div className={`flex flex-col gap-1 ${className ?? ''}`}>
      <label htmlFor={id} className="text-sm font-medium text-slate-800">
        {label}
      </label>
      <input
        id={id}
        name={name}
        type={type}
        aria-invalid={error ? true : undefined}
        aria-describedby={describedBy(id, hint, error)}
        className={`${controlClasses(Boolean(error))} h-10`}
        {...rest}
      />
      <FieldHint id={id}>{hint}</FieldHint>
      <FieldError id={id} message={error} />
    </div>
  );
}

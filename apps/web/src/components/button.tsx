import type { ComponentPropsWithRef } from 'react';
import { Spinner } from './spinner';

type ButtonProps = ComponentPropsWithRef<'button'> & {
  variant?: 'primary' | 'secondary' | 'danger' | 'ghost' | 'ghost-danger';
  size?: 'sm' | 'md';
  /** While true the button is disabled and shows a spinner, so a form cannot be sent twice. */
  pending?: boolean;
};

const VARIANTS: Record<NonNullable<ButtonProps['variant']>, string> = {
  primary: 'bg-accent-600 text-white hover:bg-accent-700 disabled:bg-accent-600/60',
  secondary: 'border border-slate-300 bg-white text-slate-800 hover:bg-slate-50 disabled:text-slate-400',
  danger: 'bg-red-700 text-white hover:bg-red-800 disabled:bg-red-700/60',
  ghost: 'text-slate-700 hover:bg-slate-100 disabled:text-slate-400',
  'ghost-danger': 'text-red-700 hover:bg-red-50 disabled:text-slate-400',
};

const SIZES: Record<NonNullable<ButtonProps['size']>, string> = {
  sm: 'h-8 px-3 text-sm',
  md: 'h-10 px-4 text-sm',
};

export function buttonClasses(variant: ButtonProps['variant'] = 'primary', size: ButtonProps['size'] = 'md'): string {
  return `inline-flex items-center justify-center gap-2 rounded-md font-medium transition-colors disabled:cursor-not-allowed ${VARIANTS[variant]} ${SIZES[size]}`;
}

export function Button({ variant = 'primary', size = 'md', pending = false, disabled, className, children, type, ...rest }: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      disabled={disabled === true || pending}
      aria-busy={pending || undefined}
      className={`${buttonClasses(variant, size)} ${className ?? ''}`}
      {...rest}
    >
      {pending ? <Spinner size="sm" /> : null}
      {children}
    </button>
  );
}

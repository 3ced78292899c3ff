import type { ButtonHTMLAttributes, Ref } from 'react';
import { cn } from './cn';

export type ButtonVariant = 'primary' | 'secondary' | 'danger' | 'quiet' | 'quietDanger';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-moss-700 text-white hover:bg-moss-800 border border-moss-800',
  secondary: 'bg-white text-moss-800 border border-line-strong hover:bg-sand-100',
  danger: 'bg-brick-700 text-white hover:bg-brick-600 border border-brick-700',
  quiet: 'bg-transparent text-moss-800 border border-transparent hover:bg-sand-100',
  quietDanger: 'bg-transparent text-brick-700 border border-transparent hover:bg-brick-50',
};

/** Class names of a button, for links that should look like one. */
export function buttonClasses(variant: ButtonVariant = 'primary', extra?: string): string {
  return cn(
    'inline-flex min-h-11 items-center justify-center gap-2 rounded-md px-4 py-2 text-base font-semibold no-underline',
    'disabled:cursor-not-allowed disabled:opacity-60',
    variants[variant],
    extra,
  );
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  isBusy?: boolean;
  ref?: Ref<HTMLButtonElement>;
}

export function Button({
  variant = 'primary',
  isBusy = false,
  className,
  disabled,
  type,
  children,
  ...rest
}: ButtonProps) {
  return (
    <button
      type={type ?? 'button'}
      className={buttonClasses(variant, className)}
      disabled={disabled ?? isBusy}
      aria-busy={isBusy || undefined}
      {...rest}
    >
      {children}
    </button>
  );
}

import type { ButtonHTMLAttributes } from 'react';
import { Spinner } from './spinner';

/** How much weight a control carries on the page; one primary per form. */
export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';
/** Compact buttons fit inside table rows. */
export type ButtonSize = 'md' | 'sm';

const base =
  'inline-flex items-center justify-center gap-2 rounded-md font-bold no-underline transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-60';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-moss text-card hover:bg-moss-deep hover:text-card',
  secondary: 'border border-moss bg-card text-moss hover:bg-moss-wash hover:text-moss-deep',
  quiet: 'text-moss hover:bg-moss-wash hover:text-moss-deep',
  danger: 'bg-maple text-card hover:bg-maple-deep hover:text-card',
};

const sizes: Record<ButtonSize, string> = {
  md: 'min-h-11 px-4 py-2 text-sm',
  sm: 'min-h-9 px-3 py-1 text-sm',
};

/** Button look for links that act as calls to action, so links and buttons match. */
export function buttonClasses(variant: ButtonVariant = 'primary', size: ButtonSize = 'md', extra = ''): string {
  return `${base} ${variants[variant]} ${sizes[size]} ${extra}`.trim();
}

/** Props of Button; `busy` keeps the label (and so the accessible name) while work is in flight. */
export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  busy?: boolean;
}

/** Every clickable action that is not navigation; defaults to type="button" so forms never submit by accident. */
export function Button({ variant = 'primary', size = 'md', busy = false, type = 'button', className = '', disabled, children, ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClasses(variant, size, className)} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy && <Spinner className="size-4" />}
      {children}
    </button>
  );
}

import type { ButtonHTMLAttributes } from 'react';
import { cn } from '../../utils/cn';

type Variant = 'primary' | 'secondary' | 'danger' | 'quiet';

const variants: Record<Variant, string> = {
  primary: 'bg-brand text-white border-brand hover:bg-brand-dark hover:border-brand-dark',
  secondary: 'bg-paper-raised text-ink border-slate-line hover:border-brand hover:text-brand-dark',
  danger: 'bg-paper-raised text-over border-over/60 hover:bg-over-light',
  quiet: 'bg-transparent text-brand border-transparent hover:bg-brand-light',
};

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: Variant;
  size?: 'md' | 'sm';
  busy?: boolean;
}

/** Buttons are at least 44 px tall at the default size so they suit gloved fingers on a tablet. */
export function Button({ variant = 'primary', size = 'md', busy = false, className, disabled, children, type = 'button', ...rest }: ButtonProps) {
  return (
    <button
      type={type}
      disabled={disabled || busy}
      aria-busy={busy || undefined}
      className={cn(
        'inline-flex items-center justify-center gap-2 rounded-md border font-medium transition-colors',
        'disabled:cursor-not-allowed disabled:opacity-60',
        size === 'md' ? 'min-h-11 px-4 text-[0.95rem]' : 'min-h-9 px-3 text-sm',
        variants[variant],
        className,
      )}
      {...rest}
    >
      {busy && <span aria-hidden="true" className="size-3.5 animate-spin rounded-full border-2 border-current border-r-transparent" />}
      {children}
    </button>
  );
}

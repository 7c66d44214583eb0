import clsx from 'clsx';
import { forwardRef, type ButtonHTMLAttributes, type ReactNode } from 'react';
import { Link, type LinkProps } from 'react-router-dom';
import { Spinner } from '@/components/ui/spinner';

export type ButtonVariant = 'primary' | 'secondary' | 'ghost' | 'danger' | 'on-ink';
export type ButtonSize = 'sm' | 'md' | 'lg';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-amber-400 text-ink-950 hover:bg-amber-300 active:bg-amber-500 border border-amber-500/60 shadow-sm',
  secondary: 'bg-white text-ink-900 border border-stone-300 hover:bg-stone-50 hover:border-stone-400 shadow-sm',
  ghost: 'text-ink-700 hover:bg-ink-50 hover:text-ink-900',
  danger: 'bg-danger-600 text-white hover:bg-danger-700 border border-danger-700 shadow-sm',
  'on-ink': 'text-ink-100 hover:bg-ink-800 hover:text-white',
};

// md is 44 px on phones (touch) and 40 px where a mouse is likely; lg is for field work.
const sizes: Record<ButtonSize, string> = {
  sm: 'h-8 px-2.5 text-sm gap-1.5',
  md: 'min-h-touch md:min-h-10 px-4 text-base gap-2',
  lg: 'min-h-touch-lg px-5 text-md gap-2.5',
};

export function buttonClasses(variant: ButtonVariant = 'secondary', size: ButtonSize = 'md', className?: string) {
  return clsx(
    'inline-flex select-none items-center justify-center whitespace-nowrap rounded font-medium transition-colors',
    'disabled:cursor-not-allowed disabled:opacity-60 aria-disabled:cursor-not-allowed aria-disabled:opacity-60',
    variants[variant],
    sizes[size],
    className,
  );
}

export interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  size?: ButtonSize;
  /** Shows a spinner and blocks clicks while an action runs. */
  loading?: boolean;
  icon?: ReactNode;
}

export const Button = forwardRef<HTMLButtonElement, ButtonProps>(function Button(
  { variant = 'secondary', size = 'md', loading = false, icon, className, children, disabled, type = 'button', ...rest },
  ref,
) {
  return (
    <button
      ref={ref}
      type={type}
      className={buttonClasses(variant, size, className)}
      disabled={disabled || loading}
      aria-busy={loading || undefined}
      {...rest}
    >
      {loading ? <Spinner label="" /> : icon}
      {children}
    </button>
  );
});

interface ButtonLinkProps extends LinkProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
  icon?: ReactNode;
}

/** A link that looks like a button (navigation, not an action). */
export function ButtonLink({ variant = 'secondary', size = 'md', icon, className, children, ...rest }: ButtonLinkProps) {
  return (
    <Link className={buttonClasses(variant, size, typeof className === 'string' ? className : undefined)} {...rest}>
      {icon}
      {children}
    </Link>
  );
}

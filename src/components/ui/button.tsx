/**
 * Buttons, and the class a link takes to look like one. The router's link that looks like a button
 * is in button-link.tsx, so a page without the router (the public check's own page) can use these.
 */
import type { ButtonHTMLAttributes, ReactNode } from 'react';
import { LoaderCircle } from 'lucide-react';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger';

const variants: Record<ButtonVariant, string> = {
  primary: 'bg-cellar-700 text-white hover:bg-cellar-900 disabled:bg-cellar-300',
  secondary: 'bg-white text-cellar-700 ring-1 ring-inset ring-cellar-300 hover:bg-cellar-50',
  quiet: 'text-cellar-700 hover:bg-cellar-50',
  danger: 'bg-alert-500 text-white hover:bg-alert-700',
};

export function buttonClass(variant: ButtonVariant = 'primary', extra = '') {
  return `inline-flex min-h-touch min-w-touch items-center justify-center gap-2 rounded-lg px-4 py-2 text-base font-semibold transition-colors disabled:cursor-not-allowed ${variants[variant]} ${extra}`;
}

interface ButtonProps extends ButtonHTMLAttributes<HTMLButtonElement> {
  variant?: ButtonVariant;
  busy?: boolean;
  icon?: ReactNode;
}

export function Button({ variant = 'primary', busy = false, icon, className = '', children, disabled, type = 'button', ...rest }: ButtonProps) {
  return (
    <button type={type} className={buttonClass(variant, className)} disabled={disabled || busy} aria-busy={busy || undefined} {...rest}>
      {busy ? <LoaderCircle aria-hidden className="size-5 animate-spin" /> : icon}
      {children}
    </button>
  );
}

import Link from 'next/link';
import type { ComponentProps } from 'react';
import { cx } from './cx';

export type ButtonVariant = 'primary' | 'secondary' | 'quiet' | 'danger' | 'signal';
export type ButtonSize = 'md' | 'lg';

const base =
  'inline-flex items-center justify-center gap-2 rounded-plate border-2 font-semibold tracking-[0.005em] transition-colors ' +
  'disabled:cursor-not-allowed disabled:opacity-55 select-none whitespace-nowrap';

// Every size clears the 44 px touch target (WCAG 2.5.5); lg is for the main action on a tablet.
const sizes: Record<ButtonSize, string> = {
  md: 'min-h-touch px-4 text-body',
  lg: 'min-h-touch-lg px-6 text-lead',
};

const variants: Record<ButtonVariant, string> = {
  primary: 'border-ink bg-ink text-paper-raised hover:bg-ink-soft hover:border-ink-soft',
  signal: 'border-ink bg-signal text-ink hover:bg-signal-light',
  secondary: 'border-ink bg-paper-raised text-ink hover:bg-paper-sunk',
  quiet: 'border-transparent bg-transparent text-teal-dark underline-offset-4 hover:bg-teal-light hover:underline',
  danger: 'border-over bg-paper-raised text-over hover:bg-over-light',
};

export function buttonClasses(variant: ButtonVariant = 'primary', size: ButtonSize = 'md', className?: string) {
  return cx(base, sizes[size], variants[variant], className);
}

interface StyleProps {
  variant?: ButtonVariant;
  size?: ButtonSize;
}

export function Button({ variant, size, className, type = 'button', ...rest }: ComponentProps<'button'> & StyleProps) {
  return <button type={type} className={buttonClasses(variant, size, className)} {...rest} />;
}

/** A link that looks like a button: navigation stays a real link (open in new tab, history). */
export function ButtonLink({ variant, size, className, ...rest }: ComponentProps<typeof Link> & StyleProps) {
  return <Link className={buttonClasses(variant, size, className)} {...rest} />;
}

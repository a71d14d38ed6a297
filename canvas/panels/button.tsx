'use client';
import type { ButtonHTMLAttributes } from 'react';

/** The editor's square tool button: 44 px minimum for gloved fingers, pressed state shown by fill and border. */
export function ToolButton({ active, className = '', ...rest }: ButtonHTMLAttributes<HTMLButtonElement> & { active?: boolean }) {
  return (
    <button
      type="button"
      aria-pressed={active}
      className={`flex min-h-11 min-w-11 items-center justify-center gap-1 rounded-md border px-2 text-sm font-medium transition-colors disabled:opacity-40 ${
        active ? 'border-teal bg-teal text-white' : 'border-paper-line bg-paper-raised text-ink hover:bg-paper-sunk'
      } ${className}`}
      {...rest}
    />
  );
}

'use client';
import { useId, useState } from 'react';
import { CAUTION_LINES, CAUTION_SHORT } from '@/lib/caution';

/**
 * The caution in one line, for the places a verdict or a figure sits (the live readout, the results
 * headline, the details tab). The full text is one click away, in place.
 */
export function CautionLine({ className = '', testId = 'caution-line' }: { className?: string; testId?: string }) {
  const [open, setOpen] = useState(false);
  const id = useId();
  return (
    <div className={`text-xs text-ink ${className}`} data-testid={testId}>
      <p>
        <span aria-hidden className="font-bold">⚠ </span>
        {CAUTION_SHORT}{' '}
        <button type="button" aria-expanded={open} aria-controls={id} onClick={() => setOpen(!open)} className="min-h-6 font-semibold text-teal underline underline-offset-2">
          {open ? 'Less' : 'Full caution'}
        </button>
      </p>
      {open && (
        <ul id={id} className="mt-1 list-disc space-y-0.5 pl-5" data-testid={`${testId}-full`}>
          {CAUTION_LINES.map((l) => (
            <li key={l}>{l}</li>
          ))}
        </ul>
      )}
    </div>
  );
}

import Link from 'next/link';
import type { ReactNode } from 'react';
import { Wordmark } from '@/components/logo';

/** The signed-out pages' frame: the wordmark, and a card with the crew panel beside the form. */
export function AuthFrame({ eyebrow, tagline, children }: { eyebrow: string; tagline: string; children: ReactNode }) {
  return (
    <div className="survey-grid flex min-h-screen flex-col">
      <header className="mx-auto w-full max-w-5xl px-6 py-5">
        <Link href="/" className="inline-block rounded-plate">
          <Wordmark />
        </Link>
      </header>
      <main className="flex flex-1 items-start justify-center px-6 pb-16 pt-4 md:items-center md:pt-0">
        <div className="grid w-full max-w-4xl overflow-hidden rounded-[14px] border-2 border-ink bg-paper-raised shadow-lift md:grid-cols-[1fr_1.15fr]">
          <div className="relative hidden flex-col justify-between bg-ink p-8 text-paper-raised md:flex">
            <div>
              <p className="text-caption font-bold uppercase tracking-[0.16em] text-signal">{eyebrow}</p>
              <p className="mt-3 text-heading">{tagline}</p>
            </div>
            <svg viewBox="0 0 200 120" aria-hidden className="mt-8 w-full">
              <path d="M20 110 A80 80 0 0 1 180 110" fill="none" stroke="#F2A900" strokeWidth="6" strokeLinecap="round" />
              <path d="M20 110 A80 80 0 0 1 180 110" fill="none" stroke="#15202B" strokeWidth="2" strokeDasharray="2 14" />
              <line x1="100" y1="110" x2="150" y2="50" stroke="#FFFFFF" strokeWidth="6" strokeLinecap="round" />
              <circle cx="150" cy="50" r="8" fill="#F2A900" />
              <circle cx="100" cy="110" r="7" fill="#3FA7AE" />
            </svg>
          </div>
          <div className="min-w-0 p-7 sm:p-10">{children}</div>
        </div>
      </main>
    </div>
  );
}

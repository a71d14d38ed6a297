'use client';
import dynamic from 'next/dynamic';
import type { ReviewDeskProps } from './review-desk';

/** Konva needs the browser: the review desk loads on the client only. */
const ReviewDesk = dynamic(() => import('./review-desk').then((m) => m.ReviewDesk), {
  ssr: false,
  loading: () => (
    <div className="flex h-full items-center justify-center text-ink-soft" role="status">
      Opening the plan for review…
    </div>
  ),
});

export function ReviewLoader(props: ReviewDeskProps) {
  return <ReviewDesk {...props} />;
}

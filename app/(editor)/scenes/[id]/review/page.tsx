import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { getDb } from '@/db';
import { getCurrentUser } from '@/lib/auth/current-user';
import { idParams } from '@/lib/api/route';
import { isReviewer } from '@/lib/review/permissions';
import { reviewPageData } from '@/lib/server/review-page';
import { ReviewLoader } from '@/canvas/review/review-loader';

export const metadata: Metadata = { title: 'Review' };

/**
 * The review page: anyone who may read the scene sees the plan at its submitted revision, its results and
 * comments; supervisors and admins of the organisation (never on their own plan) approve or return it.
 */
export default async function ReviewPage({ params }: { params: Promise<{ id: string }> }) {
  const user = await getCurrentUser();
  const p = idParams.safeParse(await params);
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/scenes/${p.success ? p.data.id : ''}/review`)}`);
  if (!p.success) notFound();
  const data = await reviewPageData(getDb(), user, p.data.id);
  if (!data) notFound();
  const backTo = isReviewer(user.role) ? { href: '/review', label: 'Review queue' } : { href: `/scenes/${data.scene.id}`, label: 'Editor' };
  return <ReviewLoader {...data} units={user.units} backTo={backTo} />;
}

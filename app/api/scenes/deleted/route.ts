import { getDb } from '@/db';
import { listDeletedScenes } from '@/db/repositories/scene-actions';
import { route } from '@/lib/api/route';
import { rolesFor } from '@/lib/auth/permissions';
import { RESTORE_WINDOW_DAYS, daysLeftToRestore } from '@/lib/scene/retention';

export const runtime = 'nodejs';

/** The admins' "Recently deleted": scenes deleted within the restore window, most recent first. */
export const GET = route({ roles: rolesFor('restoreScene') }, async ({ user }) => {
  const items = await listDeletedScenes(getDb(), user);
  return { restoreWindowDays: RESTORE_WINDOW_DAYS, items: items.map((s) => ({ ...s, daysLeft: daysLeftToRestore(s.deletedAt) })) };
});

/** Days an admin can still restore a deleted scene (issue 12); after that it is gone for good. */
export const RESTORE_WINDOW_DAYS = 30;

const DAY_MS = 86_400_000;

/** The earliest deletion time that is still restorable at `now`, as an ISO string (timestamps are ISO text). */
export const restorableSince = (now: Date = new Date()): string => new Date(now.getTime() - RESTORE_WINDOW_DAYS * DAY_MS).toISOString();

/** Whole days left to restore a scene deleted at `deletedAt` (0 on its last day). */
export function daysLeftToRestore(deletedAt: string, now: Date = new Date()): number {
  const left = new Date(deletedAt).getTime() + RESTORE_WINDOW_DAYS * DAY_MS - now.getTime();
  return Math.max(0, Math.floor(left / DAY_MS));
}

/** A copy's default title: "Copy of …", cut to the title's 120-character limit. */
export const copyTitle = (title: string): string => `Copy of ${title}`.slice(0, 120);

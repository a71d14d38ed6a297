import type { PlanFigures } from './figures';

/**
 * The review queue's flags: what a supervisor should know about a submitted plan before opening it.
 * Pure: the submitted sketch, its stored figures, the truck profiles' current versions and the rigging
 * items whose inspection is out of date in; flags out. lib/server/review-queue reads them from the database.
 */
export const QUEUE_FLAGS = ['beyond-hard-limit', 'beyond-plan-limits', 'inspection-overdue', 'truck-changed', 'estimated-load'] as const;
export type QueueFlag = (typeof QUEUE_FLAGS)[number];

export const FLAG_WORDS: Record<QueueFlag, string> = {
  'beyond-hard-limit': 'Beyond a hard limit',
  'beyond-plan-limits': 'Beyond the plan’s own limits',
  'inspection-overdue': 'Rigging inspection out of date',
  'truck-changed': 'Truck profile changed since the sketch',
  'estimated-load': 'Load weight estimated, not weighed',
};

export interface QueueItem {
  sceneId: number;
  title: string;
  revision: number;
  ownerName: string;
  submittedAt: string;
  /** Minutes since submission, when the queue was read. */
  waitingMinutes: number;
  truck: string | null;
  figures: PlanFigures;
  flags: QueueFlag[];
}

type Pick = { itemId?: number | null; tag?: string };
type Obj = { kind?: string; profileId?: number; profileVersion?: number; massMode?: string; rigging?: Pick[] };

export interface FlagContext {
  /** Current version of each of the organisation's truck profiles, by id. */
  profileVersions: Map<number, number>;
  /** Rigging items whose next inspection is past due: their ids and their tags (a pick copied without an id). */
  overdueItems: { ids: Set<number>; tags: Set<string> };
  /** How the plan details say the load's weight is known, when they say. */
  weightSource?: string | null;
}

export function queueFlags(document: unknown, figures: PlanFigures, ctx: FlagContext): QueueFlag[] {
  const raw = document && typeof document === 'object' ? (document as { objects?: unknown }).objects : undefined;
  const objects = (Array.isArray(raw) ? raw : []) as Obj[];
  const truck = objects.find((o) => o?.kind === 'truck');
  const load = objects.find((o) => o?.kind === 'load');
  const flags: QueueFlag[] = [];
  if (figures.hardLimits?.length) flags.push('beyond-hard-limit');
  if (figures.beyondPlan?.length) flags.push('beyond-plan-limits');
  const picks = load?.rigging ?? [];
  if (picks.some((p) => (p.itemId != null && ctx.overdueItems.ids.has(p.itemId)) || (p.itemId == null && p.tag !== undefined && ctx.overdueItems.tags.has(p.tag)))) flags.push('inspection-overdue');
  const current = truck?.profileId !== undefined ? ctx.profileVersions.get(truck.profileId) : undefined;
  if (current !== undefined && truck?.profileVersion !== undefined && current !== truck.profileVersion) flags.push('truck-changed');
  // Weight worked out from dimensions and density, or the plan details saying it was estimated.
  if (load && (load.massMode === 'estimate' || ctx.weightSource === 'estimated')) flags.push('estimated-load');
  return flags;
}

export interface QueueFilter {
  flag: QueueFlag | null;
  operator: string | null;
  truck: string | null;
}

/** The queue narrowed by the page's filters; the order (oldest submission first) is kept. */
export const filterQueue = (items: QueueItem[], f: QueueFilter) =>
  items.filter((i) => (!f.flag || i.flags.includes(f.flag)) && (!f.operator || i.ownerName === f.operator) && (!f.truck || i.truck === f.truck));

export const minutesBetween = (iso: string, now: number) => Math.max(0, Math.floor((now - Date.parse(iso)) / 60_000));

/** How long a plan has waited, in words ("45 min", "3 h 10 min", "2 days"). */
export function waitedFor(min: number): string {
  if (min < 60) return `${min} min`;
  if (min < 60 * 24) return `${Math.floor(min / 60)} h ${min % 60} min`;
  const days = Math.floor(min / (60 * 24));
  return `${days} ${days === 1 ? 'day' : 'days'}`;
}

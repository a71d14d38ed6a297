import type { TruckProfileInput } from './from-spec';

/**
 * The editor may hold two entries for one profile: its current version and the older version a scene was
 * planned with (see ./load-profiles). These pick between them.
 */
export function currentProfile(profiles: readonly TruckProfileInput[], id: number): TruckProfileInput | undefined {
  let best: TruckProfileInput | undefined;
  for (const p of profiles) if (p.id === id && (!best || p.version > best.version)) best = p;
  return best;
}

/** One entry per profile, at its current version, in the order given. */
export function currentProfiles(profiles: readonly TruckProfileInput[]): TruckProfileInput[] {
  const seen = new Set<number>();
  const out: TruckProfileInput[] = [];
  for (const p of profiles) {
    if (seen.has(p.id)) continue;
    seen.add(p.id);
    out.push(currentProfile(profiles, p.id)!);
  }
  return out;
}

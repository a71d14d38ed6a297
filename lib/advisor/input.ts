import { z } from 'zod';
import { truckSpecSchema } from '@/lib/equipment/truck-spec-rules';
import { parseSceneDocument } from '@/lib/scene/parse';
import { point } from '@/lib/scene/primitives';
import { truckModelFromSpec } from '@/lib/scene/truck/from-spec';
import type { AdvisorSite } from './types';

/**
 * The advisor's file input (`npm run advise -- FILE.json`, README "Placement advisor"): a truck profile's
 * spec, a scene document (any version; it is migrated), and optionally the pick and set points and a
 * usable area that replace the scene's own.
 */
export const advisorFileSchema = z.object({
  truck: z.object({ name: z.string().max(120).default('truck'), spec: z.unknown() }),
  scene: z.unknown(),
  pick: point.optional(),
  set: point.optional(),
  usableArea: z.array(point).min(3).max(64).nullable().optional(),
});

export type AdvisorFileIssue = { path: string; message: string };

export function siteFromFile(raw: unknown): { ok: true; site: AdvisorSite } | { ok: false; issues: AdvisorFileIssue[] } {
  const file = advisorFileSchema.safeParse(raw);
  const issues = (prefix: string, list: readonly { path: readonly PropertyKey[]; message: string }[]) =>
    list.map((i) => ({ path: [prefix, ...i.path.map(String)].filter(Boolean).join('.'), message: i.message }));
  if (!file.success) return { ok: false, issues: issues('', file.error.issues) };
  const spec = truckSpecSchema.safeParse(file.data.truck.spec);
  if (!spec.success) return { ok: false, issues: issues('truck.spec', spec.error.issues) };
  const doc = parseSceneDocument(file.data.scene);
  if (!doc.ok) return { ok: false, issues: doc.issues.map((i) => ({ path: `scene.${i.path}`, message: i.message })) };
  const truck = doc.document.objects.find((o) => o.kind === 'truck');
  const profile = { id: truck?.kind === 'truck' ? truck.profileId : 1, version: truck?.kind === 'truck' ? truck.profileVersion : 1, name: file.data.truck.name, unitNumber: null, spec: spec.data };
  return {
    ok: true,
    site: {
      document: doc.document,
      model: truckModelFromSpec(profile, spec.data),
      ...(file.data.pick ? { pick: file.data.pick } : {}),
      ...(file.data.set ? { set: file.data.set } : {}),
      ...(file.data.usableArea !== undefined ? { usableArea: file.data.usableArea } : {}),
    },
  };
}

import type { Metadata } from 'next';
import { notFound, redirect } from 'next/navigation';
import { z } from 'zod';
import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { getLesson } from '@/db/repositories/lessons';
import { getCurrentUser } from '@/lib/auth/current-user';
import { may } from '@/lib/auth/permissions';
import { idParams } from '@/lib/api/route';
import { pathId } from '@/lib/validations/path-id';
import { listRevisionSummaries } from '@/lib/server/scene-revisions';
import { parseSceneDocument } from '@/lib/scene/parse';
import { loadSceneProfiles } from '@/lib/server/load-profiles';
import { ReplayLoader } from '@/canvas/replay/replay-loader';
import type { SceneDocument } from '@/lib/scene/schema';

export const metadata: Metadata = { title: 'Replay' };

const search = z.object({
  revision: pathId('revision').optional().catch(undefined),
  compare: pathId('compare').optional().catch(undefined),
  present: z.literal('1').optional().catch(undefined),
  lesson: pathId('lesson').optional().catch(undefined),
  step: z.coerce.number().int().min(0).max(100).optional().catch(undefined),
});

type Props = { params: Promise<{ id: string }>; searchParams: Promise<Record<string, string | string[] | undefined>> };

/** The replay room: any role that may read the scene. Loads and authorises on the server. */
export default async function ReplayPage({ params, searchParams }: Props) {
  const user = await getCurrentUser();
  const p = idParams.safeParse(await params);
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/scenes/${p.success ? p.data.id : ''}/replay`)}`);
  if (!p.success) notFound();
  const q = search.parse(await searchParams);
  const db = getDb();
  const scene = await getScene(db, user, p.data.id);
  if (!scene) notFound();
  const revision = q.revision ?? scene.revision;
  const docOf = async (rev: number): Promise<SceneDocument | null> => {
    const row = await db.selectFrom('scene_revisions').select('document').where('scene_id', '=', scene.id).where('revision', '=', rev).executeTakeFirst();
    if (!row) return null;
    const parsed = parseSceneDocument(row.document);
    return parsed.ok ? parsed.document : null;
  };
  const document = await docOf(revision);
  if (!document) notFound();
  const compareDoc = q.compare && q.compare !== revision ? await docOf(q.compare) : null;
  const profiles = await loadSceneProfiles(db, user.organisationId, document, scene.equipmentProfileId);
  if (compareDoc) {
    for (const pr of await loadSceneProfiles(db, user.organisationId, compareDoc, scene.equipmentProfileId)) {
      if (!profiles.some((x) => x.id === pr.id && x.version === pr.version)) profiles.push(pr);
    }
  }
  const revisions = (await listRevisionSummaries(db, user, scene.id)) ?? [];
  const lesson = q.lesson ? await getLesson(db, user, q.lesson) : undefined;
  return (
    <ReplayLoader
      scene={{ id: scene.id, title: scene.title, status: scene.status, latest: scene.revision, inTrainingSet: scene.inTrainingSet }}
      revision={revision}
      document={document}
      compare={compareDoc ? { revision: q.compare!, document: compareDoc } : null}
      profiles={profiles}
      revisions={revisions}
      present={q.present === '1'}
      units={user.units}
      canSaveTraining={may(user, 'writeLessons')}
      lesson={lesson ? { id: lesson.id, title: lesson.title, steps: lesson.steps, step: Math.min(q.step ?? 0, lesson.steps.length - 1) } : null}
    />
  );
}

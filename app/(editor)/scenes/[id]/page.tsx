import { notFound, redirect } from 'next/navigation';
import type { Metadata } from 'next';
import { getDb } from '@/db';
import { getScene } from '@/db/repositories/scenes';
import { getCurrentUser } from '@/lib/auth/current-user';
import { parseSceneDocument } from '@/lib/scene/parse';
import { SceneEditorLoader } from '@/canvas/scene-editor-loader';
import type { TruckProfileInput } from '@/lib/scene/truck/from-spec';
import { loadSceneProfiles } from '@/lib/server/load-profiles';
import { mayEditScene } from '@/lib/auth/permissions';
import { isEditable } from '@/lib/review/lifecycle';
import { editorReviewData } from '@/lib/server/editor-review';

export const metadata: Metadata = { title: 'Scene editor' };

/** Loads and authorises on the server: signed in, the scene in the user's organisation, else 404. */
export default async function SceneEditorPage({ params }: { params: Promise<{ id: string }> }) {
  const { id: raw } = await params;
  const user = await getCurrentUser();
  if (!user) redirect(`/sign-in?callbackUrl=${encodeURIComponent(`/scenes/${raw}`)}`);
  const id = Number(raw);
  if (!Number.isInteger(id) || id <= 0) notFound();
  const db = getDb();
  const scene = await getScene(db, user, id);
  if (!scene) notFound();
  const parsed = parseSceneDocument(scene.document);
  if (!parsed.ok) {
    return (
      <main className="mx-auto max-w-xl p-8">
        <h1 className="text-xl font-semibold">This scene’s sketch cannot be opened</h1>
        <p className="mt-2 text-ink-soft">The saved document does not match the editor’s format:</p>
        <ul className="mt-3 list-disc pl-6 text-sm">
          {parsed.issues.slice(0, 8).map((i) => (
            <li key={i.path + i.message}>
              <code>{i.path || 'document'}</code>: {i.message}
            </li>
          ))}
        </ul>
      </main>
    );
  }
  const profiles: TruckProfileInput[] = await loadSceneProfiles(db, user.organisationId, parsed.document, scene.equipmentProfileId);
  // Only the owning operator edits, and only a draft or returned plan (a submitted or approved one is frozen).
  const readOnly = !mayEditScene(user, scene) || !isEditable(scene.status);
  return (
    <SceneEditorLoader
      scene={{ id: scene.id, title: scene.title, status: scene.status, revision: scene.revision, ownerName: scene.ownerName, updatedAt: scene.updatedAt }}
      document={parsed.document}
      profiles={profiles}
      readOnly={readOnly}
      units={user.units}
      user={{ name: user.name, role: user.role }}
      review={await editorReviewData(db, user, scene)}
    />
  );
}

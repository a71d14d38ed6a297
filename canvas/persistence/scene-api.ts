/** Client calls to the scenes API, over an injectable fetch so the saving logic can be tested without a server. */

export type Fetch = (input: string, init?: RequestInit) => Promise<Response>;

export interface SavedScene {
  id: number;
  title: string;
  revision: number;
  updatedAt: string;
  document: Record<string, unknown>;
}

export type PutOutcome =
  | { kind: 'saved'; revision: number; savedAt: string }
  | { kind: 'conflict'; currentRevision: number | null; message: string }
  /** The request never reached the server (no connection, DNS, reset). */
  | { kind: 'network' }
  | { kind: 'refused'; status: number; message: string };

async function errorMessage(res: Response): Promise<string> {
  try {
    const body = (await res.json()) as { error?: string };
    return body.error ?? `The server answered ${res.status}`;
  } catch {
    return `The server answered ${res.status}`;
  }
}

export async function putSceneDocument(fetchFn: Fetch, sceneId: number, revision: number, document: unknown): Promise<PutOutcome> {
  let res: Response;
  try {
    res = await fetchFn(`/api/scenes/${sceneId}`, {
      method: 'PUT',
      headers: { 'Content-Type': 'application/json' },
      body: JSON.stringify({ revision, document }),
    });
  } catch {
    return { kind: 'network' };
  }
  if (res.ok) {
    // A save answers only what changed: the new revision and when it was saved.
    const saved = (await res.json()) as { revision: number; savedAt: string };
    return { kind: 'saved', revision: saved.revision, savedAt: saved.savedAt };
  }
  if (res.status === 409) {
    const body = (await res.json().catch(() => ({}))) as { error?: string; currentRevision?: number };
    return { kind: 'conflict', currentRevision: body.currentRevision ?? null, message: body.error ?? 'Someone else saved this scene first' };
  }
  return { kind: 'refused', status: res.status, message: await errorMessage(res) };
}

export async function getScene(fetchFn: Fetch, sceneId: number): Promise<SavedScene> {
  const res = await fetchFn(`/api/scenes/${sceneId}`, { headers: { Accept: 'application/json' } });
  if (!res.ok) throw new Error(await errorMessage(res));
  return (await res.json()) as SavedScene;
}

/** The truck profile a scene document's truck is drawn from; null when the sketch has no truck. */
export function truckProfileIdOf(document: unknown): number | null {
  const objects = document && typeof document === 'object' ? (document as { objects?: unknown }).objects : undefined;
  if (!Array.isArray(objects)) return null;
  const truck = objects.find((o): o is { kind: 'truck'; profileId?: unknown } => !!o && typeof o === 'object' && (o as { kind?: unknown }).kind === 'truck');
  const id = truck?.profileId;
  return typeof id === 'number' && Number.isInteger(id) && id > 0 ? id : null;
}

async function refusesProfile(res: Response): Promise<boolean> {
  if (res.status !== 400) return false;
  const body = (await res.clone().json().catch(() => null)) as { issues?: { path?: unknown }[] } | null;
  return !!body?.issues?.some((i) => i.path === 'equipmentProfileId');
}

/**
 * POST /api/scenes: a new scene owned by the signed-in operator. A sketch with a truck records the truck's
 * profile on the scene, like the scene it was copied from. When the server will not take that profile (a
 * file from another organisation, a truck retired since), the scene is made without it rather than not at
 * all: the truck stays in the sketch.
 */
export async function createScene(fetchFn: Fetch, title: string, document: unknown): Promise<SavedScene> {
  const post = (body: Record<string, unknown>) => fetchFn('/api/scenes', { method: 'POST', headers: { 'Content-Type': 'application/json' }, body: JSON.stringify(body) });
  const equipmentProfileId = truckProfileIdOf(document);
  let res = await post(equipmentProfileId === null ? { title, document } : { title, document, equipmentProfileId });
  if (equipmentProfileId !== null && (await refusesProfile(res))) res = await post({ title, document });
  if (!res.ok) throw new Error(await errorMessage(res));
  return (await res.json()) as SavedScene;
}

/** "<title> (my copy)", shortened so it stays within the 120-character title limit. */
export function copyTitle(title: string): string {
  const suffix = ' (my copy)';
  const base = title.trim().slice(0, 120 - suffix.length).trimEnd();
  return `${base}${suffix}`;
}

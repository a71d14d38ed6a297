import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { PUT } from '@/app/api/scenes/[id]/training/route';
import { getDb } from '@/db';

const put = (id: number | string, body: unknown) =>
  PUT(new Request(`http://t/api/scenes/${id}/training`, { method: 'PUT', body: JSON.stringify(body), headers: { 'content-type': 'application/json' } }), { params: Promise.resolve({ id: String(id) }) });

async function sceneId(title: string) {
  return (await getDb().selectFrom('scenes').select('id').where('title', '=', title).executeTakeFirstOrThrow()).id;
}
const flag = async (id: number) => (await getDb().selectFrom('scenes').select('in_training_set').where('id', '=', id).executeTakeFirstOrThrow()).in_training_set;

beforeAll(async () => {
  await freshSeededDb();
});

describe('PUT /api/scenes/[id]/training', () => {
  it('lets a trainer add a scene to the training set without a new revision', async () => {
    const id = await sceneId('Coil transfer, Route 9 weigh station');
    signInAs(await demoUser('trainer@harrow.example'));
    const res = await put(id, { inTrainingSet: true });
    expect(res.status).toBe(200);
    const scene = await res.json();
    expect(scene.inTrainingSet).toBe(true);
    expect(scene.revision).toBe(1);
    expect(await flag(id)).toBe(1);
  });

  it('refuses an operator (403) and another organisation’s trainer sees 404, leaving the flag alone', async () => {
    const id = await sceneId('Box truck up the embankment, Quarry Road');
    signInAs(await demoUser('operator@harrow.example'));
    expect((await put(id, { inTrainingSet: true })).status).toBe(403);
    signInAs(await demoUser('trainer@harrow.example'));
    expect((await put(id, { inTrainingSet: true })).status).toBe(404);
    expect(await flag(id)).toBe(0);
  });

  it('names the field when the body is wrong', async () => {
    const id = await sceneId('Coil transfer, Route 9 weigh station');
    signInAs(await demoUser('trainer@harrow.example'));
    const res = await put(id, { inTrainingSet: 'yes' });
    expect(res.status).toBe(400);
    expect((await res.json()).issues[0].path).toBe('inTrainingSet');
  });
});

import { beforeAll, describe, expect, it, vi } from 'vitest';
vi.mock('@/lib/auth/current-user', () => import('@/tests/setup/auth-mock'));
import { signInAs } from '@/tests/setup/auth-mock';
import { demoUser, freshSeededDb } from '@/tests/setup/db';
import { call } from '@/tests/setup/call';
import { GET as list, POST as create } from '@/app/api/lessons/route';
import { DELETE as remove, GET as getOne, PUT as update } from '@/app/api/lessons/[id]/route';
import { getDb } from '@/db';
import { createUser, findUserById } from '@/db/repositories/users';
import type { CurrentUser } from '@/lib/auth/current-user';

let reefer = 0;
let coil = 0;
const sceneId = async (title: string) => (await getDb().selectFrom('scenes').select('id').where('title', '=', title).executeTakeFirstOrThrow()).id;

beforeAll(async () => {
  await freshSeededDb();
  reefer = await sceneId('Overturned reefer trailer, Mill Creek on-ramp');
  coil = await sceneId('Coil transfer, Route 9 weigh station');
  await getDb().updateTable('scenes').set({ in_training_set: 1 }).where('id', '=', coil).execute();
});

const twoSteps = () => ({
  title: 'Reading the rear tipping line',
  steps: [
    { sceneId: reefer, revision: 1, notes: 'Start from the pick.', question: 'Which pad governs at 180°?', answer: 'The rear left pad' },
    { sceneId: coil, revision: 1, notes: 'Compare with the coil transfer.' },
  ],
});

describe('lessons: create, read, replace, delete', () => {
  it('a trainer creates a two-step lesson (201) that everyone in the organisation reads, in order', async () => {
    signInAs(await demoUser('trainer@harrow.example'));
    const res = await call({ handler: create, method: 'POST', body: twoSteps() });
    expect(res.status).toBe(201);
    const id = res.json.id as number;
    expect(id).toBeGreaterThan(0);
    signInAs(await demoUser('operator@harrow.example'));
    const got = await call({ handler: getOne, method: 'GET', id: String(id) });
    expect(got.status).toBe(200);
    expect(got.json.title).toBe('Reading the rear tipping line');
    expect(got.json.authorName).toBe('Priya Lindqvist');
    expect(got.json.steps).toEqual([
      { position: 0, sceneId: reefer, revision: 1, sceneTitle: 'Overturned reefer trailer, Mill Creek on-ramp', notes: 'Start from the pick.', question: 'Which pad governs at 180°?', answer: 'The rear left pad' },
      { position: 1, sceneId: coil, revision: 1, sceneTitle: 'Coil transfer, Route 9 weigh station', notes: 'Compare with the coil transfer.', question: null, answer: null },
    ]);
    const items = (await call({ handler: list, method: 'GET' })).json.items as { id: number; stepCount: number }[];
    expect(items.find((l) => l.id === id)?.stepCount).toBe(2);
  });

  it('hides the title of a step scene the reader may not open', async () => {
    signInAs(await demoUser('admin@harrow.example'));
    const { id } = (await call({ handler: create, method: 'POST', body: twoSteps() })).json as { id: number };
    const admin = await demoUser('admin@harrow.example');
    const row = await createUser(getDb(), { organisation_id: admin.organisationId, email: 'new.op@harrow.example', name: 'New Operator', role: 'operator', password_hash: 'unused' });
    const u = (await findUserById(getDb(), row.id))!;
    const other: CurrentUser = { id: u.id, organisationId: u.organisation_id, organisationName: u.organisation_name, role: u.role, name: u.name, email: u.email, units: u.units };
    signInAs(other);
    const steps = (await call({ handler: getOne, method: 'GET', id: String(id) })).json.steps as { sceneTitle: string | null }[];
    // The coil transfer is another operator's draft; the reefer scene is approved.
    expect(steps.map((s) => s.sceneTitle)).toEqual(['Overturned reefer trailer, Mill Creek on-ramp', null]);
  });

  it('PUT replaces title and steps; DELETE removes the lesson (then 404)', async () => {
    signInAs(await demoUser('trainer@harrow.example'));
    const { id } = (await call({ handler: create, method: 'POST', body: twoSteps() })).json as { id: number };
    const body = { title: 'Coil first', steps: [twoSteps().steps[1], twoSteps().steps[0], { sceneId: reefer, revision: 1, notes: 'Once more, at 2×.' }] };
    const res = await call({ handler: update, method: 'PUT', id: String(id), body });
    expect(res.status).toBe(200);
    expect((res.json.steps as { sceneId: number; notes: string }[]).map((s) => [s.sceneId, s.notes])).toEqual([
      [coil, 'Compare with the coil transfer.'],
      [reefer, 'Start from the pick.'],
      [reefer, 'Once more, at 2×.'],
    ]);
    expect((await call({ handler: remove, method: 'DELETE', id: String(id) })).status).toBe(200);
    expect((await call({ handler: getOne, method: 'GET', id: String(id) })).status).toBe(404);
    expect(await getDb().selectFrom('lesson_steps').select('id').where('lesson_id', '=', id).execute()).toEqual([]);
  });
});

describe('lessons: bad input names the field', () => {
  const post = async (body: unknown) => {
    signInAs(await demoUser('trainer@harrow.example'));
    return call({ handler: create, method: 'POST', body });
  };
  it('refuses a scene outside the training set, a revision never saved, an unknown scene', async () => {
    const cobalt = await sceneId('Box truck up the embankment, Quarry Road');
    await getDb().updateTable('scenes').set({ in_training_set: 0 }).where('id', '=', coil).execute();
    const res = await post({ title: 'Bad steps', steps: [{ sceneId: coil, revision: 1 }, { sceneId: reefer, revision: 9 }, { sceneId: cobalt, revision: 1 }] });
    await getDb().updateTable('scenes').set({ in_training_set: 1 }).where('id', '=', coil).execute();
    expect(res.status).toBe(400);
    expect(res.json.issues).toEqual([
      { path: 'steps.0.sceneId', message: `Scene ${coil} is not in the training set` },
      { path: 'steps.1.revision', message: `Scene ${reefer} has no saved revision 9` },
      { path: 'steps.2.sceneId', message: `No scene ${cobalt} in your organisation` },
    ]);
  });
  it('refuses an empty step list, an answer without a question and unknown fields', async () => {
    expect((await post({ title: 'No steps', steps: [] })).json.issues).toEqual([{ path: 'steps', message: 'A lesson needs at least one step' }]);
    expect((await post({ title: 'Answer only', steps: [{ sceneId: reefer, revision: 1, answer: 'Yes' }] })).json.issues).toEqual([{ path: 'steps.0.answer', message: 'An answer needs a question' }]);
    expect((await post({ title: 'Extra', steps: [{ sceneId: reefer, revision: 1 }], colour: 'red' })).json.issues).toEqual([{ path: 'colour', message: 'Unknown field' }]);
    expect((await post({ title: 'x', steps: [{ sceneId: reefer, revision: 1 }] })).json.issues).toEqual([{ path: 'title', message: 'Title needs at least 3 characters' }]);
  });
  it('an operator or supervisor may not write (403); another organisation gets 404', async () => {
    signInAs(await demoUser('supervisor@harrow.example'));
    expect((await call({ handler: create, method: 'POST', body: twoSteps() })).status).toBe(403);
    signInAs(await demoUser('trainer@harrow.example'));
    const { id } = (await call({ handler: create, method: 'POST', body: twoSteps() })).json as { id: number };
    signInAs(await demoUser('operator@cobalt.example'));
    expect((await call({ handler: getOne, method: 'GET', id: String(id) })).status).toBe(404);
    expect(((await call({ handler: list, method: 'GET' })).json.items as unknown[]).length).toBe(0);
  });
});

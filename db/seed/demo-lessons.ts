import type { Kysely } from 'kysely';
import type { Database } from '../schema';

const REEFER = 'Overturned reefer trailer, Mill Creek on-ramp';

/** An invented three-step lesson on the reefer plan's revisions (the training set's scene). */
export async function seedDemoLessons(trx: Kysely<Database>, orgIds: Map<string, number>, userIds: Map<string, number>, sceneIds: Map<string, number>) {
  const reefer = sceneIds.get(REEFER);
  const trainer = userIds.get('trainer@harrow.example');
  if (!reefer || !trainer) return;
  const lesson = await trx
    .insertInto('lessons')
    .values({ organisation_id: orgIds.get('harrow-ridge')!, author_id: trainer, title: 'Short legs on a ramp shoulder: how the reefer plan changed' })
    .returning('id')
    .executeTakeFirstOrThrow();
  const steps = [
    { revision: 1, notes: 'First draft: the right-hand outriggers only 0.6 m out. Play the swing once at 1×.', question: 'Where in the swing is the truck nearest to tipping, and about which line?', answer: 'Press W: the worst angle and its governing line are shown.' },
    { revision: 2, notes: 'The right-hand outriggers moved out to 1.1 m. Compare with revision 1: the faint plan is the earlier one.', question: 'Which pad carries the most now?', answer: 'Read the pad bars at the worst case.' },
    { revision: 3, notes: 'Re-rigged on the red sling pair at 55°: the approved plan. Walk the class through the clearances.', question: null, answer: null },
  ];
  await trx
    .insertInto('lesson_steps')
    .values(steps.map((s, position) => ({ lesson_id: lesson.id, position, scene_id: reefer, revision: s.revision, notes: s.notes, question: s.question, answer: s.answer })))
    .execute();
}

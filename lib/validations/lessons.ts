import { z } from 'zod';

/** Most steps one lesson holds: a class period, not a course. */
export const MAX_LESSON_STEPS = 40;

const text = (field: string, max: number) => z.string({ error: `${field} must be text` }).trim().max(max, `${field} can be at most ${max} characters`);

export const lessonStepSchema = z
  .object({
    sceneId: z.number({ error: 'sceneId is required: a scene from the training set' }).int().positive('sceneId must be a positive whole number'),
    revision: z.number({ error: 'revision is required: the scene revision this step shows' }).int().positive('revision must be a positive whole number'),
    notes: text('notes', 4000).default(''),
    question: text('question', 1000).optional(),
    answer: text('answer', 2000).optional(),
  })
  .strict()
  .refine((s) => !s.answer || !!s.question, { message: 'An answer needs a question', path: ['answer'] });

export const lessonSchema = z
  .object({
    title: z.string({ error: 'title is required' }).trim().min(3, 'Title needs at least 3 characters').max(120, 'Title can be at most 120 characters'),
    steps: z.array(lessonStepSchema, { error: 'steps must be a list' }).min(1, 'A lesson needs at least one step').max(MAX_LESSON_STEPS, `A lesson can have at most ${MAX_LESSON_STEPS} steps`),
  })
  .strict();

export type LessonInput = z.infer<typeof lessonSchema>;
export type LessonStepInput = z.infer<typeof lessonStepSchema>;

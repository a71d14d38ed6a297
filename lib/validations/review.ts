import { z } from 'zod';

/** Longest comment, note, condition or reason accepted (issue 13: comments up to 4,000 characters). */
export const MAX_TEXT = 4000;
const text = (field: string) => z.string({ error: `${field} must be text` }).max(MAX_TEXT, `${field} can be at most ${MAX_TEXT} characters`);
const revision = z.number({ error: 'revision is required: the revision you are looking at' }).int().positive();

export const submitSchema = z.strictObject({ revision });

export const decisionSchema = z.strictObject({
  decision: z.enum(['approve', 'return'], { error: 'decision must be "approve" or "return"' }),
  revision,
  note: text('note').optional(),
  conditions: text('conditions').optional(),
  reason: text('reason').optional(),
});

const finite = z.number().finite();
export const commentAnchorSchema = z.union([z.strictObject({ x: finite, y: finite }), z.strictObject({ objectId: z.string().min(1).max(200) })]);

export const newCommentSchema = z.strictObject({
  body: text('body').refine((s) => s.trim().length > 0, 'body must not be empty'),
  anchor: commentAnchorSchema.optional(),
  parentId: z.number().int().positive().optional(),
});

export const commentPatchSchema = z.strictObject({ resolved: z.boolean({ error: 'resolved must be true or false' }) });

export const markReadSchema = z.strictObject({ ids: z.array(z.number().int().positive()).max(500) });

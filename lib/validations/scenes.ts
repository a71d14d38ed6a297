import { z } from 'zod';
import { SCENE_STATUSES } from '@/lib/domain';
import { storedSceneDocumentSchema } from '@/lib/scene/parse';

/** Largest scene document accepted, as serialised JSON. */
export const MAX_DOCUMENT_CHARS = 1_500_000;

export const sceneTitle = z
  .string({ error: 'Title is required' })
  .trim()
  .min(3, 'Title needs at least 3 characters')
  .max(120, 'Title can be at most 120 characters');

/**
 * The scene document: the versioned schema of the scene model (lib/scene), shared by client and server.
 * Older versions are migrated before validation; error paths name the field ("document.objects.2.height").
 */
export const sceneDocument = z
  .unknown()
  .refine((d) => d !== null && typeof d === 'object' && !Array.isArray(d), 'Document must be a JSON object')
  .refine((d) => typeof d !== 'object' || JSON.stringify(d).length <= MAX_DOCUMENT_CHARS, 'Document is larger than 1.5 MB')
  .pipe(storedSceneDocumentSchema);

export const sceneStatus = z.enum(SCENE_STATUSES);

/** Where the job is (searchable in the list), and free notes. */
export const sceneLocation = z.string().trim().max(200, 'Location can be at most 200 characters').nullable();
export const sceneNotes = z.string().max(4000, 'Notes can be at most 4,000 characters').nullable();

export const createSceneSchema = z.object({
  title: sceneTitle,
  location: sceneLocation.optional(),
  notes: sceneNotes.optional(),
  document: sceneDocument.optional(),
  equipmentProfileId: z.number().int().positive().nullable().optional(),
});
export type CreateSceneInput = z.infer<typeof createSceneSchema>;

export const updateSceneSchema = z
  .object({
    revision: z.number({ error: 'revision is required: the revision this save is based on' }).int().positive(),
    title: sceneTitle.optional(),
    location: sceneLocation.optional(),
    notes: sceneNotes.optional(),
    document: sceneDocument.optional(),
    equipmentProfileId: z.number().int().positive().nullable().optional(),
  })
  .strict();
export type UpdateSceneInput = z.infer<typeof updateSceneSchema>;

const cursor = z.string().max(400).regex(/^[A-Za-z0-9_-]+$/, 'Not a cursor this list gave out');

/** The list's query: keyset cursors (after / before), never a page number, so a shared URL names a stable page. */
export const listScenesQuery = z
  .object({
    pageSize: z.coerce.number().int().min(1).max(100).default(20),
    q: z.string().trim().max(120).optional(),
    /** Kept for links made before search covered location and notes; means the same as q. */
    title: z.string().trim().max(120).optional(),
    status: sceneStatus.optional(),
    training: z.enum(['1', '0']).optional(),
    sort: z.enum(['updatedAt', 'title', 'status', 'ownerName', 'revision']).default('updatedAt'),
    dir: z.enum(['asc', 'desc']).default('desc'),
    after: cursor.optional(),
    before: cursor.optional(),
  })
  .strict()
  .refine((v) => !(v.after && v.before), { path: ['before'], message: 'Give after or before, not both' });
export type ListScenesQuery = z.infer<typeof listScenesQuery>;
export const SCENE_SORT_KEYS = ['updatedAt', 'title', 'status', 'ownerName', 'revision'] as const;

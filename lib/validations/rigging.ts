import { z } from 'zod';
import { RANGE } from '@/lib/lift/range';
import { RIGGING_KINDS, RIGGING_STATUSES, type RiggingKind, type RiggingStatus } from '@/lib/domain';

/** A calendar date, YYYY-MM-DD, that exists. */
export const isoDate = (label: string) =>
  z
    .string({ error: `${label} must be a date (YYYY-MM-DD)` })
    .regex(/^\d{4}-\d{2}-\d{2}$/, `${label} must be a date written YYYY-MM-DD`)
    .refine((d) => {
      const t = new Date(`${d}T00:00:00Z`);
      return !Number.isNaN(t.getTime()) && t.toISOString().slice(0, 10) === d;
    }, `${label} is not a real calendar date`);

/** Physical ranges (issue 11): the lift engine's own (lib/lift/schema RANGE), so 1e300 is refused with the range named. */
const rating = (label: string) =>
  z
    .number({ error: `${label} rating must be a number (kg)` })
    .refine((v) => v > 0 && v <= RANGE.mass, `${label} rating must be more than 0 and at most ${RANGE.mass.toLocaleString('en-US')} kg`)
    .nullable();

export const riggingKind = z.enum(RIGGING_KINDS as [RiggingKind, ...RiggingKind[]], { error: `Kind must be one of: ${RIGGING_KINDS.join(', ')}` });
export const riggingStatus = z.enum(RIGGING_STATUSES as [RiggingStatus, ...RiggingStatus[]], { error: `Status must be one of: ${RIGGING_STATUSES.join(', ')}` });

export const riggingItemSchema = z
  .object({
    tag: z.string({ error: 'Tag is required' }).trim().min(1, 'Tag is required').max(40, 'Tag can be at most 40 characters'),
    kind: riggingKind,
    size: z.string().trim().max(60, 'Size can be at most 60 characters').default(''),
    /** metres */
    length: z.number({ error: 'Length must be a number (m)' }).refine((v) => v > 0 && v <= RANGE.length, `Length must be more than 0 and at most ${RANGE.length} m`).nullable().default(null),
    /** kg per hitch; all null → filled from a standard table where one applies. */
    ratings: z
      .object({ vertical: rating('Vertical'), choker: rating('Choker'), basket: rating('Basket') })
      .default({ vertical: null, choker: null, basket: null }),
    status: riggingStatus.default('in_service'),
    lastInspection: isoDate('Last inspection').nullable().default(null),
    nextInspectionDue: isoDate('Next inspection due').nullable().default(null),
    notes: z.string().max(500, 'Notes can be at most 500 characters').default(''),
  })
  .superRefine((v, ctx) => {
    if (v.lastInspection && v.nextInspectionDue && v.nextInspectionDue < v.lastInspection) {
      ctx.addIssue({ code: 'custom', path: ['nextInspectionDue'], message: `Next inspection due (${v.nextInspectionDue}) is before the last inspection (${v.lastInspection})` });
    }
  });
export type RiggingItemInput = z.input<typeof riggingItemSchema>;
export type RiggingItemData = z.output<typeof riggingItemSchema>;

export const riggingListQuery = z.object({
  kind: riggingKind.optional(),
  status: riggingStatus.optional(),
  due: z.enum(['overdue', 'due-30', 'ok', 'none'], { error: 'due must be overdue, due-30, ok or none' }).optional(),
});

export const inspectionSchema = z.object({
  inspectedOn: isoDate('Inspection date'),
  result: z.enum(['pass', 'fail'], { error: 'Result must be pass or fail' }),
  nextDue: isoDate('Next inspection due').nullable().default(null),
  notes: z.string().max(500, 'Notes can be at most 500 characters').default(''),
});

export const importSchema = z.object({
  csv: z.string({ error: 'csv is required: the file contents as text' }).min(1, 'The CSV is empty').max(1_000_000, 'The CSV is larger than 1 MB'),
});

import { z } from 'zod';

/**
 * The plan details: what a lift plan needs that the sketch does not hold (the job, how the load's weight is
 * known, the people, communication, site control, weather, hazards, contingency, the emergency action plan
 * and a pre-lift checklist). The headings follow what ASME P30.1 asks a plan to address, in our own words.
 * Pure: shared by the form (zodResolver), the route and the PDF. Every text has a length limit, so no field
 * can grow a document without bound.
 */
export const DETAIL_LIMITS = { name: 80, short: 120, medium: 500, long: 2000, hazards: 20, checklist: 30 } as const;

const text = (max: number) => z.string().trim().max(max, `At most ${max} characters`).default('');

export const WEIGHT_SOURCES = ['unknown', 'weighed', 'manifest', 'estimated'] as const;
export type WeightSource = (typeof WEIGHT_SOURCES)[number];
export const WEIGHT_SOURCE_WORDS: Record<WeightSource, string> = {
  unknown: 'Not stated',
  weighed: 'Weighed',
  manifest: 'From the manifest or bill of lading',
  estimated: 'Estimated from dimensions',
};

/** A local date and time as typed in the form ("2026-12-02T14:30"), or empty. */
const localDateTime = z
  .string()
  .trim()
  .max(16)
  .refine((s) => s === '' || /^\d{4}-\d{2}-\d{2}(T\d{2}:\d{2})?$/.test(s), 'Use a date like 2026-12-02 and a time like 14:30')
  .default('');

export const hazardSchema = z.object({ hazard: text(DETAIL_LIMITS.medium), control: text(DETAIL_LIMITS.medium) });
export const checklistItemSchema = z.object({ item: text(DETAIL_LIMITS.short * 2), done: z.boolean().default(false) });

export const planDetailsSchema = z
  .object({
    job: z
      .object({
        customer: text(DETAIL_LIMITS.short),
        reference: text(DETAIL_LIMITS.name),
        location: text(DETAIL_LIMITS.medium),
        when: localDateTime,
      })
      .strict()
      .prefault({}),
    load: z
      .object({
        description: text(DETAIL_LIMITS.medium),
        weightSource: z.enum(WEIGHT_SOURCES).default('unknown'),
        /** The figures behind the weight: the ticket, the manifest line, the dimensions used. */
        weightBasis: text(DETAIL_LIMITS.medium),
      })
      .strict()
      .prefault({}),
    people: z
      .object({
        liftDirector: text(DETAIL_LIMITS.name),
        operator: text(DETAIL_LIMITS.name),
        spotter: text(DETAIL_LIMITS.name),
        signalPerson: text(DETAIL_LIMITS.name),
      })
      .strict()
      .prefault({}),
    communication: z
      .object({
        handSignals: z.boolean().default(true),
        radioChannel: text(DETAIL_LIMITS.name),
        notes: text(DETAIL_LIMITS.medium),
      })
      .strict()
      .prefault({}),
    siteControl: z
      .object({
        traffic: text(DETAIL_LIMITS.medium),
        laneClosed: text(DETAIL_LIMITS.short),
        policeOnScene: z.boolean().default(false),
      })
      .strict()
      .prefault({}),
    weather: z
      .object({
        conditions: text(DETAIL_LIMITS.medium),
        /** Wind speed above which the lift stops, m/s (SI inside; the form and the PDF show the viewer's units). */
        windLimit: z.number().min(0, 'Wind limit cannot be negative').max(60, 'Wind limit is at most 60 m/s (134 mph)').nullable().default(null),
      })
      .strict()
      .prefault({}),
    hazards: z.array(hazardSchema).max(DETAIL_LIMITS.hazards, `At most ${DETAIL_LIMITS.hazards} hazards`).default([]),
    contingency: text(DETAIL_LIMITS.long),
    emergencyPlan: text(DETAIL_LIMITS.long),
    checklist: z.array(checklistItemSchema).max(DETAIL_LIMITS.checklist, `At most ${DETAIL_LIMITS.checklist} checklist items`).default([]),
  })
  .strict();

export type PlanDetails = z.output<typeof planDetailsSchema>;
export type PlanDetailsIn = z.input<typeof planDetailsSchema>;

/** The pre-lift checks a new plan starts with (common practice, no published source); the crew edits them. */
export const STARTER_CHECKLIST: readonly string[] = [
  'Ground under each pad inspected; cribbing set level and square',
  'Outriggers set as planned; every wheel clear where the plan lifts on outriggers',
  'Rigging inspected and tagged; hitches and angles as planned',
  'Swing path walked; obstacles and power lines marked',
  'Traffic control in place; crew briefed on signals and stop command',
  'Load weight confirmed against the plan',
];

/** Empty details, with the starter checklist: what a scene has before anyone fills the form in. */
export function emptyPlanDetails(): PlanDetails {
  return planDetailsSchema.parse({ checklist: STARTER_CHECKLIST.map((item) => ({ item, done: false })) });
}

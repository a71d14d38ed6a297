import { z } from 'zod';
import { ROLES } from '@/lib/domain';
import { PASSWORD_MAX_CHARS, passwordSchema } from '@/lib/auth/password-policy';

export const roleSchema = z.enum(ROLES as unknown as [string, ...string[]], {
  error: `Role must be one of ${ROLES.join(', ')}`,
}) as unknown as z.ZodType<(typeof ROLES)[number]>;

export const createUserSchema = z.object({
  name: z.string({ error: 'Name is required' }).trim().min(2, 'Name needs at least 2 characters').max(80),
  email: z.string({ error: 'E-mail is required' }).trim().toLowerCase().email('Enter a valid e-mail address').max(254),
  role: roleSchema,
  password: passwordSchema,
});
export type CreateUserInput = z.infer<typeof createUserSchema>;

export const updateMeSchema = z.object({ units: z.enum(['imperial', 'metric']) });

export const changePasswordSchema = z.object({
  currentPassword: z.string({ error: 'Current password is required' }).min(1, 'Current password is required').max(PASSWORD_MAX_CHARS),
  newPassword: passwordSchema,
});

/** An admin's change to a user: a new role, or deactivation / reactivation. */
export const updateUserSchema = z
  .object({
    role: roleSchema.optional(),
    active: z.boolean({ error: 'active must be true or false' }).optional(),
  })
  .strict()
  .refine((v) => v.role !== undefined || v.active !== undefined, { path: ['role'], message: 'Give a role or active' });
export type UpdateUserInput = z.infer<typeof updateUserSchema>;

/** The token of an e-mailed reset link (lib/auth/reset-token.ts makes them): 43 base64url characters. */
export const resetTokenSchema = z
  .string({ error: 'The reset link is missing its token' })
  .regex(/^[A-Za-z0-9_-]{43}$/, 'This is not a reset link Arcline sent; use the link from the e-mail as it is');

/** Completing a reset from the e-mailed link: the token stands in for the current password. */
export const completeResetSchema = z
  .object({
    token: resetTokenSchema,
    newPassword: passwordSchema,
  })
  .strict();

import { z } from 'zod';
import { emailSchema } from './auth';
import { pageOf, pageQuerySchema } from './api-error';
import { roleSchema } from './roles';

export const userSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  active: z.boolean(),
  createdAt: z.string(),
  updatedAt: z.string(),
});
export type User = z.infer<typeof userSchema>;
export const userListSchema = pageOf(userSchema);
export const userListQuerySchema = pageQuerySchema.extend({
  q: z.string().trim().max(200, 'q must be at most 200 characters').optional(),
});

export const displayNameSchema = z
  .string({ error: 'displayName is required' })
  .trim()
  .min(1, 'displayName is required')
  .max(120, 'displayName must be at most 120 characters');

export const inviteUserInputSchema = z.strictObject({
  email: emailSchema,
  displayName: displayNameSchema,
  role: roleSchema,
});
export type InviteUserInput = z.infer<typeof inviteUserInputSchema>;

export const invitationSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
  expiresAt: z.string(),
});

export const updateUserInputSchema = z
  .strictObject({ role: roleSchema.optional(), active: z.boolean().optional() })
  .refine((v) => v.role !== undefined || v.active !== undefined, { message: 'give role or active' });
export type UpdateUserInput = z.infer<typeof updateUserInputSchema>;

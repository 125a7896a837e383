import { z } from 'zod';
import { roleSchema } from './roles';

/** Longest e-mail address accepted (RFC 5321 path limit). */
export const EMAIL_MAX_LENGTH = 254;
/** Password policy: at least 12 characters (and at most 200, so bcrypt's 72-byte input is documented, not silent). */
export const PASSWORD_MIN_LENGTH = 12;
export const PASSWORD_MAX_LENGTH = 200;

export const emailSchema = z
  .string({ error: 'email is required' })
  .trim()
  .max(EMAIL_MAX_LENGTH, `email must be at most ${EMAIL_MAX_LENGTH} characters`)
  .pipe(z.email({ error: 'email must be a valid e-mail address' }));

export const newPasswordSchema = z
  .string({ error: 'password is required' })
  .min(PASSWORD_MIN_LENGTH, `password must be at least ${PASSWORD_MIN_LENGTH} characters`)
  .max(PASSWORD_MAX_LENGTH, `password must be at most ${PASSWORD_MAX_LENGTH} characters`);

export const signInInputSchema = z.strictObject({
  email: emailSchema,
  password: z.string({ error: 'password is required' }).min(1, 'password is required').max(PASSWORD_MAX_LENGTH),
});
export type SignInInput = z.infer<typeof signInInputSchema>;

/** The signed-in person as the client sees them. */
export const meSchema = z.object({
  id: z.uuid(),
  email: z.string(),
  displayName: z.string(),
  role: roleSchema,
});
export type Me = z.infer<typeof meSchema>;
export const meResponseSchema = z.object({ user: meSchema });

/** Public, unauthenticated facts the sign-in page needs. */
export const publicConfigSchema = z.object({
  demoMode: z.boolean(),
  demoSignIns: z.array(z.object({ email: z.string(), role: roleSchema, password: z.string() })),
});
export type PublicConfig = z.infer<typeof publicConfigSchema>;

export const passwordResetRequestInputSchema = z.strictObject({ email: emailSchema });
export const passwordResetConfirmInputSchema = z.strictObject({
  token: z.string().min(20, 'token is malformed').max(200, 'token is malformed'),
  password: newPasswordSchema,
});
export const invitationAcceptInputSchema = passwordResetConfirmInputSchema;
export const invitationPreviewSchema = z.object({ email: z.string(), displayName: z.string(), role: roleSchema });

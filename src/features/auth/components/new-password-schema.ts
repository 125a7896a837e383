import { z } from 'zod';
import { newPasswordSchema } from '../../../../shared/schemas/auth';

/** The server's password policy plus a second entry that must match, so a typo does not lock someone out. */
export const newPasswordFormSchema = z
  .object({
    password: newPasswordSchema,
    confirmPassword: z.string(),
  })
  .refine((values) => values.password === values.confirmPassword, {
    path: ['confirmPassword'],
    message: 'The two passwords are not the same',
  });
export type NewPasswordForm = z.infer<typeof newPasswordFormSchema>;

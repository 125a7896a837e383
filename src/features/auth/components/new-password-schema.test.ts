/** Password policy: at least 12 characters (issue 2 "Bad input"), entered twice alike. */
import { describe, expect, it } from 'vitest';
import { newPasswordFormSchema } from './new-password-schema';

describe('newPasswordFormSchema', () => {
  it('refuses 11 characters and accepts 12', () => {
    expect(newPasswordFormSchema.safeParse({ password: 'a'.repeat(11), confirmPassword: 'a'.repeat(11) }).success).toBe(false);
    expect(newPasswordFormSchema.safeParse({ password: 'a'.repeat(12), confirmPassword: 'a'.repeat(12) }).success).toBe(true);
  });

  it('puts a mismatch on the second field', () => {
    const result = newPasswordFormSchema.safeParse({ password: 'casting drum 80', confirmPassword: 'casting drum 81' });
    expect(result.success).toBe(false);
    expect(result.error?.issues.map((issue) => issue.path.join('.'))).toEqual(['confirmPassword']);
  });
});

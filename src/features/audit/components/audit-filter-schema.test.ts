/** Audit filters: the limits of the server's audit list query (shared/schemas/audit.ts), blank = no filter. */
import { describe, expect, it } from 'vitest';
import { auditFilterFormSchema } from './audit-filter-schema';

const blank = { actor: '', entityType: '', from: '', to: '' };

describe('auditFilterFormSchema', () => {
  it('accepts no filters at all', () => {
    expect(auditFilterFormSchema.safeParse(blank).success).toBe(true);
  });

  it('accepts a one-day range (from equal to to)', () => {
    expect(auditFilterFormSchema.safeParse({ ...blank, from: '2025-03-14', to: '2025-03-14' }).success).toBe(true);
  });

  it('puts a range that ends before it starts on the To field', () => {
    const result = auditFilterFormSchema.safeParse({ ...blank, from: '2025-03-15', to: '2025-03-14' });
    expect(result.success).toBe(false);
    expect(result.error?.issues[0].path).toEqual(['to']);
  });

  it('rejects a date that is not YYYY-MM-DD, naming the field', () => {
    const result = auditFilterFormSchema.safeParse({ ...blank, from: '14/03/2025' });
    expect(result.error?.issues[0].message).toBe('from must be a date (YYYY-MM-DD)');
  });

  it('rejects an actor longer than an e-mail address may be (254, RFC 5321)', () => {
    expect(auditFilterFormSchema.safeParse({ ...blank, actor: 'a'.repeat(255) }).success).toBe(false);
    expect(auditFilterFormSchema.safeParse({ ...blank, actor: 'a'.repeat(254) }).success).toBe(true);
  });
});

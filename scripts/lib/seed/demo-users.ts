import bcrypt from 'bcryptjs';
import { inArray, sql } from 'drizzle-orm';
import { users } from '../../../server/db/schema';
import type { SeedStep } from './seed-step';

/** Password of every demo account; printed by `npm start` and shown on the sign-in page in demo mode. */
export const DEMO_PASSWORD = 'quietlayer-demo';

type DemoRole = 'administrator' | 'engineer' | 'technician' | 'reviewer';

/** The four people of the invented company Larkspur Coatings, one per role. */
export const demoUsers: ReadonlyArray<{ email: string; displayName: string; role: DemoRole }> = [
  { email: 'admin@larkspur.example', displayName: 'Avery Lin (Administrator)', role: 'administrator' },
  { email: 'engineer@larkspur.example', displayName: 'Priya Natarajan (Process engineer)', role: 'engineer' },
  { email: 'technician@larkspur.example', displayName: 'Mateo Ruiz (Line technician)', role: 'technician' },
  { email: 'reviewer@larkspur.example', displayName: 'Hannah Okafor (QA reviewer)', role: 'reviewer' },
];

/**
 * Inserts the demo accounts that do not exist yet (matched case-insensitively on e-mail).
 * An account that exists is never touched, even if its role, name or password was changed.
 */
export const seedDemoUsers: SeedStep = {
  name: 'demo users',
  async run({ db, bcryptCost }) {
    const emails = demoUsers.map((user) => user.email);
    const existing = await db
      .select({ email: users.email })
      .from(users)
      .where(inArray(sql`lower(${users.email})`, emails));
    const existingEmails = new Set(existing.map((row) => row.email.toLowerCase()));
    const missing = demoUsers.filter((user) => !existingEmails.has(user.email));
    if (missing.length === 0) return 0;

    const rows = await Promise.all(
      missing.map(async (user) => ({ ...user, passwordHash: await bcrypt.hash(DEMO_PASSWORD, bcryptCost) })),
    );
    const inserted = await db.insert(users).values(rows).onConflictDoNothing().returning({ id: users.id });
    return inserted.length;
  },
};

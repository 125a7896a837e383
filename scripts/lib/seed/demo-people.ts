import { and, eq, sql } from 'drizzle-orm';
import type { CurrentUser } from '../../../server/auth/current-user';
import type { DbOrTx } from '../../../server/db/client';
import { fluids } from '../../../server/db/schema/fluids';
import { checkRevisions } from '../../../server/db/schema/layer-checks';
import { users } from '../../../server/db/schema/users';

/** The demo accounts the checks, sheets and readings act as (see demo-users.ts). */
export const DEMO_ENGINEER = 'engineer@larkspur.example';
export const DEMO_TECHNICIAN = 'technician@larkspur.example';
export const DEMO_REVIEWER = 'reviewer@larkspur.example';

/** The active demo account with this e-mail as a signed-in user, or undefined (deactivated or missing). */
export async function demoUser(db: DbOrTx, email: string): Promise<CurrentUser | undefined> {
  const [row] = await db
    .select({ id: users.id, email: users.email, displayName: users.displayName, role: users.role })
    .from(users)
    .where(and(sql`lower(${users.email}) = ${email.toLowerCase()}`, eq(users.active, true)))
    .limit(1);
  return row;
}

/** Id of the fluid with this name, or undefined (the fluid seed was changed or the fluid renamed). */
export async function demoFluidId(db: DbOrTx, name: string): Promise<string | undefined> {
  const [row] = await db.select({ id: fluids.id }).from(fluids).where(eq(fluids.name, name)).limit(1);
  return row?.id;
}

/**
 * The check the demo seed created with this title. The natural key is the title of revision 1,
 * which never changes: a check that people renamed or revised later is still found, so the seed
 * neither duplicates it nor touches it.
 */
export async function seededCheckId(db: DbOrTx, title: string): Promise<string | undefined> {
  const [row] = await db
    .select({ checkId: checkRevisions.checkId })
    .from(checkRevisions)
    .where(and(eq(checkRevisions.revision, 1), sql`${checkRevisions.input}->>'title' = ${title}`))
    .limit(1);
  return row?.checkId;
}

/**
 * Base URL put into e-mailed links and the sheet PDF while seeding: PUBLIC_URL, else the address
 * `npm start` serves on (the same default as server/env.ts loadEnv).
 */
export function demoPublicUrl(): string {
  const fromEnv = process.env.PUBLIC_URL;
  const url = fromEnv && fromEnv !== '' ? fromEnv : `http://${process.env.HOST || '127.0.0.1'}:${process.env.PORT || '3000'}`;
  return url.replace(/\/+$/, '');
}

import { randomUUID } from 'node:crypto';
import bcrypt from 'bcryptjs';
import request from 'supertest';
import type { Express } from 'express';
import type { Database } from '../../../server/db/client';
import { users } from '../../../server/db/schema';
import type { Role } from '../../../shared/schemas/roles';

export interface TestUser {
  id: string;
  email: string;
  password: string;
  role: Role;
  displayName: string;
}

/** A unique e-mail per call, so test files can run in parallel on one database. */
export function uniqueEmail(label = 'person'): string {
  return `${label}-${randomUUID().slice(0, 12)}@test.larkspur.example`;
}

export async function createTestUser(
  db: Database,
  options: { role?: Role; active?: boolean; password?: string; label?: string } = {},
): Promise<TestUser> {
  const role = options.role ?? 'engineer';
  const password = options.password ?? `pw-${randomUUID()}`;
  const email = uniqueEmail(options.label ?? role);
  const displayName = `Test ${role} ${email.slice(0, 8)}`;
  const [row] = await db
    .insert(users)
    .values({ email, displayName, role, active: options.active ?? true, passwordHash: await bcrypt.hash(password, 4) })
    .returning({ id: users.id });
  return { id: row.id, email, password, role, displayName };
}

/** A supertest agent (keeps cookies) signed in as `user`. */
export async function signedInAgent(app: Express, user: Pick<TestUser, 'email' | 'password'>) {
  const agent = request.agent(app);
  const response = await agent.post('/api/auth/sign-in').send({ email: user.email, password: user.password });
  if (response.status !== 200) throw new Error(`sign-in for ${user.email} failed: ${response.status} ${JSON.stringify(response.body)}`);
  return agent;
}

/** The value of the quietlayer_session cookie set by a response, or undefined. */
export function sessionCookieFrom(headers: Record<string, unknown>): string | undefined {
  const raw = headers['set-cookie'];
  const list = Array.isArray(raw) ? (raw as string[]) : typeof raw === 'string' ? [raw] : [];
  const cookies = list.filter((c) => c.startsWith('quietlayer_session='));
  const last = cookies.at(-1);
  return last;
}
